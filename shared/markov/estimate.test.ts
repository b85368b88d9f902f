import { gammaDraw, dirichletRowDraw } from './dirichlet';
import { countMapPairs, countTransitions, estimateMatrix, type Observation } from './estimate';
import { independenceTest, homogeneityTest } from './hypothesis';
import { goodmanIntervals, wilsonInterval } from './intervals';
import { createMatrix, type TransitionMatrix } from './matrix';
import { parseObservationsCsv } from './observationsCsv';
import { simulateRun } from './run';
import { createStream } from './streams';

/** Survey data from a known chain: one simulated patch per plot (kernel history), `times` observations each. */
function survey(matrix: TransitionMatrix, plots: number, times: number, seed: string): Observation[] {
  const k = matrix.states.length;
  const run = simulateRun({ phases: [{ startStep: 0, matrix }], steps: times - 1, patchCount: plots, replicates: 1, seed, historyReplicate: 0, initial: { kind: 'distribution', distribution: new Array<number>(k).fill(1 / k) } });
  const history = run.history as Uint8Array;
  const out: Observation[] = [];
  for (let p = 0; p < plots; p++) for (let t = 0; t < times; t++) out.push({ plot: `p${p}`, time: 2000 + t, state: matrix.states[history[t * plots + p]] });
  return out;
}

const known = createMatrix(['A', 'B', 'C'], [[0.7, 0.2, 0.1], [0.3, 0.5, 0.2], [0.15, 0.25, 0.6]]);

describe('transition counting', () => {
  test('counts only within a plot, only one step apart, and reports skipped pairs with the reason', () => {
    const text = 'plot,time,state\nq,2001,A\nq,2002,B\nq,2004,A\nr,2002,B\nr,2001,A\nr,2003,C\ns,2005,C\n';
    const c = countTransitions(parseObservationsCsv(text));
    expect(c.states).toEqual(['A', 'B', 'C']);
    expect(c.counts).toEqual([[0, 2, 0], [0, 0, 1], [0, 0, 0]]); // q: A→B; r: A→B, B→C; never q's B → r's B
    expect(c.pairsUsed).toBe(3);
    expect(c.pairsSkipped).toEqual([{ plot: 'q', fromTime: 2002, toTime: 2004, reason: 'gap of 2 steps (pairs must be 1 step apart)' }]);
    expect(c.byPeriod).toHaveLength(2);
  });

  test('rows without data are reported and left empty, never filled', () => {
    const e = estimateMatrix(countTransitions([{ plot: 'a', time: 1, state: 'X' }, { plot: 'a', time: 2, state: 'Y' }], { states: ['X', 'Y', 'Z'] }));
    expect(e.rowsWithoutData).toEqual(['Y', 'Z']);
    expect(e.matrix[1]).toEqual([null, null, null]);
    expect(e.lower[2]).toEqual([null, null, null]);
    expect(e.matrix[0]).toEqual([0, 1, 0]);
  });

  test('names the line of a duplicate time, an unknown state or a missing column', () => {
    expect(() => countTransitions(parseObservationsCsv('plot,time,state\na,1,X\na,1,Y\n'))).toThrow(/line 3: plot 'a' is observed twice at time 1/);
    expect(() => countTransitions(parseObservationsCsv('plot,time,state\na,1,X\n'), { states: ['Y', 'Z'] })).toThrow(/line 2: unknown state 'X'/);
    expect(() => parseObservationsCsv('plot,year,state\na,1,X\n')).toThrow(/no column 'time'/);
    expect(() => parseObservationsCsv('plot,time,state\na,soon,X\n')).toThrow(/line 2, column 'time': 'soon' is not a number/);
  });

  test('two dated cover maps give the same outputs; patches without a state are skipped', () => {
    const c = countMapPairs(['A', 'A', 'B', null, 'B'], ['A', 'B', 'B', 'A', '']);
    expect(c.counts).toEqual([[1, 1], [0, 1]]);
    expect(c.pairsUsed).toBe(3);
    expect(c.pairsSkipped.map((p) => p.reason)).toEqual(['no state on the first map', 'no state on the second map']);
    expect(estimateMatrix(c).matrix).toEqual([[0.5, 0.5], [0, 1]]);
  });
});

