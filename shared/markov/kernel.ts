import { MarkovInputError } from './errors';
import { phaseOfStep, validatePhases, type Phase } from './phases';
import { buildLookupTable, FALLBACK, TABLE_BITS } from './sampler';
import { BLOCK_SIZE, blockSeed } from './streams';

/** Step-0 states: given per patch (e.g. from a cover map), or drawn per patch from shares. */
export type InitialCover =
  | { kind: 'states'; states: Uint8Array }
  | { kind: 'distribution'; distribution: readonly number[] };

/** What to simulate: the same for every shard and replicate of a run. */
export type KernelSpec = {
  phases: readonly Phase[];
  steps: number;
  patchCount: number;
  initial: InitialCover;
  /** Area of each patch (m²); without it every patch weighs 1 and area totals equal counts. */
  areas?: Float64Array | Float32Array;
};

/**
 * Part of one replicate: patches [start, end). start must be a multiple of BLOCK_SIZE and end a
 * multiple of it or patchCount, so that each block's stream is consumed whole and in order.
 */
export type ShardTask = { seed: string; replicate: number; start: number; end: number };

export type ShardResult = {
  replicate: number;
  start: number;
  end: number;
  /** counts[s * K + j]: patches in state j at step s, s = 0…steps. */
  counts: Float64Array;
  /** Area totals per block of the shard, in block order: [(block * (steps + 1) + s) * K + j]. */
  areaByBlock: Float64Array;
  /** States at the last step of patches start…end − 1. */
  finalStates: Uint8Array;
};

function checkSpec(spec: KernelSpec): number {
  validatePhases(spec.phases);
  const k = spec.phases[0].matrix.states.length;
  if (!Number.isInteger(spec.steps) || spec.steps < 0) throw new MarkovInputError(`steps must be a whole number ≥ 0, got ${spec.steps}`);
  if (!Number.isInteger(spec.patchCount) || spec.patchCount < 1) {
    throw new MarkovInputError(`patch count must be a whole number ≥ 1, got ${spec.patchCount}`);
  }
  if (spec.areas && spec.areas.length !== spec.patchCount) {
    throw new MarkovInputError(`${spec.areas.length} patch areas given for ${spec.patchCount} patches`);
  }
  if (spec.initial.kind === 'states') {
    const given = spec.initial.states;
    if (given.length !== spec.patchCount) throw new MarkovInputError(`${given.length} start states for ${spec.patchCount} patches`);
    const bad = given.findIndex((s) => s >= k);
    if (bad >= 0) throw new MarkovInputError(`patch ${bad} starts in state ${given[bad]}; states are 0…${k - 1}`);
  } else if (spec.initial.distribution.length !== k) {
    throw new MarkovInputError(`start shares have ${spec.initial.distribution.length} entries for ${k} states`);
  }
  return k;
}

/** Block-aligned [start, end) ranges splitting patchCount patches into at most `count` shards. */
export function planShards(patchCount: number, count: number): [number, number][] {
  const blocks = Math.ceil(patchCount / BLOCK_SIZE);
  const shards = Math.max(1, Math.min(count, blocks));
  const out: [number, number][] = [];
  for (let n = 0; n < shards; n++) {
    const from = Math.floor((n * blocks) / shards) * BLOCK_SIZE;
    const to = Math.min(patchCount, Math.floor(((n + 1) * blocks) / shards) * BLOCK_SIZE);
    out.push([from, to]);
  }
  return out;
}

/** Where one block sits in the shard's buffers (see simulateShard). */
type BlockPlace = {
  lo: number;
  hi: number;
  first: number;
  slots: number;
  stride: number;
  origin: number;
  k: number;
  areaBase: number;
  /** false when every patch of the block has the same area: totals are then area × count. */
  weighted: boolean;
};

/**
 * The hot loop: steps `first`…slots − 1 of one block with its own stream. Kept in its own small
 * function with everything in locals so that V8 compiles it tightly.
 */
function runBlock(
  seed: Uint32Array,
  place: BlockPlace,
  buffer: Uint8Array,
  table: Uint8Array,
  thresholds: Float64Array,
  rowBase: Int32Array,
  blockCounts: Float64Array,
  areaByBlock: Float64Array,
  areas: Float64Array | Float32Array,
): void {
  const { lo, hi, first, slots, stride, origin, k, areaBase, weighted } = place;
  const bits = TABLE_BITS;
  const shift = 32 - TABLE_BITS;
  const fallback = FALLBACK;
  let s0 = seed[0] | 0;
  let s1 = seed[1] | 0;
  let s2 = seed[2] | 0;
  let s3 = seed[3] | 0;
  for (let s = first; s < slots; s++) {
    const from = origin + (s === 0 ? 0 : (s - 1) * stride);
    const to = origin + s * stride;
    const base = rowBase[s];
    const sumBase = areaBase + s * k;
    for (let i = lo; i < hi; i++) {
      // xoshiro128** step, inlined from streams.ts (Xoshiro128.nextUint32).
      const m = Math.imul(s1, 5);
      const r = Math.imul((m << 7) | (m >>> 25), 9);
      const t = s1 << 9;
      s2 ^= s0;
      s3 ^= s1;
      s1 ^= s2;
      s0 ^= s3;
      s2 ^= t;
      s3 = (s3 << 11) | (s3 >>> 21);
      // Lookup-table draw, inlined from sampler.ts (lookupDraw).
      const row = base + buffer[from + i];
      let j = table[(row << bits) | (r >>> shift)];
      if (j >= fallback) {
        j -= fallback;
        const tb = row * k;
        const u = r >>> 0;
        while (u >= thresholds[tb + j]) j++;
      }
      buffer[to + i] = j;
      blockCounts[sumBase + j]++;
      if (weighted) areaByBlock[sumBase + j] += areas[i];
    }
  }
}

