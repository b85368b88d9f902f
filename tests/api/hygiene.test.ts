// Server hygiene: security headers, production cookie flags and no Outbox in production.
import request from 'supertest';
import { client } from '../support/client';
import { startTestApp, type TestApp } from '../support/test-app';

describe('in production', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ env: 'production', outboxEnabled: false, sessionSecret: 'a-long-production-like-secret-for-tests' });
  });
  afterAll(() => t.close());

  test('when a session starts behind the TLS-terminating proxy, then its cookie is HttpOnly, SameSite=Lax and Secure', async () => {
    // Production runs behind a proxy on loopback that terminates TLS and says so in X-Forwarded-Proto.
    const res = await request(t.app).get('/api/v1/auth/csrf').set('x-forwarded-proto', 'https');
    const cookie = String(res.headers['set-cookie']);
    expect(cookie).toMatch(/patchcast\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect(cookie).toMatch(/Secure/i);
  });

  test('when the Outbox is asked for, then it does not exist', async () => {
    expect((await client(t.app).get('/api/v1/dev/outbox')).status).toBe(404);
  });
});

describe('headers', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  test('when any page or API route answers, then it carries a Content-Security-Policy and nosniff, and no X-Powered-By', async () => {
    const res = await request(t.app).get('/api/v1/health');
    expect(res.headers['content-security-policy']).toMatch(/script-src 'self'/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  test('when an error happens, then the answer has the one error shape and no stack trace', async () => {
    const res = await request(t.app).get('/api/v1/teams');
    expect(res.status).toBe(401);
    expect(Object.keys(res.body)).toEqual(['error']);
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts:\d+/);
  });
});
