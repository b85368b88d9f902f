// The web server's side of the queue: sends one shard job per shard of a run attempt. pg-boss
// starts on first use, so that an app that never starts a run never connects it.
import type { Logger } from 'pino';
import { JOB_RETRY_LIMIT, QUEUES, lazyBoss, type ShardJobData } from './boss';
import { loadJobSettings, shardExpirySeconds } from './settings';
import { JOBS_SENT, localJobs } from './wake';

/** shownShards: the first shards are the shown replicate's, slower (they keep every step's map), so they are taken first. */
export type AttemptToQueue = { runId: number; attempt: number; shardCount: number; shownShards: number; patchStepsPerShard: number };

export type RunQueue = { sendAttempt(attempt: AttemptToQueue): Promise<void>; stop(): Promise<void> };

export function createRunQueue(databaseUrl: string, logger: Logger): RunQueue {
  const settings = loadJobSettings();
  const boss = lazyBoss(databaseUrl, settings, logger);
  return {
    async sendAttempt({ runId, attempt, shardCount, shownShards, patchStepsPerShard }) {
      const expireInSeconds = shardExpirySeconds(settings, patchStepsPerShard);
      const jobs = Array.from({ length: shardCount }, (_, shardIndex) => ({
        name: QUEUES.shard,
        data: { runId, attempt, shardIndex } satisfies ShardJobData,
        priority: shardIndex < shownShards ? 1 : 0,
        expireInSeconds,
        retryLimit: JOB_RETRY_LIMIT,
      }));
      await (await boss.started()).insert(jobs);
      localJobs.emit(JOBS_SENT);
    },
    stop: boss.stop,
  };
}
