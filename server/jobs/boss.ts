// pg-boss in the application's own PostgreSQL (schema "pgboss"): one instance per process role,
// with the run and mail queues created before anything is sent or worked.
import PgBoss from 'pg-boss';
import type { PoolConfig } from 'pg';
import type { Logger } from 'pino';
import { CONNECT_TIMEOUT_MS } from '../db';
import type { JobSettings } from './settings';

export const QUEUES = {
  /** One job per shard: { runId, attempt, shardIndex }. */
  shard: 'run-shard',
  /** One job per finished attempt: { runId, attempt }; singletonKey run:attempt. */
  merge: 'run-merge',
  /** Jobs that failed for good (retries used up, or expired each time): the run is marked failed. */
  dead: 'run-dead',
  /** One job per outgoing e-mail (server/mail/mailer.ts); retries and expiry are set per job. */
  mail: 'mail',
} as const;

export type ShardJobData = { runId: number; attempt: number; shardIndex: number };
export type MergeJobData = { runId: number; attempt: number };

/** Retries of a shard or merge job after a crash, an expiry or an unexpected error. */
export const JOB_RETRY_LIMIT = 4;
/** A merge reads, merges and writes everything of a run in one transaction. */
export const MERGE_EXPIRY_SECONDS = 30 * 60;

export async function startBoss(databaseUrl: string, settings: JobSettings, logger: Logger, options: { supervise: boolean }): Promise<PgBoss> {
  // pg-boss hands its options on to pg.Pool (src/db.js), so the connect timeout applies to its
  // pool too, though its types do not list it.
  const bossOptions: PgBoss.ConstructorOptions & Pick<PoolConfig, 'connectionTimeoutMillis'> = {
    connectionString: databaseUrl,
    schema: 'pgboss',
    max: 4,
    application_name: 'patchcast-jobs',
    supervise: options.supervise,
    schedule: false,
    maintenanceIntervalSeconds: settings.maintenanceSeconds,
    connectionTimeoutMillis: CONNECT_TIMEOUT_MS,
  };
  const boss = new PgBoss(bossOptions);
  // Errors of its pool (idle connections lost) and of its polling loops while the database is
  // away: the loops keep polling and carry on once it is back, so these are warnings only.
  boss.on('error', (err) => logger.warn({ err }, 'job queue error'));
  await boss.start();
  await boss.createQueue(QUEUES.dead, { name: QUEUES.dead, retryLimit: 2 });
  await boss.createQueue(QUEUES.shard, { name: QUEUES.shard, retryLimit: JOB_RETRY_LIMIT, retryDelay: 0, deadLetter: QUEUES.dead });
  await boss.createQueue(QUEUES.merge, { name: QUEUES.merge, policy: 'stately', retryLimit: JOB_RETRY_LIMIT, retryDelay: 1, expireInSeconds: MERGE_EXPIRY_SECONDS, deadLetter: QUEUES.dead });
  await boss.createQueue(QUEUES.mail, { name: QUEUES.mail });
  return boss;
}

export type LazyBoss = { started(): Promise<PgBoss>; stop(): Promise<void> };

/** pg-boss for a side that only sends jobs, started on first use, so that one that never sends never connects. */
export function lazyBoss(databaseUrl: string, settings: JobSettings, logger: Logger): LazyBoss {
  let boss: Promise<PgBoss> | null = null;
  return {
    // A start that failed (the database away) is forgotten, so the next send tries again.
    started: () =>
      (boss ??= startBoss(databaseUrl, settings, logger, { supervise: false }).catch((err: unknown) => {
        boss = null;
        throw err;
      })),
    async stop() {
      if (boss) await (await boss).stop({ graceful: false, wait: true });
    },
  };
}
