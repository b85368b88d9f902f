// The parts of jstat (no bundled types) that the Markov engine uses.
declare module 'jstat' {
  export const jStat: {
    chisquare: { cdf(x: number, dof: number): number; inv(p: number, dof: number): number };
    normal: { inv(p: number, mean: number, sd: number): number; cdf(x: number, mean: number, sd: number): number };
    binomial: { pdf(k: number, n: number, p: number): number; cdf(k: number, n: number, p: number): number };
  };
}
