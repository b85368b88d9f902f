import { jStat } from 'jstat';
import { simulateShard, type KernelSpec } from './kernel';
import { createMatrix } from './matrix';
import { expectedPath } from './projection';
import { simulateRun, type RunSpec } from './run';
import { lookupDraw, buildLookupTable } from './sampler';
import { BLOCK_SIZE, blockSeed, createStream, Xoshiro128 } from './streams';
import { randomMatrix } from './testing';

const oz = createMatrix(['R', 'N', 'S'], [[0.5, 0.25, 0.25], [0.5, 0, 0.5], [0.25, 0.25, 0.5]]);

/** Straightforward reference: one Xoshiro128 per block, lookupDraw per patch, no tricks. */
function referenceHistory(spec: KernelSpec, seed: string): Uint8Array {
  const n = spec.patchCount;
  const k = spec.phases[0].matrix.states.length;
  const distribution = spec.initial.kind === 'distribution' ? spec.initial.distribution : null;
  const lut = buildLookupTable(spec.phases.flatMap((p) => p.matrix.rows));
  const start = distribution ? buildLookupTable([[...distribution]]) : null;
  const out = new Uint8Array((spec.steps + 1) * n);
  for (let b = 0; b * BLOCK_SIZE < n; b++) {
    const g = new Xoshiro128(blockSeed(seed, 0, b));
    const hi = Math.min(n, (b + 1) * BLOCK_SIZE);
    for (let i = b * BLOCK_SIZE; i < hi; i++) {
      out[i] = start ? lookupDraw(start, 0, g.nextUint32()) : (spec.initial as { states: Uint8Array }).states[i];
    }
    for (let t = 1; t <= spec.steps; t++) {
      const phase = spec.phases.filter((p) => p.startStep <= t - 1).length - 1;
      for (let i = b * BLOCK_SIZE; i < hi; i++) out[t * n + i] = lookupDraw(lut, phase * k + out[(t - 1) * n + i], g.nextUint32());
    }
  }
  return out;
}

const bytes = (a: Float64Array | Uint8Array): Buffer => Buffer.from(a.buffer, a.byteOffset, a.byteLength);

describe('kernel', () => {
  const fire = randomMatrix(3, createStream('phases', 'fire'));
  const twoPhases = [
    { startStep: 0, matrix: createMatrix(oz.states, fire.rows) },
    { startStep: 4, matrix: oz },
  ];

  test('the optimised loop equals the plain reference draw for draw (one phase and two phases)', () => {
    for (const phases of [[{ startStep: 0, matrix: oz }], twoPhases]) {
      const spec: KernelSpec = { phases, steps: 9, patchCount: 2 * BLOCK_SIZE + 123, initial: { kind: 'distribution', distribution: [0.2, 0.3, 0.5] } };
      const history = new Uint8Array((spec.steps + 1) * spec.patchCount);
      simulateShard(spec, { seed: 'ref', replicate: 0, start: 0, end: spec.patchCount }, history);
      expect(bytes(history).equals(bytes(referenceHistory(spec, 'ref')))).toBe(true);
    }
  });

  test('byte-identical counts, area totals and history for the same seed with 1, 2 and 7 shards', () => {
    const areaStream = createStream('areas', 'test');
    const patchCount = 9 * BLOCK_SIZE + 1000;
    const areas = new Float64Array(patchCount).map((_, i) => (i % 97 === 0 ? 100 * areaStream.nextFloat() : 900));
    const spec: RunSpec = { phases: twoPhases, steps: 12, patchCount, replicates: 3, seed: 'shards', historyReplicate: 1, areas, initial: { kind: 'distribution', distribution: [0.6, 0.3, 0.1] } };
    const [one, two, seven] = [1, 2, 7].map((shards) => simulateRun(spec, shards));
    for (const other of [two, seven]) {
      expect(bytes(other.counts).equals(bytes(one.counts))).toBe(true);
      expect(bytes(other.areaTotals).equals(bytes(one.areaTotals))).toBe(true);
      expect(bytes(other.history as Uint8Array).equals(bytes(one.history as Uint8Array))).toBe(true);
    }
    const other = simulateRun({ ...spec, seed: 'shards!' }, 2);
    expect(bytes(other.counts).equals(bytes(one.counts))).toBe(false);
  });

  test('area totals are the area-weighted counts of the history', () => {
    const patchCount = 3 * BLOCK_SIZE;
    const areas = new Float32Array(patchCount).map((_, i) => (i < BLOCK_SIZE ? 400 : 1 + (i % 7)));
    const result = simulateRun({ phases: [{ startStep: 0, matrix: oz }], steps: 3, patchCount, replicates: 1, seed: 'a', historyReplicate: 0, areas, initial: { kind: 'distribution', distribution: [1 / 3, 1 / 3, 1 / 3] } });
    for (let s = 0; s <= 3; s++) {
      const expected = [0, 0, 0];
      for (let i = 0; i < patchCount; i++) expected[(result.history as Uint8Array)[s * patchCount + i]] += areas[i];
      expected.forEach((v, j) => expect(result.areaTotals[s * 3 + j]).toBeCloseTo(v, 6));
    }
  });

  test('given start states are kept at step 0 and absorbing states never leave', () => {
    const absorbing = createMatrix(['A', 'B'], [[1, 0], [0.3, 0.7]]);
    const states = new Uint8Array(5000).map((_, i) => i % 2);
    const result = simulateRun({ phases: [{ startStep: 0, matrix: absorbing }], steps: 20, patchCount: 5000, replicates: 1, seed: 's', historyReplicate: 0, initial: { kind: 'states', states } });
    const history = result.history as Uint8Array;
    expect(bytes(history.subarray(0, 5000)).equals(bytes(states))).toBe(true);
    for (let i = 0; i < 5000; i += 2) expect(history[20 * 5000 + i]).toBe(0);
  });

  test('mean shares follow x_t = x_0 P^t within binomial bounds (patches independent: count ~ Binomial(N, x_t[j]))', () => {
    const patchCount = 200_000;
    const steps = 10;
    const x0 = [0.7, 0.2, 0.1];
    const result = simulateRun({ phases: twoPhases, steps, patchCount, replicates: 2, seed: 'binomial', historyReplicate: null, initial: { kind: 'distribution', distribution: x0 } });
    const path = expectedPath(x0, twoPhases, steps);
    // Two-sided α = 0.001 over all (replicate, step, state) checks, Bonferroni.
    const checks = 2 * (steps + 1) * 3;
    const z = jStat.normal.inv(1 - 0.001 / (2 * checks), 0, 1);
    for (let r = 0; r < 2; r++) {
      for (let s = 0; s <= steps; s++) {
        path[s].forEach((x, j) => {
          const count = result.counts[(r * (steps + 1) + s) * 3 + j];
          expect(Math.abs(count - patchCount * x)).toBeLessThan(z * Math.sqrt(patchCount * x * (1 - x)));
        });
      }
    }
  });
});
