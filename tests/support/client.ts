// A supertest agent that behaves like the web client: keeps cookies and sends the CSRF token.
import request from 'supertest';
import type { Express } from 'express';

export type Client = {
  agent: ReturnType<typeof request.agent>;
  refreshCsrf(): Promise<string>;
  get(url: string): request.Test;
  post(url: string, body?: object): Promise<request.Response>;
  patch(url: string, body?: object): Promise<request.Response>;
  put(url: string, body?: object): Promise<request.Response>;
  delete(url: string): Promise<request.Response>;
  signIn(email: string, password: string): Promise<request.Response>;
};

/** `app` is the Express app itself, or the base URL of a server running elsewhere. */
export function client(app: Express | string): Client {
  const agent = request.agent(app);
  let token = '';
  const refreshCsrf = async (): Promise<string> => {
    token = (await agent.get('/api/v1/auth/csrf').expect(200)).body.csrfToken;
    return token;
  };
  const send = async (method: 'post' | 'patch' | 'put' | 'delete', url: string, body?: object): Promise<request.Response> => {
    if (!token) await refreshCsrf();
    const req = agent[method](url).set('x-csrf-token', token);
    return body === undefined ? req : req.send(body);
  };
  return {
    agent,
    refreshCsrf,
    get: (url) => agent.get(url),
    post: (url, body) => send('post', url, body),
    patch: (url, body) => send('patch', url, body),
    put: (url, body) => send('put', url, body),
    delete: (url) => send('delete', url),
    async signIn(email, password) {
      const res = await send('post', '/api/v1/auth/sign-in', { email, password });
      // The session id changes at sign-in, and with it the CSRF token.
      await refreshCsrf();
      return res;
    },
  };
}
