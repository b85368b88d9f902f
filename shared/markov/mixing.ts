import { vectorTimesMatrix } from './matrix';

/** Mixing means total variation below 1 % (brief §2). */
export const MIXING_THRESHOLD = 0.01;

/** Total-variation distance ½ Σ |x_j − y_j|. */
export function totalVariation(x: readonly number[], y: readonly number[]): number {
  let sum = 0;
  for (let j = 0; j < x.length; j++) sum += Math.abs(x[j] - y[j]);
  return sum / 2;
}

/**
 * First t ≤ limit with ½ Σ |x_t − π| < 1 %, x_t = x_0 P^t, from `start`; without a start, from
 * the worst single-state start (max over i of the distance of row i of P^t). null when the
 * distance is still ≥ 1 % after `limit` steps.
 */
export function mixingTime(
  rows: readonly (readonly number[])[],
  pi: readonly number[],
  start: readonly number[] | null,
  limit: number,
): number | null {
  let current: number[][] = start ? [[...start]] : rows.map((_, i) => rows.map((__, j) => (i === j ? 1 : 0)));
  for (let t = 0; t <= limit; t++) {
    if (Math.max(...current.map((x) => totalVariation(x, pi))) < MIXING_THRESHOLD) return t;
    current = current.map((x) => vectorTimesMatrix(x, rows));
  }
  return null;
}
