// Helpers shared by the Markov engine's tests (not used by the engine itself).
import { createMatrix, type TransitionMatrix } from './matrix';
import type { Xoshiro128 } from './streams';

/** A random row-stochastic matrix; each entry is zero with probability `sparsity`, diagonal kept positive. */
export function randomMatrix(k: number, stream: Xoshiro128, sparsity = 0): TransitionMatrix {
  const rows = Array.from({ length: k }, (_, i) => {
    const raw = Array.from({ length: k }, (__, j) => (j !== i && stream.nextFloat() < sparsity ? 0 : 0.05 + stream.nextFloat()));
    const sum = raw.reduce((a, b) => a + b, 0);
    return raw.map((v) => v / sum);
  });
  return createMatrix(Array.from({ length: k }, (_, i) => `s${i}`), rows, { normalise: true });
}