/**
 * Simulates patches [start, end) of one replicate for all steps. Each block of BLOCK_SIZE patches
 * is run through every step with its own xoshiro128** stream (seeded by blockSeed), one raw draw
 * per patch per step, in patch order within a step; so each patch's path depends only on (seed,
 * replicate, block, position), never on the sharding. Draws go through the lookup table
 * (sampler.ts): exact inverse-CDF on the 2⁻³² grid. With `history` ((steps + 1) × patchCount
 * bytes, step-major, e.g. over a SharedArrayBuffer) the states are written there and read back
 * from the previous step's row; otherwise a small per-shard buffer is updated in place. Nothing
 * is allocated inside the step loop.
 */
export function simulateShard(spec: KernelSpec, task: ShardTask, history?: Uint8Array): ShardResult {
  const k = checkSpec(spec);
  const { steps, patchCount: n } = spec;
  const { start, end } = task;
  if (start < 0 || start % BLOCK_SIZE !== 0 || end <= start || end > n || (end % BLOCK_SIZE !== 0 && end !== n)) {
    throw new RangeError(`shard [${start}, ${end}) is not block-aligned within ${n} patches`);
  }
  if (history && history.length !== (steps + 1) * n) {
    throw new RangeError(`history holds ${history.length} bytes; ${(steps + 1) * n} needed`);
  }
  const slots = steps + 1;
  const initial = spec.initial;
  // Lookup-table rows: K per phase, then (for drawn starts) the start shares, so that the start
  // draw is one more step, from an all-zero buffer through that row.
  const phaseRows = spec.phases.flatMap((phase) => phase.matrix.rows);
  const lut = buildLookupTable(initial.kind === 'distribution' ? [...phaseRows, [...initial.distribution]] : phaseRows);
  const { table, thresholds } = lut;
  const phaseAt = phaseOfStep(spec.phases, steps);
  const rowBase = new Int32Array(slots);
  rowBase[0] = spec.phases.length * k;
  for (let s = 1; s < slots; s++) rowBase[s] = phaseAt[s - 1] * k;

  const blockCount = Math.ceil((end - start) / BLOCK_SIZE);
  const blockCounts = new Float64Array(blockCount * slots * k);
  const areaByBlock = new Float64Array(blockCount * slots * k);
  const areas = spec.areas ? spec.areas.subarray(start, end) : new Float32Array(end - start).fill(1);
  const buffer = history ?? new Uint8Array(end - start);
  const stride = history ? n : 0;
  const origin = history ? start : 0;

  for (let b = 0; b < blockCount; b++) {
    const lo = b * BLOCK_SIZE;
    const hi = Math.min(lo + BLOCK_SIZE, end - start);
    const areaBase = b * slots * k;
    const area = areas[lo];
    let weighted = false;
    for (let i = lo; i < hi; i++) weighted ||= areas[i] !== area;
    let first = 1;
    if (initial.kind === 'distribution') {
      first = 0;
      buffer.fill(0, origin + lo, origin + hi);
    } else {
      for (let i = lo; i < hi; i++) {
        const j = initial.states[start + i];
        buffer[origin + i] = j;
        blockCounts[areaBase + j]++;
        if (weighted) areaByBlock[areaBase + j] += areas[i];
      }
    }
    const place: BlockPlace = { lo, hi, first, slots, stride, origin, k, areaBase, weighted };
    runBlock(blockSeed(task.seed, task.replicate, start / BLOCK_SIZE + b), place, buffer, table, thresholds, rowBase, blockCounts, areaByBlock, areas);
    // Blocks of equal-area patches (all but the boundary of a grid) skip the per-patch adds.
    if (!weighted) for (let i = areaBase; i < areaBase + slots * k; i++) areaByBlock[i] = area * blockCounts[i];
  }
  const counts = new Float64Array(slots * k);
  for (let i = 0; i < blockCounts.length; i++) counts[i % (slots * k)] += blockCounts[i];
  const last = origin + steps * stride;
  return {
    replicate: task.replicate,
    start,
    end,
    counts,
    areaByBlock,
    finalStates: buffer.slice(last, last + end - start),
  };
}
