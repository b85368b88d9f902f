import { jStat } from 'jstat';

export type Interval = { lower: number; upper: number };

/** Wilson score interval for a binomial proportion x / n (Wilson 1927, JASA 22:209–212). */
export function wilsonInterval(x: number, n: number, confidenceLevel: number): Interval {
  const z = jStat.normal.inv(1 - (1 - confidenceLevel) / 2, 0, 1);
  const p = x / n;
  const z2n = (z * z) / n;
  const centre = (p + z2n / 2) / (1 + z2n);
  const half = (z / (1 + z2n)) * Math.sqrt((p * (1 - p)) / n + (z * z) / (4 * n * n));
  return { lower: Math.max(0, centre - half), upper: Math.min(1, centre + half) };
}

/**
 * Goodman's simultaneous intervals for the K cell probabilities of one multinomial row of total n
 * (Goodman 1965, Technometrics 7:247–254): with A the upper α/K point of χ²₁,
 * (A + 2n_j ∓ √(A (A + 4 n_j (n − n_j) / n))) / (2 (n + A)).
 */
export function goodmanIntervals(row: readonly number[], confidenceLevel: number): Interval[] {
  const n = row.reduce((sum, v) => sum + v, 0);
  const a = jStat.chisquare.inv(1 - (1 - confidenceLevel) / row.length, 1);
  return row.map((nj) => {
    const root = Math.sqrt(a * (a + (4 * nj * (n - nj)) / n));
    return {
      lower: Math.max(0, (a + 2 * nj - root) / (2 * (n + a))),
      upper: Math.min(1, (a + 2 * nj + root) / (2 * (n + a))),
    };
  });
}
