// Accounts end to end through the real Express app, PostgreSQL and SMTP catcher.
import { client } from '../support/client';
import { storedForms } from '../support/stored-token';
import { startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const tokenFrom = (link: string): string => new URL(link).searchParams.get('token') ?? '';

describe('health', () => {
  test('when the database answers, then GET /health is 200 with the database checked', async () => {
    const res = await client(t.app).get('/api/v1/health');
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ status: 'ok', database: 'ok' });
  });
});

describe('sign-up, verification, sign-in, sign-out', () => {
  const person = { email: 'Lena.Marsh@Example.org', name: 'Lena Marsh', password: 'sagebrush-2031' };

  test('when a person signs up, confirms by the e-mailed link and signs in, then /auth/me knows them until sign-out', async () => {
    const c = client(t.app);
    const signUp = await c.post('/api/v1/auth/sign-up', person);
    expect(signUp.status).toBe(201);

    // Before confirming, sign-in is refused with a message that says what to do.
    const early = await c.signIn(person.email, person.password);
    expect(early.status).toBe(403);
    expect(early.body.error.code).toBe('email_unverified');

    const mail = await t.mailTo('lena.marsh@example.org', 'Confirm your e-mail');
    const link = mail.links.find((l) => l.includes('/verify?token='));
    expect(link).toBeDefined();
    expect((await c.post('/api/v1/auth/verify', { token: tokenFrom(link!) })).status).toBe(200);
    // The link is single-use.
    expect((await c.post('/api/v1/auth/verify', { token: tokenFrom(link!) })).status).toBe(400);

    const signIn = await c.signIn(person.email, person.password);
    expect(signIn.status).toBe(200);
    expect(signIn.body.user).toMatchObject({ email: 'lena.marsh@example.org', name: 'Lena Marsh', emailVerified: true, areaUnit: 'ha' });
    expect(JSON.stringify(signIn.body)).not.toContain('password');
    const cookie = String(signIn.headers['set-cookie']);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);

    expect((await c.get('/api/v1/auth/me')).body.user.email).toBe('lena.marsh@example.org');
    expect((await c.post('/api/v1/auth/sign-out')).status).toBe(204);
    expect((await c.get('/api/v1/auth/me')).status).toBe(401);
  });

  test('when the address is taken, then sign-up answers exactly as for a new address and tells the owner by mail', async () => {
    const fresh = await client(t.app).post('/api/v1/auth/sign-up', { ...person, email: 'someone.new@example.org' });
    const taken = await client(t.app).post('/api/v1/auth/sign-up', { ...person, password: 'another-password-9' });
    expect(taken.status).toBe(fresh.status);
    expect(taken.body.message.replace('lena.marsh@example.org', 'X')).toBe(fresh.body.message.replace('someone.new@example.org', 'X'));
    await t.mailTo('lena.marsh@example.org', 'tried to sign up');
    // The existing password still works: nothing was overwritten.
    expect((await client(t.app).signIn(person.email, person.password)).status).toBe(200);
  });

  test('when sign-in succeeds, then the session id is a new one (no fixation)', async () => {
    const c = client(t.app);
    const before = String((await c.agent.get('/api/v1/auth/csrf')).headers['set-cookie']);
    const after = String((await c.signIn(person.email, person.password)).headers['set-cookie']);
    const sid = (s: string): string => /patchcast\.sid=([^;]+)/.exec(s)?.[1] ?? '';
    expect(sid(before)).not.toBe('');
    expect(sid(after)).not.toBe('');
    expect(sid(after)).not.toBe(sid(before));
  });
});

describe('forgot and reset password', () => {
  const person = { email: 'reset.me@example.org', name: 'Reset Me', password: 'first-password-1' };

  beforeAll(async () => {
    const c = client(t.app);
    await c.post('/api/v1/auth/sign-up', person);
    const mail = await t.mailTo(person.email, 'Confirm');
    await c.post('/api/v1/auth/verify', { token: tokenFrom(mail.links[0]) });
  });

  test('when the address exists or not, then the answer is the same', async () => {
    const c = client(t.app);
    const known = await c.post('/api/v1/auth/forgot', { email: person.email });
    const unknown = await c.post('/api/v1/auth/forgot', { email: 'nobody@example.org' });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(unknown.body).toEqual(known.body);
  });

  test('when the e-mailed reset link is used (its token stored only as a digest), then the new password works, the old does not, a second use fails, and other sessions end at once', async () => {
    const c = client(t.app);
    const elsewhere = client(t.app);
    expect((await elsewhere.signIn(person.email, person.password)).status).toBe(200);
    expect((await elsewhere.get('/api/v1/auth/me')).status).toBe(200);
    const mail = await t.mailTo(person.email, 'Reset your Patchcast password');
    const token = tokenFrom(mail.links.find((l) => l.includes('/reset?token='))!);
    expect(await storedForms(t.sequelize, 'account_tokens', token)).toEqual({ digestInTable: true, plainAnywhere: [] });
    expect((await c.post('/api/v1/auth/reset', { token, password: 'second-password-2' })).status).toBe(200);
    expect((await c.post('/api/v1/auth/reset', { token, password: 'third-password-3' })).status).toBe(400);
    expect((await c.signIn(person.email, 'first-password-1')).status).toBe(401);
    expect((await c.signIn(person.email, 'second-password-2')).status).toBe(200);
    expect((await elsewhere.get('/api/v1/auth/me')).status).toBe(401);
  });
});

describe('account settings', () => {
  test('when a signed-in person changes name, area unit and password, then the changes stick', async () => {
    const c = client(t.app);
    const email = 'settings@example.org';
    await c.post('/api/v1/auth/sign-up', { email, name: 'Old Name', password: 'settings-pass-1' });
    await c.post('/api/v1/auth/verify', { token: tokenFrom((await t.mailTo(email, 'Confirm')).links[0]) });
    await c.signIn(email, 'settings-pass-1');

    expect((await c.get('/api/v1/auth/me')).body.user.name).toBe('Old Name');
    const changed = await c.patch('/api/v1/account', { name: 'New Name', areaUnit: 'acres' });
    expect(changed.status).toBe(200);
    expect(changed.body.user).toMatchObject({ name: 'New Name', areaUnit: 'acres' });
    // The very next request sees the change (nothing stale is kept of the signed-in person).
    expect((await c.get('/api/v1/auth/me')).body.user).toMatchObject({ name: 'New Name', areaUnit: 'acres' });

    const wrong = await c.post('/api/v1/account/password', { currentPassword: 'not-it-at-all', newPassword: 'settings-pass-2' });
    expect(wrong.status).toBe(400);
    expect((await c.post('/api/v1/account/password', { currentPassword: 'settings-pass-1', newPassword: 'settings-pass-2' })).status).toBe(200);
    expect((await c.signIn(email, 'settings-pass-2')).status).toBe(200);
  });
});
