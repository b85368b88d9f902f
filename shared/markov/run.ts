import { simulateShard, planShards, type KernelSpec, type ShardResult } from './kernel';
import { BLOCK_SIZE } from './streams';

/** A whole run: R replicates of the kernel, with the history of at most one replicate. */
export type RunSpec = KernelSpec & {
  seed: string;
  replicates: number;
  /** 0-based replicate whose patch states are kept for every step (the shown replicate), or null. */
  historyReplicate: number | null;
};

export type RunResult = {
  states: string[];
  steps: number;
  replicates: number;
  patchCount: number;
  /** counts[(r * (steps + 1) + s) * K + j]: patches in state j at step s of replicate r. */
  counts: Float64Array;
  /** Area-weighted totals, same layout; summed block by block in block order. */
  areaTotals: Float64Array;
  /** (steps + 1) × patchCount states of historyReplicate, step-major; null when not kept. */
  history: Uint8Array | null;
};

/** Every shard task of a run, replicate by replicate. */
export function runTasks(spec: RunSpec, shardsPerReplicate: number): { replicate: number; start: number; end: number }[] {
  const ranges = planShards(spec.patchCount, shardsPerReplicate);
  return Array.from({ length: spec.replicates }, (_, replicate) => ranges.map(([start, end]) => ({ replicate, start, end }))).flat();
}

/**
 * Combines shard results into a run result. Counts are integers (exact in any order); area totals
 * are added block by block in global block order, so the doubles are bit-identical for any split.
 */
export function mergeShards(spec: RunSpec, results: readonly ShardResult[], history: Uint8Array | null): RunResult {
  const k = spec.phases[0].matrix.states.length;
  const slots = spec.steps + 1;
  const counts = new Float64Array(spec.replicates * slots * k);
  const areaTotals = new Float64Array(spec.replicates * slots * k);
  const ordered = [...results].sort((a, b) => a.start - b.start);
  for (let r = 0; r < spec.replicates; r++) {
    const base = r * slots * k;
    let next = 0;
    for (const shard of ordered.filter((result) => result.replicate === r)) {
      if (shard.start !== next) throw new RangeError(`replicate ${r}: shards leave a gap or overlap at patch ${next}`);
      next = shard.end;
      for (let i = 0; i < slots * k; i++) counts[base + i] += shard.counts[i];
      const blocks = Math.ceil((shard.end - shard.start) / BLOCK_SIZE);
      for (let b = 0; b < blocks; b++) {
        for (let i = 0; i < slots * k; i++) areaTotals[base + i] += shard.areaByBlock[b * slots * k + i];
      }
    }
    if (next !== spec.patchCount) throw new RangeError(`replicate ${r}: shards cover ${next} of ${spec.patchCount} patches`);
  }
  return { states: [...spec.phases[0].matrix.states], steps: spec.steps, replicates: spec.replicates, patchCount: spec.patchCount, counts, areaTotals, history };
}

/** Runs every shard in this thread (browser, tests, small runs); the result does not depend on `shards`. */
export function simulateRun(spec: RunSpec, shards = 1): RunResult {
  const history = spec.historyReplicate === null ? null : new Uint8Array((spec.steps + 1) * spec.patchCount);
  const results = runTasks(spec, shards).map((task) =>
    simulateShard(spec, { seed: spec.seed, ...task }, task.replicate === spec.historyReplicate && history ? history : undefined),
  );
  return mergeShards(spec, results, history);
}
