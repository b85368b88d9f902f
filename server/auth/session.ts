// Cookie sessions kept in PostgreSQL (connect-pg-simple; table from migration 0001).
import session, { type SessionData } from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';

const FOURTEEN_DAYS_MS = 14 * 24 * 3_600_000;
const TOUCH_INTERVAL_MS = 60_000;

const PgStore = connectPgSimple(session);

/**
 * `rolling` has express-session extend every unchanged session through the store's touch, which
 * connect-pg-simple answers with an UPDATE, and the answer waits for it: a write per read. Once per
 * session a minute in this process keeps the stored expiry within two minutes of the cookie's 14 days.
 */
class ThrottledTouchStore extends PgStore {
  #window = 0;
  #touched = new Set<string>();

  override touch(sid: string, sess: SessionData, callback?: () => void): void {
    const window = Math.floor(Date.now() / TOUCH_INTERVAL_MS);
    if (window !== this.#window) {
      this.#window = window;
      this.#touched = new Set();
    }
    if (this.#touched.has(sid)) {
      callback?.();
      return;
    }
    this.#touched.add(sid);
    super.touch(sid, sess, callback);
  }
}

export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  return session({
    name: 'patchcast.sid',
    secret: config.sessionSecret,
    store: new ThrottledTouchStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.env === 'production', maxAge: FOURTEEN_DAYS_MS },
  });
}
