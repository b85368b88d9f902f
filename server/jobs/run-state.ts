// Status changes made by the pipeline, each one conditional on the run still being at the attempt
// and in the state the job expects, so that late or repeated jobs change nothing.
import type pg from 'pg';
import { planShards } from '../../shared/markov';
import type { RunSettings } from '../services/runs-inputs';
import { ACTIVE_RUN_STATUSES, type RunStatus } from '../../shared/schemas';

export type PipelineRun = RunSettings & { id: number; status: RunStatus; attempt: number; yearsPerStep: number; shardsPerReplicate: number; shardCount: number };

const ACTIVE = `(${ACTIVE_RUN_STATUSES.map((s) => `'${s}'`).join(', ')})`;

export async function readRun(db: pg.Pool | pg.PoolClient, runId: number, lock = false): Promise<PipelineRun | null> {
  const { rows } = await db.query(
    `SELECT id, status, attempt, steps, years_per_step, replicates, seed, shown_replicate, shards_per_replicate, shard_count FROM runs WHERE id = $1${lock ? ' FOR UPDATE' : ''}`,
    [runId],
  );
  const r = rows[0];
  if (!r) return null;
  return { id: r.id, status: r.status, attempt: r.attempt, steps: r.steps, yearsPerStep: r.years_per_step, replicates: r.replicates, seed: r.seed, shownReplicate: r.shown_replicate, shardsPerReplicate: r.shards_per_replicate, shardCount: r.shard_count };
}

export const isActive = (run: PipelineRun | null, attempt: number): run is PipelineRun =>
  run !== null && run.attempt === attempt && ACTIVE_RUN_STATUSES.includes(run.status);

export type ShardTaskRange = { replicate: number; start: number; end: number };

/** Shard i is replicate ⌊i / s⌋, patch range (i mod s) of planShards(patchCount, s), s shards per replicate. */
export function shardTask(run: PipelineRun, patchCount: number, shardIndex: number): ShardTaskRange {
  const [start, end] = planShards(patchCount, run.shardsPerReplicate)[shardIndex % run.shardsPerReplicate];
  return { replicate: Math.floor(shardIndex / run.shardsPerReplicate), start, end };
}

export async function markRunning(db: pg.Pool, runId: number, attempt: number): Promise<void> {
  await db.query(`UPDATE runs SET status = 'running', started_at = COALESCE(started_at, now()), updated_at = now() WHERE id = $1 AND attempt = $2 AND status = 'queued'`, [runId, attempt]);
}

/** Counts one more shard; null when the run was cancelled or retried meanwhile. */
export async function countShard(client: pg.PoolClient, runId: number, attempt: number): Promise<{ done: number; total: number } | null> {
  const { rows } = await client.query(
    `UPDATE runs SET shards_done = shards_done + 1,
       status = CASE WHEN shards_done + 1 = shard_count THEN 'merging' ELSE 'running' END,
       started_at = COALESCE(started_at, now()), updated_at = now()
     WHERE id = $1 AND attempt = $2 AND status IN ('queued', 'running') RETURNING shards_done, shard_count`,
    [runId, attempt],
  );
  return rows[0] ? { done: rows[0].shards_done, total: rows[0].shard_count } : null;
}

export async function markSucceeded(client: pg.PoolClient, runId: number): Promise<void> {
  await client.query(`UPDATE runs SET status = 'succeeded', finished_at = now(), updated_at = now() WHERE id = $1`, [runId]);
}

/** Marks the attempt failed with a reason; false when it had already ended. */
export async function markFailed(db: pg.Pool, runId: number, attempt: number, reason: string): Promise<boolean> {
  const { rowCount } = await db.query(
    `UPDATE runs SET status = 'failed', error = $3, finished_at = now(), updated_at = now() WHERE id = $1 AND attempt = $2 AND status IN ${ACTIVE}`,
    [runId, attempt, reason],
  );
  return (rowCount ?? 0) > 0;
}
