// Cookie sessions kept in PostgreSQL (connect-pg-simple; table from migration 0001).
import session, { type SessionData } from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';
import { ShortLivedCache, SIGNED_IN_LOOKUP_TTL_MS } from '../services/short-lived-cache';

const FOURTEEN_DAYS_MS = 14 * 24 * 3_600_000;
const TOUCH_INTERVAL_MS = 60_000;
/** Sessions whose last touch is remembered; past that the record starts again (a few extra writes). */
const MAX_TOUCHES_KEPT = 100_000;

const PgStore = connectPgSimple(session);

/** Every store of this process (weakly: tests make many), so ending sessions reaches their cached copies. */
const stores = new Set<WeakRef<SessionStore>>();

/**
 * Reads: every signed-in request reads its session; a session read in the last SIGNED_IN_LOOKUP_TTL_MS is
 * reused (as JSON, so each request still gets its own object). This process forgets its copy
 * whenever it saves or destroys that session, and all copies when it ends someone's sessions, so
 * sign-out and sign-out-everywhere take effect at once here; a change made by another process
 * shows within SIGNED_IN_LOOKUP_TTL_MS.
 * Touches: `rolling` has express-session extend every unchanged session through the store's
 * touch, which connect-pg-simple answers with an UPDATE, and the answer waits for it: a write per
 * read. Once per session a minute in this process keeps the stored expiry within a minute of the
 * cookie's 14 days.
 */
class SessionStore extends PgStore {
  readonly #read = new ShortLivedCache<string, string>(SIGNED_IN_LOOKUP_TTL_MS);
  readonly #touchedAt = new Map<string, number>();

  constructor(options: ConstructorParameters<typeof PgStore>[0]) {
    super(options);
    stores.add(new WeakRef(this));
  }

  override get(sid: string, callback: (err: unknown, session?: SessionData | null) => void): void {
    const cached = this.#read.get(sid);
    if (cached !== undefined) {
      callback(null, JSON.parse(cached) as SessionData);
      return;
    }
    const epoch = this.#read.epoch;
    super.get(sid, (err: unknown, session?: SessionData | null) => {
      if (!err && session) this.#read.fill(sid, JSON.stringify(session), epoch);
      callback(err, session);
    });
  }

  override set(sid: string, session: SessionData, callback?: (err?: unknown) => void): void {
    this.#read.forget(sid);
    super.set(sid, session, (err?: unknown) => {
      this.#read.forget(sid);
      callback?.(err);
    });
  }

  override destroy(sid: string, callback?: (err?: unknown) => void): void {
    this.#read.forget(sid);
    super.destroy(sid, (err?: unknown) => {
      this.#read.forget(sid);
      callback?.(err);
    });
  }

  override touch(sid: string, sess: SessionData, callback?: () => void): void {
    const now = Date.now();
    // Per session, so that sessions begun together are not all written again in one burst.
    if (now - (this.#touchedAt.get(sid) ?? -Infinity) < TOUCH_INTERVAL_MS) {
      callback?.();
      return;
    }
    if (this.#touchedAt.size >= MAX_TOUCHES_KEPT) this.#touchedAt.clear();
    this.#touchedAt.set(sid, now);
    super.touch(sid, sess, callback);
  }

  forgetAll(): void {
    this.#read.forgetAll();
  }

}

/** After sessions were deleted in the database (sign-out everywhere): drop every cached copy. */
export function forgetCachedSessions(): void {
  for (const ref of stores) {
    const store = ref.deref();
    if (store) store.forgetAll();
    else stores.delete(ref);
  }
}

export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  return session({
    name: 'patchcast.sid',
    secret: config.sessionSecret,
    store: new SessionStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.env === 'production', maxAge: FOURTEEN_DAYS_MS },
  });
}
