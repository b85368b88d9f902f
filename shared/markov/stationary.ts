import type { Classification } from './classify';
import { solve, submatrix } from './linalg';

/**
 * Stationary distribution of one closed class C, as a K-vector (zero outside C): solve
 * π(P_CC − I) = 0 with Σπ = 1 by replacing the last equation (Kemeny & Snell 1960, §4.1;
 * Grinstead & Snell ch. 11.3).
 */
export function classStationary(rows: readonly (readonly number[])[], members: readonly number[]): number[] {
  const block = submatrix(rows, members, members);
  const m = members.length;
  // Transposed system: (P_CCᵀ − I) πᵀ = 0, last equation replaced by Σπ = 1.
  const a = block[0].map((_, j) => block.map((row, i) => row[j] - (i === j ? 1 : 0)));
  a[m - 1] = new Array<number>(m).fill(1);
  const b = new Array<number>(m).fill(0);
  b[m - 1] = 1;
  const pi = solve(a, b);
  const full = new Array<number>(rows.length).fill(0);
  members.forEach((state, i) => {
    full[state] = Math.max(0, pi[i]);
  });
  return full;
}

/** One stationary distribution per closed class; every stationary distribution is a mix of these. */
export function stationaryByClass(rows: readonly (readonly number[])[], c: Classification): number[][] {
  return c.closed.map((members) => classStationary(rows, members));
}

/** The stationary distribution if unique (exactly one closed class), else null. */
export function uniqueStationary(rows: readonly (readonly number[])[], c: Classification): number[] | null {
  return c.closed.length === 1 ? classStationary(rows, c.closed[0]) : null;
}