describe('intervals', () => {
  test('Wilson score intervals match Newcombe (1998, Stat. Med. 17:857–872) Table I, method 3 (from memory)', () => {
    const cases: [number, number, number, number][] = [[81, 263, 0.2553, 0.3662], [15, 148, 0.0624, 0.1605], [0, 20, 0, 0.1611], [1, 29, 0.0061, 0.1718]];
    for (const [x, n, lo, hi] of cases) {
      const w = wilsonInterval(x, n, 0.95);
      expect(w.lower).toBeCloseTo(lo, 4);
      expect(w.upper).toBeCloseTo(hi, 4);
    }
  });

  test('Goodman (1965) with K = 2 is the Wilson interval at level 1 − α/2 (his A = χ²₁ at 1 − α/K = z² at 1 − α/(2K))', () => {
    const g = goodmanIntervals([30, 70], 0.95);
    const w = wilsonInterval(30, 100, 0.975);
    expect(g[0].lower).toBeCloseTo(w.lower, 12);
    expect(g[0].upper).toBeCloseTo(w.upper, 12);
  });

  test('estimation recovers a known matrix: Wilson covers each entry ≈ 95 %, Goodman covers whole rows ≥ 95 %', () => {
    let entries = 0;
    let missed = 0;
    let rows = 0;
    let rowsMissed = 0;
    for (let d = 0; d < 60; d++) {
      const e = estimateMatrix(countTransitions(survey(known, 60, 6, `coverage-${d}`), { states: known.states }));
      known.rows.forEach((row, i) => {
        let rowOk = true;
        row.forEach((p, j) => {
          entries++;
          if (!((e.lower[i][j] as number) <= p && p <= (e.upper[i][j] as number))) missed++;
          if (!((e.simultaneous.lower[i][j] as number) <= p && p <= (e.simultaneous.upper[i][j] as number))) rowOk = false;
        });
        rows++;
        if (!rowOk) rowsMissed++;
      });
    }
    // Misses ~ Binomial(entries, 0.05); allow 3.3 standard deviations either side (α ≈ 0.001).
    const sd = Math.sqrt(entries * 0.05 * 0.95);
    expect(Math.abs(missed - 0.05 * entries)).toBeLessThan(3.3 * sd);
    expect(rowsMissed).toBeLessThan(0.05 * rows + 3.3 * Math.sqrt(rows * 0.05 * 0.95));
  });
});

describe('tests of the Markov assumptions (Anderson & Goodman 1957)', () => {
  test('the independence statistic on a 2 × 2 table equals n(ad − bc)² / ((a+b)(c+d)(a+c)(b+d)) (Pearson)', () => {
    const [a, b, c, d] = [30, 10, 5, 25];
    const t = independenceTest([[a, b], [c, d]]);
    const n = a + b + c + d;
    expect(t?.statistic).toBeCloseTo((n * (a * d - b * c) ** 2) / ((a + b) * (c + d) * (a + c) * (b + d)), 10);
    expect(t?.dof).toBe(1);
  });

  test('a first-order chain is told apart from independent draws; homogeneity holds for one chain and fails for two', () => {
    const e = estimateMatrix(countTransitions(survey(known, 200, 5, 'order')));
    expect(e.tests.independence?.pValue).toBeLessThan(1e-6);
    const flat = createMatrix(['A', 'B', 'C'], [[0.5, 0.3, 0.2], [0.5, 0.3, 0.2], [0.5, 0.3, 0.2]]);
    let rejections = 0;
    for (let d = 0; d < 40; d++) {
      const p = estimateMatrix(countTransitions(survey(flat, 100, 3, `flat-${d}`))).tests.independence?.pValue as number;
      if (p < 0.05) rejections++;
    }
    expect(rejections).toBeLessThan(9); // Binomial(40, 0.05): P(≥ 9) < 0.001
    expect(e.tests.homogeneity?.pValue).toBeGreaterThan(0.001);
    expect(e.tests.homogeneity?.dof).toBe(3 * 3 * 2); // (T − 1) K (K − 1) with T = 4 periods, K = 3
    const other = createMatrix(['A', 'B', 'C'], [[0.2, 0.2, 0.6], [0.6, 0.2, 0.2], [0.2, 0.6, 0.2]]);
    const [first, second] = [known, other].map((m, n) => countTransitions(survey(m, 300, 2, `period-${n}`)).counts);
    expect(homogeneityTest([first, second])?.pValue).toBeLessThan(1e-6);
  });
});

describe('Dirichlet posterior rows', () => {
  test('Marsaglia–Tsang gamma draws have mean a and variance a (shape 0.4 and 3.5), within 4 standard errors', () => {
    for (const a of [0.4, 3.5]) {
      const stream = createStream(`gamma-${a}`, 'test');
      const n = 100_000;
      const x = Array.from({ length: n }, () => gammaDraw(a, stream));
      const mean = x.reduce((s, v) => s + v, 0) / n;
      const variance = x.reduce((s, v) => s + (v - mean) ** 2, 0) / (n - 1);
      expect(Math.abs(mean - a)).toBeLessThan(4 * Math.sqrt(a / n));
      expect(Math.abs(variance - a)).toBeLessThan(0.05 * a + 4 * Math.sqrt((2 * a * a + 6 * a) / n));
    }
  });

  test('posterior row draws have the Dirichlet mean (n_j + α)/(n + Kα) and sum to 1', () => {
    const counts = [12, 3, 0];
    const prior = 0.5;
    const stream = createStream('dirichlet', 'test');
    const draws = Array.from({ length: 50_000 }, () => dirichletRowDraw(counts, prior, stream));
    const a = counts.map((c) => c + prior);
    const a0 = a.reduce((s, v) => s + v, 0);
    a.forEach((aj, j) => {
      const mean = draws.reduce((s, d) => s + d[j], 0) / draws.length;
      const sd = Math.sqrt((aj * (a0 - aj)) / (a0 * a0 * (a0 + 1)) / draws.length);
      expect(Math.abs(mean - aj / a0)).toBeLessThan(4 * sd);
    });
    draws.slice(0, 100).forEach((d) => expect(d.reduce((s, v) => s + v, 0)).toBeCloseTo(1, 12));
  });
});
