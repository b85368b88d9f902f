import { MarkovInputError } from './errors';
import { homogeneityTest, independenceTest, type ChiSquareTest } from './hypothesis';
import { goodmanIntervals, wilsonInterval } from './intervals';
import { validateStates } from './matrix';

/** One row of a survey's long table; `line` (1-based, optional) is used in error messages. */
export type Observation = { plot: string; time: number; state: string; line?: number };

/** A pair of successive observations of one plot that was not counted, and why. */
export type SkippedPair = { plot: string; fromTime: number; toTime: number; reason: string };

export type TransitionCounts = {
  states: string[];
  /** n_ij pooled over periods. */
  counts: number[][];
  /** n_ij(t) per period (transitions starting at the same time), in time order. */
  byPeriod: number[][][];
  pairsUsed: number;
  pairsSkipped: SkippedPair[];
};

const zeros = (k: number): number[][] => Array.from({ length: k }, () => new Array<number>(k).fill(0));

type StateIndex = { states: string[]; indexOf: (state: string, where: string) => number };

/** The state order (given, else first appearance) and a lookup that names unknown states. */
function stateIndex(given: readonly string[] | undefined, observed: readonly string[]): StateIndex {
  const states = validateStates(given ?? [...new Set(observed)]);
  const index = new Map(states.map((s, i) => [s, i]));
  const indexOf = (state: string, where: string): number => {
    const i = index.get(state);
    if (i === undefined) {
      throw new MarkovInputError(`${where}: unknown state '${state}'; the states are ${states.map((s) => `'${s}'`).join(', ')}`);
    }
    return i;
  };
  return { states, indexOf };
}

/**
 * Transition counts from a long table: within each plot only, between consecutive observations
 * exactly `step` time units apart (Anderson & Goodman 1957). Other consecutive pairs are reported
 * in pairsSkipped. States keep the order given, else the order of first appearance.
 */
export function countTransitions(
  observations: readonly Observation[],
  options: { states?: readonly string[]; step?: number } = {},
): TransitionCounts {
  const step = options.step ?? 1;
  const where = (o: Observation): string => (o.line === undefined ? `plot '${o.plot}', time ${o.time}` : `line ${o.line}`);
  observations.forEach((o) => {
    if (!Number.isFinite(o.time)) throw new MarkovInputError(`${where(o)}: time '${o.time}' is not a number`);
  });
  const { states, indexOf } = stateIndex(options.states, observations.map((o) => o.state));
  const k = states.length;
  const byPlot = new Map<string, Observation[]>();
  for (const o of observations) {
    indexOf(o.state, where(o));
    const list = byPlot.get(o.plot) ?? [];
    list.push(o);
    byPlot.set(o.plot, list);
  }
  const counts = zeros(k);
  const periods = new Map<number, number[][]>();
  const pairsSkipped: SkippedPair[] = [];
  let pairsUsed = 0;
  for (const [plot, list] of byPlot) {
    const sorted = [...list].sort((a, b) => a.time - b.time);
    for (let n = 1; n < sorted.length; n++) {
      const a = sorted[n - 1];
      const b = sorted[n];
      const gap = (b.time - a.time) / step;
      if (gap === 0) {
        throw new MarkovInputError(`${where(b)}: plot '${plot}' is observed twice at time ${b.time} (also ${where(a)}); keep one`);
      }
      if (gap !== 1) {
        const reason = Number.isInteger(gap) ? `gap of ${gap} steps (pairs must be 1 step apart)` : `${b.time - a.time} time units apart, not a whole number of steps of ${step}`;
        pairsSkipped.push({ plot, fromTime: a.time, toTime: b.time, reason });
        continue;
      }
      const i = indexOf(a.state, where(a));
      const j = indexOf(b.state, where(b));
      counts[i][j]++;
      const period = periods.get(a.time) ?? zeros(k);
      period[i][j]++;
      periods.set(a.time, period);
      pairsUsed++;
    }
  }
  const byPeriod = [...periods.entries()].sort((x, y) => x[0] - y[0]).map(([, c]) => c);
  return { states, counts, byPeriod, pairsUsed, pairsSkipped };
}

