// Long-run shares of a run: the unique stationary distribution of its last phase's frozen matrix.
import { classify, uniqueStationary } from '@/shared/markov';
import type { RunInputsSummary } from '@/shared/schemas';

/** π of the last phase (π P = π, Σπ = 1), or null when the chain has more than one closed class. */
export function longRunShares(inputs: Pick<RunInputsSummary, 'phases'>): number[] | null {
  const last = inputs.phases[inputs.phases.length - 1];
  if (!last) return null;
  return uniqueStationary(last.matrix, classify(last.matrix));
}
