// A run worker: takes shard, merge and dead-letter jobs from pg-boss, and delivers queued mail.
// The web server runs one (embedded); `npm run worker` runs one per process against the same
// DATABASE_URL.
import type PgBoss from 'pg-boss';
import type { AppContext } from '../context';
import { createPool } from '../db';
import { workMail } from '../mail/sender';
import { JOB_RETRY_LIMIT, QUEUES, startBoss, type MergeJobData, type ShardJobData } from './boss';
import { bossDb } from './db';
import { createInputsCache } from './inputs-cache';
import { processMerge } from './merge-job';
import { failAttempt, type PipelineDeps } from './pipeline';
import { loadJobSettings, type JobSettings } from './settings';
import { createShardPool } from './shard-pool';
import { processShard } from './shard-job';
import { JOBS_SENT, localJobs } from './wake';

export type RunWorker = { stop(): Promise<void> };

type DeadJob = PgBoss.Job<ShardJobData | MergeJobData> & { output?: { value?: { message?: string }; message?: string } };

function deadReason(job: DeadJob): string {
  const why = job.output?.value?.message ?? job.output?.message ?? 'no error recorded';
  const part = 'shardIndex' in job.data ? `shard ${job.data.shardIndex + 1}` : 'the merge';
  return `The run stopped because ${part} did not complete after ${JOB_RETRY_LIMIT + 1} tries (last: ${why}). Retry the run; if it fails again, tell us.`;
}

export async function startRunWorker(ctx: Pick<AppContext, 'config' | 'mailer' | 'logger'>, settings: JobSettings = loadJobSettings()): Promise<RunWorker> {
  const boss = await startBoss(ctx.config.databaseUrl, settings, ctx.logger, { supervise: true });
  const pool = createPool(ctx.config.databaseUrl, { name: 'patchcast-worker', max: settings.concurrency + 3 }, ctx.logger);
  const shards = createShardPool(settings.concurrency);
  const workerIds: string[] = [];
  let mergeWorker = '';
  const deps: PipelineDeps = {
    ctx,
    pool,
    shards,
    inputs: createInputsCache(),
    settings,
    onAttemptComplete: async (client, data) => {
      await boss.send(QUEUES.merge, data, { singletonKey: `${data.runId}:${data.attempt}`, db: bossDb(client) });
    },
  };
  const poll = { pollingIntervalSeconds: settings.pollSeconds, batchSize: 1 };

  // Two job takers per thread: the next shard is fetched and waiting while the thread computes.
  for (let taker = 0; taker < 2 * settings.concurrency; taker++) {
    let id = '';
    id = await boss.work<ShardJobData>(QUEUES.shard, poll, async ([job]) => {
      const outcome = await processShard(deps, job.data);
      if (outcome === 'last') boss.notifyWorker(mergeWorker);
      // Straight on to the next shard rather than waiting for the next poll.
      boss.notifyWorker(id);
    });
    workerIds.push(id);
  }
  mergeWorker = await boss.work<MergeJobData>(QUEUES.merge, poll, async ([job]) => {
    await processMerge(deps, job.data);
  });
  workerIds.push(mergeWorker);
  workerIds.push(
    await boss.work<ShardJobData | MergeJobData>(QUEUES.dead, { ...poll, includeMetadata: true }, async ([job]) => {
      await failAttempt(deps, job.data.runId, job.data.attempt, deadReason(job as DeadJob));
    }),
  );
  workerIds.push(await workMail(boss, ctx.config, ctx.logger, settings.pollSeconds));

  const wake = (): void => workerIds.forEach((id) => boss.notifyWorker(id));
  localJobs.on(JOBS_SENT, wake);
  return {
    async stop() {
      localJobs.off(JOBS_SENT, wake);
      await boss.stop({ graceful: true, wait: true, timeout: 10_000 });
      await shards.close();
      await pool.end();
    },
  };
}
