// Server hygiene: security headers, production cookie flags, no Outbox in production, and kept
// uploads only ever served back as downloads.
import request from 'supertest';
import { client } from '../support/client';
import { startFixture, type Fixture } from '../support/study-area-fixture';
import { startTestApp, type TestApp } from '../support/test-app';

describe('in production', () => {
  let t: TestApp;
  const logLines: string[] = [];
  beforeAll(async () => {
    t = await startTestApp({ env: 'production', outboxEnabled: false, sessionSecret: 'a-long-production-like-secret-for-tests' }, { write: (line: string) => logLines.push(line) });
  });
  afterAll(() => t.close());

  test('when a request is refused, then its log line names the method, path and status, and none of its headers; a success writes none', async () => {
    const res = await request(t.app).get('/api/v1/teams').set('cookie', 'patchcast.sid=s%3Asecret-session-id').set('x-csrf-token', 'secret-csrf-token');
    expect(res.status).toBe(401);
    const line = logLines.map((l) => JSON.parse(l)).find((l) => l.req?.url === '/api/v1/teams');
    expect(line).toMatchObject({ req: { method: 'GET', url: '/api/v1/teams' }, res: { statusCode: 401 } });
    expect(line.req.headers).toBeUndefined();
    expect(logLines.join('')).not.toMatch(/secret-session-id|secret-csrf-token/);
    // Successes log at debug, below production's info: the console shows problems, not traffic.
    expect((await request(t.app).get('/api/v1/health')).status).toBe(200);
    expect(logLines.some((l) => l.includes('/api/v1/health'))).toBe(false);
  });

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

describe('uploads served back', () => {
  let f: Fixture;
  beforeAll(async () => {
    f = await startFixture();
  });
  afterAll(() => f.t.close());

  test('when a kept upload holds HTML and has an HTML-looking name, then it comes back as a byte-identical download, never as a page', async () => {
    const area = await f.makeArea(['Shrub', 'Grass']);
    // A valid plot table whose plot ids are markup: stored and served as the bytes that came in.
    const csv = Buffer.from('plot,year,cover\n<script>alert(1)</script>,2010,shrub\n<script>alert(1)</script>,2011,grass\n');
    const name = '<img src=x onerror=alert(1)>.html';
    const fields = { name: 'Markup plots', plotColumn: 'plot', timeColumn: 'year', stateColumn: 'cover', mapping: JSON.stringify({ shrub: 'S1', grass: 'S2' }) };
    const created = await f.upload('editor', `/api/v1/study-areas/${area}/surveys`, { file: [csv, name] }, fields);
    expect(created.status).toBe(201);
    const res = await f.as.viewer.get(`/api/v1/surveys/${created.body.survey.id}/files/table`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('application/octet-stream');
    expect(res.headers['content-disposition']).toMatch(/^attachment;/);
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(Buffer.compare(res.body as Buffer, csv)).toBe(0);
  });
});
