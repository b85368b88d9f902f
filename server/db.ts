// One Sequelize instance per process (or per test database), and the plain pg pools beside it.
// While the server is down or restarting, connecting fails within a few seconds and the request is
// answered 503 (server/http/errors.ts) instead of waiting; the pools reconnect on next use.
import { Sequelize } from 'sequelize';
import pg from 'pg';
import type { Logger } from 'pino';
import { initModels } from './models';

/** Longest wait for a new connection (pg's connectionTimeoutMillis; its default is no limit). */
export const CONNECT_TIMEOUT_MS = 3_000;
/** Longest wait for a free Sequelize connection (sequelize-pool's default is 60 s). */
const ACQUIRE_TIMEOUT_MS = 10_000;

/**
 * pg's client, listening for 'error' from the start. Sequelize 6 listens only once connect() has
 * resolved, and a server shutting down can end the session in the same read as its "ready" message:
 * that 'error' would go unhandled and end the process (sequelize/sequelize#12704, #15883). This
 * marks the connection as Sequelize's own listener would, so that its pool discards it.
 */
class ListeningClient extends pg.Client {
  constructor(config?: string | pg.ClientConfig) {
    super(config);
    this.on('error', () => {
      (this as { _invalid?: boolean })._invalid = true;
    });
  }
}
const sequelizePg: typeof pg = Object.assign(Object.create(pg), { Client: ListeningClient });

export function connectDatabase(databaseUrl: string): Sequelize {
  const sequelize = new Sequelize(databaseUrl, {
    dialect: 'postgres',
    dialectModule: sequelizePg,
    logging: false,
    pool: { max: 10, idle: 10_000, acquire: ACQUIRE_TIMEOUT_MS },
    dialectOptions: { connectionTimeoutMillis: CONNECT_TIMEOUT_MS },
  });
  initModels(sequelize);
  return sequelize;
}

/** A pg pool for what runs beside Sequelize (sessions, the run pipeline). */
export function createPool(databaseUrl: string, options: { name: string; max: number }, logger: Logger): pg.Pool {
  const pool = new pg.Pool({ connectionString: databaseUrl, max: options.max, application_name: options.name, connectionTimeoutMillis: CONNECT_TIMEOUT_MS });
  // Idle clients whose connection the server closed (restart, failover) report it here, and an
  // unhandled 'error' event would end the process (node-postgres, Pool events: error). The pool
  // drops them and connects anew on next use.
  pool.on('error', (err) => logger.warn({ err, pool: options.name }, 'idle database connection lost'));
  // A client in use (pool.connect()) has no listener of the pool's, so a connection lost between
  // two of its queries would end the process too. Ignored here: its next query fails, and the
  // pool drops it when it is released.
  pool.on('connect', (client) => client.on('error', () => undefined));
  return pool;
}
