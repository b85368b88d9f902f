// Runtime configuration from the environment, read once. Defaults suit `npm start` on one machine.
import path from 'node:path';

export const repoRoot = path.resolve(__dirname, '..');

/** Port of the private PostgreSQL cluster that `npm start` and `npm test` run (PATCHCAST_PG_PORT). */
export const localPgPort = (env: NodeJS.ProcessEnv = process.env): number => Number(env.PATCHCAST_PG_PORT ?? 54329);

export type Config = {
  env: 'development' | 'production' | 'test';
  port: number;
  databaseUrl: string;
  sessionSecret: string;
  appUrl: string;
  smtpUrl: string;
  mailFrom: string;
  /** Retries of an undelivered e-mail, waiting about mailRetryDelaySeconds × 2^n before retry n+1 (pg-boss backoff). */
  mailRetryLimit: number;
  mailRetryDelaySeconds: number;
  outboxDir: string;
  webDir: string;
  /** The development Outbox page and route; off in production. */
  outboxEnabled: boolean;
};

function envName(value: string | undefined): Config['env'] {
  return value === 'production' || value === 'test' ? value : 'development';
}

export function loadConfig(env: NodeJS.ProcessEnv = process.env): Config {
  const mode = envName(env.NODE_ENV);
  const port = Number(env.PORT ?? 8080);
  if (mode === 'production' && !env.SESSION_SECRET) {
    throw new Error('SESSION_SECRET must be set in production (a long random string).');
  }
  return {
    env: mode,
    port,
    databaseUrl: env.DATABASE_URL ?? `postgres://patchcast@127.0.0.1:${localPgPort(env)}/patchcast`,
    sessionSecret: env.SESSION_SECRET ?? 'patchcast-development-secret-not-for-production',
    appUrl: env.APP_URL ?? `http://localhost:${port}`,
    smtpUrl: env.SMTP_URL ?? 'smtp://127.0.0.1:2525',
    mailFrom: env.MAIL_FROM ?? 'Patchcast <no-reply@patchcast.local>',
    // 11 tries over about 13 hours (17 at most): an SMTP outage of an afternoon loses nothing.
    mailRetryLimit: Number(env.MAIL_RETRY_LIMIT ?? 10),
    mailRetryDelaySeconds: Number(env.MAIL_RETRY_DELAY_SECONDS ?? 30),
    outboxDir: env.OUTBOX_DIR ?? path.join(repoRoot, '.data', 'outbox'),
    webDir: env.WEB_DIR ?? path.join(repoRoot, 'dist'),
    outboxEnabled: mode !== 'production',
  };
}
