// Every API route as method and path (relative to /api/v1), read from the mounted routers. Express
// 5's router layers do not keep their mount paths, so the mounts are declared in a table
// (apiMounts in server/app.ts) and joined with each router's own route paths here.
import type { RequestHandler, Router } from 'express';

export type ApiMount = { path: string; guard?: RequestHandler; router: Router };
/** The API's mounts in order: those served before the session middleware, then the rest. */
export type ApiMounts = { beforeSession: ApiMount[]; afterSession: ApiMount[] };

const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;
export type HttpMethod = (typeof METHODS)[number];
export type ApiRoute = { method: HttpMethod; path: string };

const isHttpMethod = (m: string): m is HttpMethod => (METHODS as readonly string[]).includes(m);

/** '/' + '/runs/:runId' → '/runs/:runId'; '/health' + '/' → '/health'. */
const joinPath = (mount: string, route: string): string => `${mount}${route}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1');

function routesOf({ path, router }: ApiMount): ApiRoute[] {
  return router.stack.flatMap(({ route }) => {
    if (!route) return [];
    const full = joinPath(path, route.path);
    // One layer per handler, each with its method (router.all() would leave it undefined).
    const methods = [...new Set(route.stack.map((layer) => String(layer.method).toUpperCase()))];
    return methods.map((method) => {
      if (!isHttpMethod(method)) throw new Error(`${full} is routed for ${method}, which the route table does not list`);
      return { method, path: full };
    });
  });
}

export function routeTable(mounts: ApiMounts): ApiRoute[] {
  return [...mounts.beforeSession, ...mounts.afterSession].flatMap(routesOf);
}
