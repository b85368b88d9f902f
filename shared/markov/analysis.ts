import { absorbingAnalysis } from './absorbing';
import { classify, isErgodic } from './classify';
import { eigenvalueModuli } from './eigen';
import type { TransitionMatrix } from './matrix';
import { mixingTime } from './mixing';
import { meanFirstPassage, meanRecurrence } from './passage';
import { projectAt, type Projection } from './projection';
import { stationaryByClass, uniqueStationary } from './stationary';

export type AnalysisOptions = {
  /** Start distribution x_0; without it projections start uniform and mixing uses the worst single-state start. */
  initial?: readonly number[];
  /** Steps t at which to report x_t = x_0 P^t. */
  steps?: readonly number[];
  /** Give up on the mixing time after this many steps. */
  mixingLimit?: number;
};

export const DEFAULT_PROJECTION_STEPS: readonly number[] = [1, 5, 20, 100];
export const DEFAULT_MIXING_LIMIT = 10_000;

/** Everything the analysis panel and `analyze` show, with states by name. Infinity means "never". */
export type ChainAnalysis = {
  states: string[];
  stationary: number[] | null;
  stationaryByClass: { class: string[]; distribution: number[] }[];
  classes: { communicating: string[][]; closed: string[][]; transient: string[] };
  absorbing: string[];
  period: { class: string[]; period: number }[];
  lambda2Modulus: number;
  dampingRatio: number;
  residenceSteps: number[];
  meanRecurrence: number[];
  meanFirstPassage: number[][] | null;
  /** Aligned with `states`: 0 steps and probability 1 of itself for an absorbing state. */
  absorption: { expectedSteps: number[]; probabilities: number[][] } | null;
  projection: Projection[];
  /** First step with total variation < 1 % (null: no unique π, or not within mixingLimit steps). */
  mixingTime: number | null;
  mixingStart: 'initial' | 'worst single-state start';
  mixingLimit: number;
};

/**
 * Second-largest eigenvalue modulus. By Perron–Frobenius it is exactly 1 when there are several
 * closed classes (eigenvalue 1 repeats) or the closed class is periodic (d-th roots of unity)
 * (Seneta, *Non-negative Matrices and Markov Chains*, ch. 1); otherwise from the spectrum.
 */
function lambda2(rows: number[][], closedCount: number, periods: readonly number[]): number {
  if (closedCount > 1 || periods[0] > 1) return 1;
  return Math.min(1, eigenvalueModuli(rows)[1]);
}

/** Full analysis of a stationary chain (methods: brief §5). */
export function analyzeChain(matrix: TransitionMatrix, options: AnalysisOptions = {}): ChainAnalysis {
  const { states, rows } = matrix;
  const k = states.length;
  const names = (indices: readonly number[]): string[] => indices.map((i) => states[i]);
  const c = classify(rows);
  const byClass = stationaryByClass(rows, c);
  const pi = uniqueStationary(rows, c);
  const absorption = absorbingAnalysis(rows, c);
  const l2 = lambda2(rows, c.closed.length, c.periods);
  const x0 = options.initial ?? new Array<number>(k).fill(1 / k);
  const mixingLimit = options.mixingLimit ?? DEFAULT_MIXING_LIMIT;
  return {
    states: [...states],
    stationary: pi,
    stationaryByClass: c.closed.map((members, n) => ({ class: names(members), distribution: byClass[n] })),
    classes: { communicating: c.classes.map(names), closed: c.closed.map(names), transient: names(c.transient) },
    absorbing: names(c.absorbing),
    period: c.closed.map((members, n) => ({ class: names(members), period: c.periods[n] })),
    lambda2Modulus: l2,
    // Damping ratio 1/|λ₂|: the asymptotic factor by which the distance to π shrinks per step.
    dampingRatio: 1 / l2,
    // Residence time 1 / (1 − p_ii): mean of the geometric run length in state i (brief §2).
    residenceSteps: rows.map((row, i) => 1 / (1 - row[i])),
    meanRecurrence: meanRecurrence(byClass, c),
    meanFirstPassage: pi && isErgodic(c) ? meanFirstPassage(rows, pi) : null,
    absorption: absorption && {
      expectedSteps: states.map((_, i) => {
        const n = absorption.transient.indexOf(i);
        return n < 0 ? 0 : absorption.expectedSteps[n];
      }),
      probabilities: states.map((_, i) => {
        const n = absorption.transient.indexOf(i);
        return states.map((__, j) => {
          const m = absorption.absorbing.indexOf(j);
          if (m < 0) return 0;
          return n < 0 ? (i === j ? 1 : 0) : absorption.probabilities[n][m];
        });
      }),
    },
    projection: projectAt(x0, matrix, options.steps ?? DEFAULT_PROJECTION_STEPS),
    mixingTime: pi ? mixingTime(rows, pi, options.initial ?? null, mixingLimit) : null,
    mixingStart: options.initial ? 'initial' : 'worst single-state start',
    mixingLimit,
  };
}
