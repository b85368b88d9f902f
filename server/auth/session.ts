// Cookie sessions kept in PostgreSQL (connect-pg-simple; table from migration 0001).
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type { RequestHandler } from 'express';
import type { Pool } from 'pg';
import type { Config } from '../config';

const FOURTEEN_DAYS_MS = 14 * 24 * 3_600_000;

export function sessionMiddleware(config: Config, pool: Pool): RequestHandler {
  const PgStore = connectPgSimple(session);
  return session({
    name: 'patchcast.sid',
    secret: config.sessionSecret,
    store: new PgStore({ pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: { httpOnly: true, sameSite: 'lax', secure: config.env === 'production', maxAge: FOURTEEN_DAYS_MS },
  });
}
