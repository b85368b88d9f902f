// pg-boss in the application's own PostgreSQL (schema "pgboss"): one instance per process role,
// with the run queues created before anything is sent or worked.
import PgBoss from 'pg-boss';
import type { Logger } from 'pino';
import type { JobSettings } from './settings';

export const QUEUES = {
  /** One job per shard: { runId, attempt, shardIndex }. */
  shard: 'run-shard',
  /** One job per finished attempt: { runId, attempt }; singletonKey run:attempt. */
  merge: 'run-merge',
  /** Jobs that failed for good (retries used up, or expired each time): the run is marked failed. */
  dead: 'run-dead',
} as const;

export type ShardJobData = { runId: number; attempt: number; shardIndex: number };
export type MergeJobData = { runId: number; attempt: number };

/** Retries of a shard or merge job after a crash, an expiry or an unexpected error. */
export const JOB_RETRY_LIMIT = 4;
/** A merge reads, merges and writes everything of a run in one transaction. */
export const MERGE_EXPIRY_SECONDS = 30 * 60;

export async function startBoss(databaseUrl: string, settings: JobSettings, logger: Logger, options: { supervise: boolean }): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: databaseUrl,
    schema: 'pgboss',
    max: 4,
    application_name: 'patchcast-jobs',
    supervise: options.supervise,
    schedule: false,
    maintenanceIntervalSeconds: settings.maintenanceSeconds,
  });
  boss.on('error', (err) => logger.warn({ err }, 'job queue error'));
  await boss.start();
  await boss.createQueue(QUEUES.dead, { name: QUEUES.dead, retryLimit: 2 });
  await boss.createQueue(QUEUES.shard, { name: QUEUES.shard, retryLimit: JOB_RETRY_LIMIT, retryDelay: 0, deadLetter: QUEUES.dead });
  await boss.createQueue(QUEUES.merge, { name: QUEUES.merge, policy: 'stately', retryLimit: JOB_RETRY_LIMIT, retryDelay: 1, expireInSeconds: MERGE_EXPIRY_SECONDS, deadLetter: QUEUES.dead });
  return boss;
}
