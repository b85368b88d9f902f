import { inv, lusolve } from 'mathjs';

/** Solves A x = b by LU decomposition with partial pivoting (mathjs lusolve). */
export function solve(a: number[][], b: number[]): number[] {
  return (lusolve(a, b) as number[][]).map((row) => row[0]);
}

/** Matrix inverse (mathjs inv, Gauss–Jordan with pivoting). */
export function inverse(a: number[][]): number[][] {
  return inv(a);
}

export function identity(k: number): number[][] {
  return Array.from({ length: k }, (_, i) => Array.from({ length: k }, (_, j) => (i === j ? 1 : 0)));
}

export function multiply(a: readonly (readonly number[])[], b: readonly (readonly number[])[]): number[][] {
  return a.map((row) => b[0].map((_, j) => row.reduce((sum, v, m) => sum + v * b[m][j], 0)));
}

/** Rows and columns `index` of a square matrix. */
export function submatrix(a: readonly (readonly number[])[], rowIndex: readonly number[], colIndex: readonly number[]): number[][] {
  return rowIndex.map((i) => colIndex.map((j) => a[i][j]));
}
