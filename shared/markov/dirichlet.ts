import type { Xoshiro128 } from './streams';

/** Standard normal draw by Marsaglia's polar method (Marsaglia & Bray 1964). */
function normal(stream: Xoshiro128): number {
  for (;;) {
    const u = 2 * stream.nextFloat() - 1;
    const v = 2 * stream.nextFloat() - 1;
    const s = u * u + v * v;
    if (s > 0 && s < 1) return u * Math.sqrt((-2 * Math.log(s)) / s);
  }
}

/**
 * Gamma(shape, 1) draw by Marsaglia & Tsang (2000, ACM TOMS 26:363–372); for shape < 1 the
 * boost Gamma(a) = Gamma(a + 1) · U^(1/a) from the same paper.
 */
export function gammaDraw(shape: number, stream: Xoshiro128): number {
  if (shape < 1) return gammaDraw(shape + 1, stream) * Math.pow(1 - stream.nextFloat(), 1 / shape);
  const d = shape - 1 / 3;
  const c = 1 / Math.sqrt(9 * d);
  for (;;) {
    let x: number;
    let v: number;
    do {
      x = normal(stream);
      v = 1 + c * x;
    } while (v <= 0);
    v = v * v * v;
    const u = 1 - stream.nextFloat();
    if (u < 1 - 0.0331 * x ** 4 || Math.log(u) < 0.5 * x * x + d * (1 - v + Math.log(v))) return d * v;
  }
}

/**
 * One draw of a transition row from its posterior Dirichlet(n_i1 + α, …, n_iK + α), the conjugate
 * update of a symmetric Dirichlet(α) prior with the row's counts (α = 1 uniform, α = ½ Jeffreys):
 * normalised independent Gamma(n_ij + α) draws.
 */
export function dirichletRowDraw(counts: readonly number[], prior: number, stream: Xoshiro128): number[] {
  if (!(prior > 0)) throw new RangeError(`the Dirichlet prior must be > 0, got ${prior}`);
  const g = counts.map((n) => gammaDraw(n + prior, stream));
  const sum = g.reduce((a, b) => a + b, 0);
  return g.map((v) => v / sum);
}
