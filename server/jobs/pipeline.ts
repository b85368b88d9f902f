// What the shard and merge steps need, whether they run under pg-boss (worker.ts) or at once in
// this process (execute-now.ts).
import type pg from 'pg';
import type { AppContext } from '../context';
import type { InputsCache } from './inputs-cache';
import type { MergeJobData } from './boss';
import type { JobSettings } from './settings';
import type { ShardPool } from './shard-pool';
import { markFailed } from './run-state';
import { notifyRunEnded } from '../services/runs-notify';

export type PipelineDeps = {
  ctx: Pick<AppContext, 'config' | 'mailer' | 'logger'>;
  pool: pg.Pool;
  shards: ShardPool;
  inputs: InputsCache;
  settings: JobSettings;
  /** Called inside the transaction that counted the attempt's last shard: queue its merge there. */
  onAttemptComplete(client: pg.PoolClient, data: MergeJobData): Promise<void>;
};

/** Ends the attempt as failed with a reason people can act on, and tells them. */
export async function failAttempt(deps: PipelineDeps, runId: number, attempt: number, reason: string): Promise<void> {
  if (await markFailed(deps.pool, runId, attempt, reason)) await notifyRunEnded(deps.ctx, runId);
}
