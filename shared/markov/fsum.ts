/**
 * Sum with Neumaier's compensated summation (Neumaier 1974, improved Kahan–Babuška), so that a row
 * of probabilities like 0.1 × 10 sums to 1 within one rounding instead of drifting.
 */
export function fsum(values: ArrayLike<number>): number {
  let sum = 0;
  let compensation = 0;
  for (let i = 0; i < values.length; i++) {
    const value = values[i];
    const next = sum + value;
    compensation += Math.abs(sum) >= Math.abs(value) ? sum - next + value : value - next + sum;
    sum = next;
  }
  return sum + compensation;
}
