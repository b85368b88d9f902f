import type { Classification } from './classify';
import { identity, inverse, multiply, submatrix } from './linalg';

/** Canonical-form quantities of an absorbing chain (Grinstead & Snell ch. 11.2). */
export type AbsorbingAnalysis = {
  transient: number[];
  absorbing: number[];
  /** Fundamental matrix N = (I − Q)⁻¹: expected visits to transient j starting from transient i. */
  fundamental: number[][];
  /** t = N·1: expected steps before absorption from each transient state. */
  expectedSteps: number[];
  /** B = N·R: probability of ending in each absorbing state from each transient state. */
  probabilities: number[][];
};

/**
 * For an absorbing chain (at least one absorbing state, and every state can reach one, i.e. every
 * closed class is a single absorbing state), N = (I − Q)⁻¹, t = N·1 and B = N·R (Grinstead &
 * Snell, Theorems 11.4–11.6); null for any other chain.
 */
export function absorbingAnalysis(
  rows: readonly (readonly number[])[],
  c: Classification,
): AbsorbingAnalysis | null {
  if (c.absorbing.length === 0 || c.closed.length !== c.absorbing.length) return null;
  const transient = c.transient;
  const q = submatrix(rows, transient, transient);
  const r = submatrix(rows, transient, c.absorbing);
  const fundamental =
    transient.length === 0 ? [] : inverse(identity(transient.length).map((row, i) => row.map((v, j) => v - q[i][j])));
  return {
    transient,
    absorbing: c.absorbing,
    fundamental,
    expectedSteps: fundamental.map((row) => row.reduce((sum, v) => sum + v, 0)),
    probabilities: transient.length === 0 ? [] : multiply(fundamental, r),
  };
}
