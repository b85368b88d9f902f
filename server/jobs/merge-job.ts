// The merge of an attempt whose shards are all stored, in one transaction with the run row
// locked: mergeShards over the shard rows, the summary, the shown replicate's patch states
// re-cut into chunks of FRAME_CHUNK_STEPS steps over all patches, then "succeeded". A repeated
// merge job finds the run no longer merging and does nothing.
import { promisify } from 'node:util';
import { deflate, inflate } from 'node:zlib';
import type pg from 'pg';
import { mergeShards, type ShardResult } from '../../shared/markov';
import { FRAME_CHUNK_STEPS } from '../../shared/schemas';
import { bytesOf, kernelSpecOf, type FrozenInputs } from '../services/runs-inputs';
import { summariseRun } from '../services/runs-summary';
import { notifyRunEnded } from '../services/runs-notify';
import type { MergeJobData } from './boss';
import { inTransaction } from './db';
import type { PipelineDeps } from './pipeline';
import { markSucceeded, readRun, type PipelineRun } from './run-state';

const deflateAsync = promisify(deflate);
const inflateAsync = promisify(inflate);

const float64s = (bytes: Buffer): Float64Array => new Float64Array(new Uint8Array(bytes).buffer);

async function shardResults(client: pg.PoolClient, data: MergeJobData): Promise<ShardResult[]> {
  const { rows } = await client.query('SELECT replicate, patch_start, patch_end, counts, area_by_block FROM run_shards WHERE run_id = $1 AND attempt = $2 ORDER BY shard_index', [data.runId, data.attempt]);
  return rows.map((r) => ({ replicate: r.replicate, start: r.patch_start, end: r.patch_end, counts: float64s(r.counts), areaByBlock: float64s(r.area_by_block), finalStates: new Uint8Array(0) }));
}

/** One chunk of steps over all patches, from the shown replicate's shard pieces of that chunk. */
async function assembleChunk(client: pg.PoolClient, data: MergeJobData, chunk: number, steps: number, patchCount: number): Promise<Buffer> {
  const first = chunk * FRAME_CHUNK_STEPS;
  const rowsInChunk = Math.min(FRAME_CHUNK_STEPS, steps + 1 - first);
  const out = new Uint8Array(rowsInChunk * patchCount);
  const { rows } = await client.query(
    `SELECT f.bytes, s.patch_start, s.patch_end FROM run_shard_frames f
     JOIN run_shards s ON s.run_id = f.run_id AND s.attempt = f.attempt AND s.shard_index = f.shard_index
     WHERE f.run_id = $1 AND f.attempt = $2 AND f.chunk_index = $3`,
    [data.runId, data.attempt, chunk],
  );
  // One shard over every patch already holds this chunk in the stored layout: keep its bytes.
  if (rows.length === 1 && rows[0].patch_start === 0 && rows[0].patch_end === patchCount) return rows[0].bytes as Buffer;
  for (const row of rows) {
    const piece = await inflateAsync(row.bytes);
    const width = row.patch_end - row.patch_start;
    for (let r = 0; r < rowsInChunk; r++) out.set(piece.subarray(r * width, (r + 1) * width), r * patchCount + row.patch_start);
  }
  return deflateAsync(out, { level: 1 });
}

async function writeResults(client: pg.PoolClient, run: PipelineRun, data: MergeJobData, frozen: FrozenInputs): Promise<void> {
  const spec = kernelSpecOf(frozen, run);
  const merged = mergeShards(spec, await shardResults(client, data), null);
  const summary = summariseRun(run.id, frozen.spec, spec, run.yearsPerStep, merged);
  await client.query(
    `INSERT INTO run_results (run_id, area, counts, summary, created_at, updated_at) VALUES ($1, $2, $3, $4, now(), now())
     ON CONFLICT (run_id) DO UPDATE SET area = EXCLUDED.area, counts = EXCLUDED.counts, summary = EXCLUDED.summary, updated_at = now()`,
    [run.id, bytesOf(merged.areaTotals), bytesOf(merged.counts), JSON.stringify(summary)],
  );
  await client.query('DELETE FROM run_frames WHERE run_id = $1', [run.id]);
  const chunks = Math.ceil((run.steps + 1) / FRAME_CHUNK_STEPS);
  for (let chunk = 0; chunk < chunks; chunk++) {
    const bytes = await assembleChunk(client, data, chunk, run.steps, frozen.spec.patchCount);
    await client.query('INSERT INTO run_frames (run_id, chunk_index, bytes) VALUES ($1, $2, $3)', [run.id, chunk, bytes]);
  }
  // The shard rows have served their purpose; the run's results are what stays.
  await client.query('DELETE FROM run_shard_frames WHERE run_id = $1', [run.id]);
  await client.query('DELETE FROM run_shards WHERE run_id = $1', [run.id]);
}

export async function processMerge(deps: PipelineDeps, data: MergeJobData): Promise<'skipped' | 'merged'> {
  const outcome = await inTransaction(deps.pool, async (client) => {
    const run = await readRun(client, data.runId, true);
    if (!run || run.attempt !== data.attempt || run.status !== 'merging') return 'skipped' as const;
    await writeResults(client, run, data, await deps.inputs.get(run.id));
    await markSucceeded(client, run.id);
    return 'merged' as const;
  });
  if (outcome === 'merged') await notifyRunEnded(deps.ctx, data.runId);
  return outcome;
}
