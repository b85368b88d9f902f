import { assignByProportions, checkProportions, CoverInputError, roundedCounts } from './proportions';
import { jStat } from 'jstat';

describe('roundedCounts (largest remainder)', () => {
  // Worked example of Hamilton's method (common practice): quotas 3.5, 2.6, 3.9 of 10 seats → 3, 3, 4.
  test('when quotas are 3.5, 2.6 and 3.9 of 10, then the seats are 3, 3 and 4', () => {
    expect(roundedCounts([0.35, 0.26, 0.39], 10)).toEqual([3, 3, 4]);
  });

  test('when any proportions are rounded, then the counts sum to n and each is within 1 of its quota', () => {
    const p = [0.123, 0.456, 0.321, 0.1];
    const counts = roundedCounts(p, 9_999);
    expect(counts.reduce((a, b) => a + b, 0)).toBe(9_999);
    counts.forEach((c, i) => expect(Math.abs(c - p[i] * 9_999)).toBeLessThan(1));
  });
});

describe('assignByProportions', () => {
  test('when mode is exact, then the counts equal the rounded counts and the seed fixes the layout', () => {
    const a = assignByProportions([0.5, 0.3, 0.2], 1_001, 'seed-1', 'exact');
    const counts = [0, 0, 0];
    a.forEach((s) => counts[s]++);
    expect(counts).toEqual(roundedCounts([0.5, 0.3, 0.2], 1_001));
    expect(assignByProportions([0.5, 0.3, 0.2], 1_001, 'seed-1', 'exact')).toEqual(a);
    expect(assignByProportions([0.5, 0.3, 0.2], 1_001, 'seed-2', 'exact')).not.toEqual(a);
  });

  test('when mode is random, then the counts pass a χ² goodness-of-fit test against the proportions at α = 0.001', () => {
    const p = [0.4, 0.35, 0.15, 0.1];
    const n = 200_000;
    const counts = [0, 0, 0, 0];
    assignByProportions(p, n, 'gof', 'random').forEach((s) => counts[s]++);
    const chi2 = counts.reduce((acc, c, i) => acc + (c - n * p[i]) ** 2 / (n * p[i]), 0);
    // p-value from jStat's χ² distribution (general-purpose library), 3 degrees of freedom.
    expect(1 - jStat.chisquare.cdf(chi2, 3)).toBeGreaterThan(0.001);
  });
});

test('when proportions do not add up to 1, then the message shows the sum', () => {
  expect(() => checkProportions([0.5, 0.4], ['A', 'B'])).toThrow(new CoverInputError('the proportions must add up to 1 (100 %); they add up to 0.900000'));
  expect(() => checkProportions([1.2, -0.2], ['A', 'B'])).toThrow(/"B" must be a number ≥ 0/);
});