/**
 * Transition counts from two dated cover maps: before[i] → after[i] for each patch i (one
 * period). Patches without a state on either map (null or '') are skipped and reported.
 */
export function countMapPairs(
  before: readonly (string | null)[],
  after: readonly (string | null)[],
  options: { states?: readonly string[]; beforeTime?: number; afterTime?: number } = {},
): TransitionCounts {
  if (before.length !== after.length) {
    throw new MarkovInputError(`the maps cover ${before.length} and ${after.length} patches; pair the same patches`);
  }
  const present = (s: string | null): s is string => s !== null && s !== '';
  const { states, indexOf } = stateIndex(options.states, [...before, ...after].filter(present));
  const counts = zeros(states.length);
  const pairsSkipped: SkippedPair[] = [];
  const fromTime = options.beforeTime ?? 0;
  const toTime = options.afterTime ?? 1;
  before.forEach((a, p) => {
    const b = after[p];
    if (!present(a) || !present(b)) {
      pairsSkipped.push({ plot: String(p), fromTime, toTime, reason: `no state on the ${present(a) ? 'second' : 'first'} map` });
      return;
    }
    counts[indexOf(a, `patch ${p}, first map`)][indexOf(b, `patch ${p}, second map`)]++;
  });
  return { states, counts, byPeriod: [counts], pairsUsed: before.length - pairsSkipped.length, pairsSkipped };
}

export type Estimate = {
  states: string[];
  counts: number[][];
  /** MLE p̂_ij = n_ij / n_i; a row without data is all null (never filled). */
  matrix: (number | null)[][];
  lower: (number | null)[][];
  upper: (number | null)[][];
  simultaneous: { lower: (number | null)[][]; upper: (number | null)[][] };
  confidenceLevel: number;
  rowsWithoutData: string[];
  pairsUsed: number;
  pairsSkipped: SkippedPair[];
  tests: { independence: ChiSquareTest | null; homogeneity: ChiSquareTest | null };
};

/**
 * Maximum-likelihood matrix p̂_ij = n_ij / n_i (Anderson & Goodman 1957), Wilson score intervals
 * per entry, Goodman (1965) simultaneous intervals per row, and the order and homogeneity tests.
 */
export function estimateMatrix(t: TransitionCounts, confidenceLevel = 0.95): Estimate {
  const totals = t.counts.map((row) => row.reduce((sum, v) => sum + v, 0));
  const perRow = <T>(f: (row: number[], n: number) => T[]): (T | null)[][] =>
    t.counts.map((row, i) => (totals[i] === 0 ? row.map(() => null) : f(row, totals[i])));
  const wilson = perRow((row, n) => row.map((x) => wilsonInterval(x, n, confidenceLevel)));
  const goodman = perRow((row) => goodmanIntervals(row, confidenceLevel));
  const pick = (m: ({ lower: number; upper: number } | null)[][], key: 'lower' | 'upper'): (number | null)[][] =>
    m.map((row) => row.map((v) => (v === null ? null : v[key])));
  return {
    states: t.states,
    counts: t.counts,
    matrix: perRow((row, n) => row.map((x) => x / n)),
    lower: pick(wilson, 'lower'),
    upper: pick(wilson, 'upper'),
    simultaneous: { lower: pick(goodman, 'lower'), upper: pick(goodman, 'upper') },
    confidenceLevel,
    rowsWithoutData: t.states.filter((_, i) => totals[i] === 0),
    pairsUsed: t.pairsUsed,
    pairsSkipped: t.pairsSkipped,
    tests: { independence: independenceTest(t.counts), homogeneity: homogeneityTest(t.byPeriod) },
  };
}
