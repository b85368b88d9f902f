import { execFileSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { absorbingAnalysis } from './absorbing';
import { analyzeChain } from './analysis';
import { classify } from './classify';
import { createMatrix, type TransitionMatrix } from './matrix';
import { createStream } from './streams';
import { randomMatrix } from './testing';

// Reference: NumPy from Debian's python3-numpy, run as /usr/bin/python3 (the pyenv python3 on PATH
// has no numpy). Script and methods: tests/reference/markov_numpy.py.
const PYTHON = '/usr/bin/python3';
const SCRIPT = join(__dirname, '..', '..', 'tests', 'reference', 'markov_numpy.py');

type Case = { rows: number[][]; x0: number[]; steps: number[]; kind: 'ergodic' | 'absorbing'; transient: number[]; absorbing: number[] };
type Reference = {
  moduli: number[];
  projection: number[][];
  stationary?: number[];
  meanFirstPassage?: number[][];
  fundamental?: number[][];
  expectedSteps?: number[];
  probabilities?: number[][];
};

/** An absorbing chain: the first `a` states absorbing, the rest a random chain leaking into them. */
function randomAbsorbing(k: number, a: number, seed: string): TransitionMatrix {
  const base = randomMatrix(k, createStream(seed, 'absorbing'), 0.3);
  const rows = base.rows.map((row, i) => (i < a ? row.map((_, j) => (i === j ? 1 : 0)) : row));
  return createMatrix(base.states, rows);
}

function reference(cases: Case[]): Reference[] {
  if (!existsSync(PYTHON)) throw new Error(`${PYTHON} not found: install Debian's python3 and python3-numpy`);
  const out = execFileSync(PYTHON, [SCRIPT], { input: JSON.stringify({ cases }) });
  return JSON.parse(out.toString()) as Reference[];
}

const close = (actual: readonly number[], expected: readonly number[], tol: number): void => {
  expect(actual).toHaveLength(expected.length);
  actual.forEach((v, i) => expect(Math.abs(v - expected[i])).toBeLessThan(tol));
};

describe('random matrices against NumPy', () => {
  const stream = createStream('numpy-reference', 'matrices');
  const ergodic = Array.from({ length: 40 }, (_, n) => randomMatrix(2 + (n % 11), stream, n % 3 === 0 ? 0.5 : 0)).filter(
    (m) => classify(m.rows).classes.length === 1,
  );
  const absorbing = Array.from({ length: 20 }, (_, n) => randomAbsorbing(3 + (n % 10), 1 + (n % 2), `abs-${n}`));
  const steps = [1, 3, 10, 50];
  const cases: Case[] = [
    ...ergodic.map((m) => ({ rows: m.rows, x0: m.rows[0], steps, kind: 'ergodic' as const, transient: [], absorbing: [] })),
    ...absorbing.map((m) => {
      const c = classify(m.rows);
      return { rows: m.rows, x0: m.rows[m.rows.length - 1], steps, kind: 'absorbing' as const, transient: c.transient, absorbing: c.absorbing };
    }),
  ];
  const expected = reference(cases);

  test('there are enough cases of each kind', () => {
    expect(ergodic.length).toBeGreaterThan(25);
    expect(absorbing.length).toBe(20);
  });

  test('ergodic chains: π, |λ₂|, mean first passage and projections', () => {
    ergodic.forEach((m, n) => {
      const a = analyzeChain(m, { initial: m.rows[0], steps });
      const ref = expected[n];
      close(a.stationary as number[], ref.stationary as number[], 1e-10);
      const aperiodic = a.period[0].period === 1;
      if (aperiodic) expect(Math.abs(a.lambda2Modulus - ref.moduli[1])).toBeLessThan(1e-8);
      (a.meanFirstPassage as number[][]).forEach((row, i) => close(row, (ref.meanFirstPassage as number[][])[i], 1e-8 * Math.max(1, ...row)));
      a.projection.forEach((p, t) => close(p.distribution, ref.projection[t], 1e-12));
    });
  });

  test('absorbing chains: N, t = N·1 and B = N·R', () => {
    absorbing.forEach((m, n) => {
      const ref = expected[ergodic.length + n];
      const result = absorbingAnalysis(m.rows, classify(m.rows));
      expect(result).not.toBeNull();
      result?.fundamental.forEach((row, i) => close(row, (ref.fundamental as number[][])[i], 1e-9 * Math.max(1, ...row)));
      close(result?.expectedSteps ?? [], ref.expectedSteps as number[], 1e-9 * Math.max(1, ...(ref.expectedSteps as number[])));
      result?.probabilities.forEach((row, i) => close(row, (ref.probabilities as number[][])[i], 1e-10));
    });
  });
});
