import { jStat } from 'jstat';

export type ChiSquareTest = { statistic: number; dof: number; pValue: number };

function chiSquare(statistic: number, dof: number): ChiSquareTest | null {
  return dof > 0 ? { statistic, dof, pValue: 1 - jStat.chisquare.cdf(statistic, dof) } : null;
}

const rowTotal = (row: readonly number[]): number => row.reduce((sum, v) => sum + v, 0);

/**
 * Order 0 against order 1: are successive states independent, p_ij = p_j? Pearson χ² on the K × K
 * transition counts, Σ (n_ij − n_i n_·j / n)² / (n_i n_·j / n), over rows and columns with data,
 * dof (rows − 1)(columns − 1) (Anderson & Goodman 1957, Ann. Math. Statist. 28:89–110).
 * null when there are no degrees of freedom.
 */
export function independenceTest(counts: readonly (readonly number[])[]): ChiSquareTest | null {
  const rowSums = counts.map(rowTotal);
  const colSums = counts[0].map((_, j) => rowTotal(counts.map((row) => row[j])));
  const n = rowTotal(rowSums);
  const rows = rowSums.filter((v) => v > 0).length;
  const cols = colSums.filter((v) => v > 0).length;
  let statistic = 0;
  counts.forEach((row, i) =>
    row.forEach((nij, j) => {
      const expected = (rowSums[i] * colSums[j]) / n;
      if (expected > 0) statistic += (nij - expected) ** 2 / expected;
    }),
  );
  return chiSquare(statistic, Math.max(0, rows - 1) * Math.max(0, cols - 1));
}

/**
 * Time-homogeneity across periods t: Σ_t Σ_i Σ_j n_i(t) (p̂_ij(t) − p̂_ij)² / p̂_ij, with p̂_ij
 * pooled (Anderson & Goodman 1957). Degrees of freedom Σ_i (T_i − 1)(c_i − 1), T_i the
 * periods where row i has data and c_i the pooled non-zero entries of row i (the usual adjustment
 * for empty cells). null with fewer than two periods or no degrees of freedom.
 */
export function homogeneityTest(byPeriod: readonly (readonly (readonly number[])[])[]): ChiSquareTest | null {
  if (byPeriod.length < 2) return null;
  const k = byPeriod[0].length;
  let statistic = 0;
  let dof = 0;
  for (let i = 0; i < k; i++) {
    const pooled = byPeriod[0][i].map((_, j) => rowTotal(byPeriod.map((counts) => counts[i][j])));
    const ni = rowTotal(pooled);
    if (ni === 0) continue;
    const periodsWithData = byPeriod.filter((counts) => rowTotal(counts[i]) > 0);
    dof += (periodsWithData.length - 1) * (pooled.filter((v) => v > 0).length - 1);
    for (const counts of periodsWithData) {
      const nit = rowTotal(counts[i]);
      pooled.forEach((nj, j) => {
        if (nj === 0) return;
        const p = nj / ni;
        statistic += (nit * (counts[i][j] / nit - p) ** 2) / p;
      });
    }
  }
  return chiSquare(statistic, dof);
}
