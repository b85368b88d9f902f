// Reading a finished run: the per-step summary, and the map of any step of the shown replicate
// (one byte per patch, from the deflated chunk holding that step).
import { promisify } from 'node:util';
import { inflate } from 'node:zlib';
import { RunFrame, RunResultRow } from '../models';
import { AppError } from '../http/errors';
import { FRAME_CHUNK_STEPS, type RunSummary } from '../../shared/schemas';
import type { RunAccess } from './runs';

const inflateAsync = promisify(inflate);

/** 409 unless the run has finished with results. */
export function requireSucceeded(access: RunAccess): void {
  const { run } = access;
  if (run.status === 'succeeded') return;
  const why = run.status === 'failed' ? `it failed: ${run.error ?? 'no reason recorded'}` : run.status === 'cancelled' ? 'it was cancelled' : `it is ${run.status}`;
  throw new AppError(409, 'run_not_finished', `Run ${run.id} has no results: ${why}.`);
}

export async function runSummary(access: RunAccess): Promise<RunSummary> {
  requireSucceeded(access);
  const row = await RunResultRow.findByPk(access.run.id, { attributes: ['summary'] });
  if (!row) throw new AppError(409, 'run_not_finished', `Run ${access.run.id} has no results yet.`);
  return row.summary;
}

/** Patch states of the shown replicate at `step`, one byte (state index) per patch. */
export async function runFrame(access: RunAccess, step: number): Promise<Buffer> {
  requireSucceeded(access);
  const { run } = access;
  if (step > run.steps) throw new AppError(400, 'invalid_input', `Invalid path: step must be between 0 and ${run.steps}, the run's last step.`);
  const chunk = await RunFrame.findOne({ where: { runId: run.id, chunkIndex: Math.floor(step / FRAME_CHUNK_STEPS) } });
  if (!chunk) throw new AppError(409, 'run_not_finished', `Run ${run.id} has no stored map for step ${step}.`);
  const patches = run.inputsSummary.patchCount;
  const at = (step % FRAME_CHUNK_STEPS) * patches;
  return (await inflateAsync(chunk.bytes)).subarray(at, at + patches);
}
