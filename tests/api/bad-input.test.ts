// Bad input is answered with a 4xx and a message that says what is wrong, never a 500.
import request from 'supertest';
import { client } from '../support/client';
import { makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { User } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

test.each([
  ['missing e-mail', { name: 'A', password: 'long-enough-1' }, /e-mail is required/],
  ['e-mail of the wrong type', { email: 42, name: 'A', password: 'long-enough-1' }, /e-mail is required|e-mail/],
  ['malformed e-mail', { email: 'not-an-address', name: 'A', password: 'long-enough-1' }, /name@example\.org/],
  ['short password', { email: 'a@example.org', name: 'A', password: 'short' }, /at least 10 characters/],
  ['empty name', { email: 'a@example.org', name: '   ', password: 'long-enough-1' }, /name must not be empty/],
  ['password of the wrong type', { email: 'a@example.org', name: 'A', password: 1234567890 }, /password is required/],
])('when sign-up has %s, then 400 says so and nothing is saved', async (_what, body, message) => {
  const res = await client(t.app).post('/api/v1/auth/sign-up', body);
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('invalid_input');
  expect(res.body.error.message).toMatch(message);
  expect(res.body.error.details.issues.length).toBeGreaterThan(0);
  expect(await User.count({ where: { email: 'a@example.org' } })).toBe(0);
});

test('when the body is not JSON, then 400 says so', async () => {
  const c = client(t.app);
  const token = await c.refreshCsrf();
  const res = await c.agent.post('/api/v1/auth/sign-up').set('x-csrf-token', token).set('content-type', 'application/json').send('{"email": ');
  expect(res.status).toBe(400);
  expect(res.body.error.code).toBe('malformed_json');
});

test('when the body is larger than 100 kB, then 413 says so', async () => {
  const c = client(t.app);
  const res = await c.post('/api/v1/auth/sign-up', { email: 'big@example.org', name: 'x'.repeat(200_000), password: 'long-enough-1' });
  expect(res.status).toBe(413);
  expect(res.body.error.message).toMatch(/too large/);
});

test('when a change comes without the CSRF token, then 403 and nothing happens', async () => {
  const res = await request(t.app).post('/api/v1/auth/sign-up').send({ email: 'csrf@example.org', name: 'C', password: 'long-enough-1' });
  expect(res.status).toBe(403);
  expect(res.body.error.code).toBe('csrf_invalid');
  expect(await User.count({ where: { email: 'csrf@example.org' } })).toBe(0);
});

test('when a path id is not a number, then 400 names it', async () => {
  const user = await makeUser('Path');
  const c = client(t.app);
  await c.signIn(user.email, PASSWORD);
  const res = await c.get('/api/v1/teams/abc');
  expect(res.status).toBe(400);
  expect(res.body.error.message).toMatch(/id must be a number|number/);
});

test('when an unknown API route is asked for, then 404 in the error shape', async () => {
  const res = await client(t.app).get('/api/v1/nothing-here');
  expect(res.status).toBe(404);
  expect(res.body.error.code).toBe('not_found');
});

test('when someone repeats a wrong password, then sign-in for that account is limited with 429 and a message', async () => {
  const user = await makeUser('Target');
  const c = client(t.app);
  const statuses: number[] = [];
  for (let i = 0; i < 6; i++) statuses.push((await c.signIn(user.email, 'wrong-password-x')).status);
  expect(statuses.slice(0, 5)).toEqual([401, 401, 401, 401, 401]);
  expect(statuses[5]).toBe(429);
  const limited = await c.signIn(user.email, PASSWORD);
  expect(limited.status).toBe(429);
  expect(limited.body.error.message).toMatch(/wait 15 minutes/);
});
