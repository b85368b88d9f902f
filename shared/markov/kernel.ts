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

/** Interleaved count histograms (lane = patch index mod LANES), so that runs of one state do not queue on one counter. */
const LANES = 4;
/** log2 of the entries per histogram lane: 16 > MAX_STATES (12). */
const LANE_BITS = 4;
const LANE = 1 << LANE_BITS;

/** The shard-wide inputs of every block (see simulateShard). */
type ShardPlan = {
  k: number;
  slots: number;
  buffer: Uint8Array;
  stride: number;
  origin: number;
  table: Uint8Array;
  thresholds: Float64Array;
  rowBase: Int32Array;
  areas: Float64Array | Float32Array;
  blockCounts: Float64Array;
  areaByBlock: Float64Array;
  /** LANES × LANE counters, reused by every step. */
  tally: Int32Array;
};

/** One block: patches [lo, hi) of the shard, its totals from areaBase, steps first…slots − 1 drawn. */
type BlockPlace = {
  lo: number;
  hi: number;
  first: number;
  areaBase: number;
  /** false when every patch of the block has the same area: totals are then area × count. */
  weighted: boolean;
};

/** Exact search for a draw whose bin straddles a threshold: the first j from the bin's candidate with r < T_j (sampler.ts). */
function straddleDraw(thresholds: Float64Array, at: number, j: number, u: number): number {
  while (u >= thresholds[at + j]) j++;
  return j;
}

/**
 * The hot loop: one step of `count` patches, states read at `from` and written at `to`, with the
 * block's xoshiro128** state s0…s3 carried in `stream`. Counts go to lane (i mod LANES) of `tally`;
 * a weighted block adds each area to sums[sumAt + state] in patch order, so that the doubles do
 * not depend on the split. Locals only: no property loads, closures or Math calls besides imul.
 */
function drawStep(
  stream: Int32Array,
  buffer: Uint8Array,
  from: number,
  to: number,
  count: number,
  table: Uint8Array,
  thresholds: Float64Array,
  rowBase: number,
  k: number,
  tally: Int32Array,
  weighted: boolean,
  areas: Float64Array | Float32Array,
  areaAt: number,
  sums: Float64Array,
  sumAt: number,
): void {
  const bits = TABLE_BITS;
  const shift = 32 - TABLE_BITS;
  const fallback = FALLBACK;
  let s0 = stream[0];
  let s1 = stream[1];
  let s2 = stream[2];
  let s3 = stream[3];
  for (let i = 0; i < count; i++) {
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
    const row = rowBase + buffer[from + i];
    let j = table[(row << bits) | (r >>> shift)];
    if (j >= fallback) j = straddleDraw(thresholds, row * k, j - fallback, r >>> 0);
    buffer[to + i] = j;
    tally[((i & (LANES - 1)) << LANE_BITS) | j]++;
    if (weighted) sums[sumAt + j] += areas[areaAt + i];
  }
  stream[0] = s0;
  stream[1] = s1;
  stream[2] = s2;
  stream[3] = s3;
}

/** Moves the lane tallies of one step into into[base + state] and clears them. */
function flushTally(tally: Int32Array, into: Float64Array, base: number, k: number): void {
  for (let j = 0; j < k; j++) into[base + j] = tally[j] + tally[LANE + j] + tally[2 * LANE + j] + tally[3 * LANE + j];
  tally.fill(0);
}

/** Step 0 of a block with given start states: the same tallies as drawStep, without draws. */
function tallyGiven(plan: ShardPlan, place: BlockPlace): void {
  const { buffer, origin, areas, blockCounts, areaByBlock } = plan;
  for (let i = place.lo; i < place.hi; i++) {
    blockCounts[place.areaBase + buffer[origin + i]]++;
    if (place.weighted) areaByBlock[place.areaBase + buffer[origin + i]] += areas[i];
  }
}

/** Steps first…slots − 1 of one block with its own stream. */
function runBlock(plan: ShardPlan, place: BlockPlace, stream: Int32Array): void {
  const { buffer, stride, table, thresholds, rowBase, k, tally, areas, blockCounts, areaByBlock } = plan;
  const { lo, hi, weighted, areaBase } = place;
  const start = plan.origin + lo;
  if (place.first > 0) tallyGiven(plan, place);
  for (let s = place.first; s < plan.slots; s++) {
    const from = start + (s === 0 ? 0 : (s - 1) * stride);
    const sumAt = areaBase + s * k;
    drawStep(stream, buffer, from, start + s * stride, hi - lo, table, thresholds, rowBase[s], k, tally, weighted, areas, lo, areaByBlock, sumAt);
    flushTally(tally, blockCounts, sumAt, k);
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
  const plan: ShardPlan = {
    k,
    slots,
    buffer: history ?? new Uint8Array(end - start),
    stride: history ? n : 0,
    origin: history ? start : 0,
    table,
    thresholds,
    rowBase,
    areas: spec.areas ? spec.areas.subarray(start, end) : new Float64Array(end - start).fill(1),
    blockCounts: new Float64Array(blockCount * slots * k),
    areaByBlock: new Float64Array(blockCount * slots * k),
    tally: new Int32Array(LANES * LANE),
  };
  const { buffer, origin, stride, areas, blockCounts, areaByBlock } = plan;
  for (let b = 0; b < blockCount; b++) {
    const lo = b * BLOCK_SIZE;
    const hi = Math.min(lo + BLOCK_SIZE, end - start);
    const areaBase = b * slots * k;
    const area = areas[lo];
    let weighted = false;
    for (let i = lo; i < hi; i++) weighted ||= areas[i] !== area;
    // Drawn starts are one more step from an all-zero row; given starts are copied in.
    if (initial.kind === 'distribution') buffer.fill(0, origin + lo, origin + hi);
    else buffer.set(initial.states.subarray(start + lo, start + hi), origin + lo);
    const place: BlockPlace = { lo, hi, first: initial.kind === 'distribution' ? 0 : 1, areaBase, weighted };
    runBlock(plan, place, new Int32Array(blockSeed(task.seed, task.replicate, start / BLOCK_SIZE + b).buffer));
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
