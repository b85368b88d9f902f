// The binomial check (brief §5): N independent patches sharing the start distribution put
// Binomial(N, x_t[j]) patches in state j at step t; as a share, mean x and variance x(1−x)/N.
// Normal approximation to the binomial, share ± 1.96·sqrt(x(1−x)/N) (de Moivre–Laplace; e.g.
// Agresti & Coull 1998, Am. Stat. 52:119–126, the Wald interval), clipped to [0, 1].

export type Band = { low: number; high: number };

export const Z_95 = 1.959963984540054;

/** 95 % band of the share in one state when N patches each land there with probability x. */
export function binomialShareBand(x: number, patchCount: number): Band {
  const half = patchCount > 0 ? Z_95 * Math.sqrt((x * (1 - x)) / patchCount) : 0;
  return { low: Math.max(0, x - half), high: Math.min(1, x + half) };
}

/** Do two closed intervals share any point? */
export function bandsOverlap(a: Band, b: Band): boolean {
  return a.low <= b.high && b.low <= a.high;
}
