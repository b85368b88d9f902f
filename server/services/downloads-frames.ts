// The shown replicate's patch states, step after step: each deflated chunk of FRAME_CHUNK_STEPS
// steps is read and inflated once, so a long history streams without holding every step.
import { promisify } from 'node:util';
import { inflate } from 'node:zlib';
import { RunFrame } from '../models';
import { AppError } from '../http/errors';
import { FRAME_CHUNK_STEPS } from '../../shared/schemas';
import type { RunAccess } from './runs';

const inflateAsync = promisify(inflate);

export type StepFrame = { step: number; states: Uint8Array };

/** Yields { step, states } for steps 0…run.steps of a finished run, one byte (state index) per patch. */
export async function* runFrames(access: RunAccess): AsyncGenerator<StepFrame> {
  const { run } = access;
  const patches = run.inputsSummary.patchCount;
  for (let chunkIndex = 0; chunkIndex * FRAME_CHUNK_STEPS <= run.steps; chunkIndex++) {
    const chunk = await RunFrame.findOne({ where: { runId: run.id, chunkIndex } });
    if (!chunk) throw new AppError(409, 'run_not_finished', `Run ${run.id} has no stored maps for steps from ${chunkIndex * FRAME_CHUNK_STEPS}.`);
    const bytes = await inflateAsync(chunk.bytes);
    const last = Math.min(run.steps, (chunkIndex + 1) * FRAME_CHUNK_STEPS - 1);
    for (let step = chunkIndex * FRAME_CHUNK_STEPS; step <= last; step++) {
      const at = (step % FRAME_CHUNK_STEPS) * patches;
      yield { step, states: bytes.subarray(at, at + patches) };
    }
  }
}
