// The Express application: API under /api/v1, then the exported web app with a fallback to its
// HTML for client-side routes.
import express, { type RequestHandler, type Router } from 'express';
import helmet from 'helmet';
import type { PassportStatic } from 'passport';
import { existsSync } from 'node:fs';
import path from 'node:path';
import type { AppContext } from './context';
import { createPool } from './db';
import { sessionMiddleware } from './auth/session';
import { configurePassport } from './auth/passport';
import { csrf } from './auth/csrf';
import { createRateLimits, type RateLimits } from './auth/rate-limits';
import { apiNotFound, errorHandler } from './http/errors';
import { jsonOrMultipartBodies } from './http/content-type';
import { requestLog } from './http/request-log';
import { currentUser } from './http/require-user';
import type { ApiMount, ApiMounts } from './http/route-table';
import { healthRoutes } from './routes/health';
import { authRoutes } from './routes/auth';
import { accountRoutes } from './routes/account';
import { teamRoutes } from './routes/teams';
import { invitationRoutes } from './routes/invitations';
import { adminRoutes } from './routes/admin';
import { devRoutes } from './routes/dev';
import { studyAreaRoutes, teamStudyAreaRoutes } from './routes/study-areas';
import { runRoutes, scenarioRunRoutes, studyAreaRunRoutes } from './routes/runs';
import { noticeRoutes } from './routes/notices';
import { createRunQueue, type RunQueue } from './jobs/run-queue';
import { scenarioRoutes, studyAreaScenarioRoutes } from './routes/scenarios';
import { studyAreaSurveyRoutes, surveyRoutes } from './routes/surveys';
import { downloadRoutes } from './routes/downloads';

export type App = { app: express.Express; mounts: ApiMounts; close(): Promise<void> };

/** What the API's routers are built with besides the context. */
export type ApiDeps = { auth: PassportStatic; limits: RateLimits; runQueue: RunQueue };

const requireSignIn: RequestHandler = (req, _res, next) => {
  currentUser(req);
  next();
};

const signedIn = (path: string, router: Router): ApiMount => ({ path, guard: requireSignIn, router });

/** Every router of the API with its mount path, declared once for createApp and the route table. */
export function apiMounts(ctx: AppContext, { auth, limits, runQueue }: ApiDeps): ApiMounts {
  return {
    // Before the session middleware, so a health probe never touches the session store.
    beforeSession: [{ path: '/health', router: healthRoutes(ctx) }],
    afterSession: [
      { path: '/auth', router: authRoutes(ctx, auth, limits) },
      { path: '/invitations', router: invitationRoutes(ctx) },
      signedIn('/account', accountRoutes()),
      signedIn('/teams', teamRoutes(ctx)),
      signedIn('/teams/:teamId/study-areas', teamStudyAreaRoutes(ctx)),
      signedIn('/study-areas/:studyAreaId/scenarios', studyAreaScenarioRoutes(ctx)),
      signedIn('/study-areas/:studyAreaId/surveys', studyAreaSurveyRoutes(ctx)),
      signedIn('/study-areas', studyAreaRoutes(ctx)),
      signedIn('/scenarios', scenarioRoutes(ctx)),
      signedIn('/surveys', surveyRoutes()),
      signedIn('/scenarios/:scenarioId/runs', scenarioRunRoutes(ctx, runQueue)),
      signedIn('/study-areas/:studyAreaId/runs', studyAreaRunRoutes()),
      signedIn('/runs', runRoutes(ctx, runQueue)),
      signedIn('/notices', noticeRoutes()),
      signedIn('/admin', adminRoutes(ctx)),
      // At the root a guard would answer 401 for every path after it, so each download route signs the caller in itself.
      { path: '/', router: downloadRoutes() },
      ...(ctx.config.outboxEnabled ? [signedIn('/dev', devRoutes(ctx))] : []),
    ],
  };
}

export function createApp(ctx: AppContext): App {
  const { config, logger } = ctx;
  const app = express();
  const pool = createPool(config.databaseUrl, { name: 'patchcast-sessions', max: 5 }, logger);
  const auth = configurePassport();
  const runQueue = createRunQueue(config.databaseUrl, logger);
  const mounts = apiMounts(ctx, { auth, limits: createRateLimits(), runQueue });

  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'script-src': ["'self'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          // Over plain http (development on a LAN address) upgrading would break every request.
          'upgrade-insecure-requests': config.env === 'production' ? [] : null,
        },
      },
    }),
  );
  if (config.env !== 'test') app.use(requestLog(logger));

  const api = express.Router();
  const mount = ({ path, guard, router }: ApiMount): void => {
    api.use(path, ...(guard ? [guard] : []), router);
  };
  api.use(express.json({ limit: '100kb' }));
  api.use(jsonOrMultipartBodies);
  mounts.beforeSession.forEach(mount);
  api.use(sessionMiddleware(config, pool));
  // compat only serves strategies written for passport 0.4, which this app has none of.
  api.use(auth.initialize({ compat: false }));
  api.use(auth.session());
  api.use(csrf.csrfSynchronisedProtection);
  mounts.afterSession.forEach(mount);
  api.use(apiNotFound);
  app.use('/api/v1', api);

  const indexHtml = path.join(config.webDir, 'index.html');
  if (existsSync(indexHtml)) {
    app.use(express.static(config.webDir, { index: false, maxAge: '1h' }));
    // Client-side routes (Expo Router) all load the same HTML.
    app.use((req, res, next) => (req.method === 'GET' ? res.sendFile(indexHtml) : next()));
  }
  app.use(errorHandler(logger));

  return {
    app,
    mounts,
    close: async () => {
      await runQueue.stop();
      await pool.end();
    },
  };
}
