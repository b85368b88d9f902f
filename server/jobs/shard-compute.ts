// One shard of a run: the kernel over patches [start, end) of one replicate, and for the shown
// replicate the shard's patch states cut into deflated chunks of steps. Pure CPU; runs on a thread.
import { deflateSync } from 'node:zlib';
import { simulateShard } from '../../shared/markov/kernel';
import type { RunSpec } from '../../shared/markov/run';

export type ShardInput = { spec: RunSpec; replicate: number; start: number; end: number; chunkSteps: number };

export type ShardOutput = {
  counts: Float64Array;
  areaByBlock: Float64Array;
  /** Deflated [steps of the chunk] × [end − start] states, chunk by chunk; null unless the shown replicate. */
  frames: Uint8Array[] | null;
};

/** Rows [first, last) of the shard's columns [start, end) from a step-major history of patchCount columns. */
function cutChunk(history: Uint8Array, patchCount: number, start: number, end: number, first: number, last: number): Uint8Array {
  const width = end - start;
  const out = new Uint8Array((last - first) * width);
  for (let s = first; s < last; s++) out.set(history.subarray(s * patchCount + start, s * patchCount + end), (s - first) * width);
  return out;
}

export function computeShard(input: ShardInput): ShardOutput {
  const { spec, replicate, start, end, chunkSteps } = input;
  const shown = replicate === spec.historyReplicate;
  // Only this shard's columns of the full-size history are written (and so only their pages used).
  const history = shown ? new Uint8Array((spec.steps + 1) * spec.patchCount) : undefined;
  const result = simulateShard(spec, { seed: spec.seed, replicate, start, end }, history);
  const frames: Uint8Array[] | null = history ? [] : null;
  if (history && frames) {
    for (let first = 0; first <= spec.steps; first += chunkSteps) {
      frames.push(deflateSync(cutChunk(history, spec.patchCount, start, end, first, Math.min(first + chunkSteps, spec.steps + 1)), { level: 1 }));
    }
  }
  return { counts: result.counts, areaByBlock: result.areaByBlock, frames };
}
