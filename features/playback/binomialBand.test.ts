import { jStat } from 'jstat';

import { bandsOverlap, binomialShareBand, Z_95 } from './binomialBand';

describe('binomialShareBand', () => {
  test('matches the normal approximation built from jStat’s binomial mean and variance', () => {
    const n = 3664;
    const x = 0.31;
    // Binomial(n, x): mean n·x, variance n·x·(1−x) — as shares divide by n and n².
    const mean = n * x;
    const sd = Math.sqrt(n * x * (1 - x));
    const z = jStat.normal.inv(0.975, 0, 1);
    expect(z).toBeCloseTo(Z_95, 9);
    const band = binomialShareBand(x, n);
    expect(band.low).toBeCloseTo((mean - z * sd) / n, 12);
    expect(band.high).toBeCloseTo((mean + z * sd) / n, 12);
  });

  test('holds about 95 % of the exact binomial probability (jStat binomial cdf) for a large N', () => {
    const n = 3600;
    const x = 0.2;
    const band = binomialShareBand(x, n);
    const inside = jStat.binomial.cdf(Math.floor(band.high * n), n, x) - jStat.binomial.cdf(Math.ceil(band.low * n) - 1, n, x);
    expect(inside).toBeGreaterThan(0.94);
    expect(inside).toBeLessThan(0.96);
  });

  test('is clipped to 0…1 and is a point at x = 0 or 1', () => {
    expect(binomialShareBand(0, 100)).toEqual({ low: 0, high: 0 });
    expect(binomialShareBand(1, 100)).toEqual({ low: 1, high: 1 });
    const small = binomialShareBand(0.01, 10);
    expect(small.low).toBe(0);
  });
});

describe('bandsOverlap', () => {
  test('touching bands overlap; separate ones do not', () => {
    expect(bandsOverlap({ low: 0.1, high: 0.2 }, { low: 0.2, high: 0.3 })).toBe(true);
    expect(bandsOverlap({ low: 0.1, high: 0.2 }, { low: 0.21, high: 0.3 })).toBe(false);
    expect(bandsOverlap({ low: 0.1, high: 0.5 }, { low: 0.2, high: 0.3 })).toBe(true);
  });
});
