// One shard: skip it if the run has moved on or the shard is stored already; otherwise compute it
// on a thread and store it with the progress count in one transaction (insert … on conflict do
// nothing; count only when inserted), queueing the merge when it was the last one.
import { setTimeout as delay } from 'node:timers/promises';
import type pg from 'pg';
import { AppError } from '../http/errors';
import { FRAME_CHUNK_STEPS } from '../../shared/schemas';
import { bytesOf, kernelSpecOf } from '../services/runs-inputs';
import type { ShardJobData } from './boss';
import { inTransaction } from './db';
import { failAttempt, type PipelineDeps } from './pipeline';
import { countShard, isActive, markRunning, readRun, shardTask } from './run-state';
import type { ShardOutput } from './shard-compute';
import { ShardComputeError } from './shard-pool';

export type ShardOutcome = 'skipped' | 'stored' | 'last';

/** The run was cancelled or retried while the shard ran. */
class RunMovedOn extends Error {}

async function isStored(pool: pg.Pool, data: ShardJobData): Promise<boolean> {
  const { rowCount } = await pool.query('SELECT 1 FROM run_shards WHERE run_id = $1 AND attempt = $2 AND shard_index = $3', [data.runId, data.attempt, data.shardIndex]);
  return (rowCount ?? 0) > 0;
}

async function storeShard(deps: PipelineDeps, data: ShardJobData, task: { replicate: number; start: number; end: number }, output: ShardOutput): Promise<ShardOutcome> {
  return inTransaction(deps.pool, async (client) => {
    const inserted = await client.query(
      `INSERT INTO run_shards (run_id, attempt, shard_index, replicate, patch_start, patch_end, counts, area_by_block, created_at, updated_at)
       VALUES ($1, $2, $3, $4, $5, $6, $7, $8, now(), now()) ON CONFLICT DO NOTHING`,
      [data.runId, data.attempt, data.shardIndex, task.replicate, task.start, task.end, bytesOf(output.counts), bytesOf(output.areaByBlock)],
    );
    if (inserted.rowCount === 0) return 'skipped';
    for (const [chunk, bytes] of (output.frames ?? []).entries()) {
      await client.query('INSERT INTO run_shard_frames (run_id, attempt, shard_index, chunk_index, bytes) VALUES ($1, $2, $3, $4, $5)', [data.runId, data.attempt, data.shardIndex, chunk, bytesOf(bytes)]);
    }
    const counted = await countShard(client, data.runId, data.attempt);
    // Cancelled or retried while this shard ran: keep nothing of it.
    if (!counted) throw new RunMovedOn();
    if (counted.done < counted.total) return 'stored';
    await deps.onAttemptComplete(client, { runId: data.runId, attempt: data.attempt });
    return 'last';
  });
}

/** Errors that will not go away on another try: the run fails at once with the reason. */
const isPermanent = (err: unknown): err is Error => err instanceof ShardComputeError || err instanceof AppError;

export async function processShard(deps: PipelineDeps, data: ShardJobData): Promise<ShardOutcome> {
  const run = await readRun(deps.pool, data.runId);
  if (!isActive(run, data.attempt) || run.status === 'merging' || (await isStored(deps.pool, data))) return 'skipped';
  await markRunning(deps.pool, data.runId, data.attempt);
  try {
    const frozen = await deps.inputs.get(data.runId);
    const task = shardTask(run, frozen.spec.patchCount, data.shardIndex);
    const output = await deps.shards.run({ spec: kernelSpecOf(frozen, run), ...task, chunkSteps: FRAME_CHUNK_STEPS });
    if (deps.settings.testShardDelayMs > 0) await delay(deps.settings.testShardDelayMs);
    return await storeShard(deps, data, task, output);
  } catch (err) {
    if (err instanceof RunMovedOn) return 'skipped';
    if (!isPermanent(err)) throw err;
    await failAttempt(deps, data.runId, data.attempt, `Shard ${data.shardIndex + 1} of ${run.shardCount} could not be simulated: ${err.message}`);
    return 'skipped';
  }
}
