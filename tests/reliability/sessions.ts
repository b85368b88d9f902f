// Sign-in over real HTTP as the web client does it: a session and its CSRF token first
// (GET /auth/csrf), then POST /auth/sign-in with both. `from` is sent as X-Forwarded-For, which the
// app believes because the connection comes from loopback (`trust proxy` is 'loopback' in
// server/app.ts), so one process can speak for many client addresses.
const SESSION_COOKIE = 'patchcast.sid';

export type Session = { cookie: string; csrfToken: string };

const forwarded = (from?: string): Record<string, string> => (from ? { 'x-forwarded-for': from } : {});

function sessionCookie(res: Response): string | null {
  const found = res.headers.getSetCookie().find((c) => c.startsWith(`${SESSION_COOKIE}=`));
  return found ? found.split(';')[0] : null;
}

export async function newSession(baseUrl: string): Promise<Session> {
  const res = await fetch(`${baseUrl}/api/v1/auth/csrf`);
  const cookie = sessionCookie(res);
  if (!res.ok || !cookie) throw new Error(`GET /auth/csrf answered ${res.status} without a session cookie`);
  return { cookie, csrfToken: ((await res.json()) as { csrfToken: string }).csrfToken };
}

/** One sign-in attempt in `session`; the answer's status, and the signed-in session's cookie on success. */
export async function attemptSignIn(baseUrl: string, session: Session, email: string, password: string, from?: string): Promise<{ status: number; cookie: string | null }> {
  const res = await fetch(`${baseUrl}/api/v1/auth/sign-in`, {
    method: 'POST',
    headers: { 'content-type': 'application/json', cookie: session.cookie, 'x-csrf-token': session.csrfToken, ...forwarded(from) },
    body: JSON.stringify({ email, password }),
  });
  await res.arrayBuffer();
  return { status: res.status, cookie: sessionCookie(res) };
}

/** The cookie of a fresh signed-in session (passport issues a new session id at sign-in). */
export async function signIn(baseUrl: string, email: string, password: string, from?: string): Promise<string> {
  const { status, cookie } = await attemptSignIn(baseUrl, await newSession(baseUrl), email, password, from);
  if (status !== 200 || !cookie) throw new Error(`sign-in of ${email} answered ${status}`);
  return cookie;
}
