import type { Classification } from './classify';
import { identity, inverse } from './linalg';

/** Fundamental matrix of an ergodic chain: Z = (I − P + W)⁻¹, W with every row π (Kemeny & Snell 1960, §4.3). */
export function ergodicFundamental(rows: readonly (readonly number[])[], pi: readonly number[]): number[][] {
  const k = rows.length;
  const a = identity(k).map((row, i) => row.map((v, j) => v - rows[i][j] + pi[j]));
  return inverse(a);
}

/**
 * Mean first-passage matrix of an ergodic chain: m_ij = (z_jj − z_ij) / π_j for i ≠ j, m_ii = 0
 * (Grinstead & Snell ch. 11.5, Theorem 11.16). Mean recurrence times are separate: 1 / π_i.
 */
export function meanFirstPassage(rows: readonly (readonly number[])[], pi: readonly number[]): number[][] {
  const z = ergodicFundamental(rows, pi);
  return z.map((row, i) => row.map((zij, j) => (i === j ? 0 : (z[j][j] - zij) / pi[j])));
}

/**
 * Mean recurrence time of each state: 1 / π_i within its closed class (Kac; Grinstead & Snell
 * Theorem 11.15); Infinity for transient states, which are left for good with positive probability.
 */
export function meanRecurrence(byClass: readonly (readonly number[])[], c: Classification): number[] {
  const k = byClass[0]?.length ?? 0;
  const out = new Array<number>(k).fill(Infinity);
  c.closed.forEach((members, n) => {
    for (const i of members) out[i] = 1 / byClass[n][i];
  });
  return out;
}
