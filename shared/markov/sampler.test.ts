import { jStat } from 'jstat';
import { aliasSampler, buildLookupTable, inverseCdfSampler, lookupDraw } from './sampler';
import { createStream } from './streams';

// χ² goodness of fit of 10⁶ seeded draws against the target distribution at α = 0.001
// (Pearson's test; critical value from jstat's χ² quantile).
const DRAWS = 1_000_000;
const ALPHA = 0.001;
const TARGETS = [
  [0.5, 0.25, 0.25],
  [0.05, 0.6, 0.0, 0.3, 0.05],
  [0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.1, 0.05, 0.03, 0.02],
];

function chiSquare(counts: readonly number[], p: readonly number[]): { statistic: number; critical: number } {
  const cells = p.map((pj, j) => ({ observed: counts[j], expected: pj * DRAWS })).filter((c) => c.expected > 0);
  const statistic = cells.reduce((sum, c) => sum + (c.observed - c.expected) ** 2 / c.expected, 0);
  return { statistic, critical: jStat.chisquare.inv(1 - ALPHA, cells.length - 1) };
}

function histogram(k: number, draw: () => number): number[] {
  const counts = new Array<number>(k).fill(0);
  for (let n = 0; n < DRAWS; n++) counts[draw()]++;
  return counts;
}

describe.each(TARGETS.map((p, n) => [n, p] as const))('target %i', (n, p) => {
  test('inverse-CDF sampler passes χ² at α = 0.001 and never draws a zero-probability state', () => {
    const stream = createStream(`inverse-${n}`, 'test');
    const sample = inverseCdfSampler(p);
    const counts = histogram(p.length, () => sample(stream.nextFloat()));
    const { statistic, critical } = chiSquare(counts, p);
    expect(statistic).toBeLessThan(critical);
    p.forEach((pj, j) => pj === 0 && expect(counts[j]).toBe(0));
  });

  test('Walker/Vose alias sampler passes χ² at α = 0.001', () => {
    const stream = createStream(`alias-${n}`, 'test');
    const sample = aliasSampler(p);
    const counts = histogram(p.length, () => sample(stream.nextFloat()));
    const { statistic, critical } = chiSquare(counts, p);
    expect(statistic).toBeLessThan(critical);
    p.forEach((pj, j) => pj === 0 && expect(counts[j]).toBe(0));
  });

  test('lookup table on raw 32-bit draws passes χ² and agrees with the inverse CDF on the 2⁻³² grid', () => {
    const stream = createStream(`table-${n}`, 'test');
    const lut = buildLookupTable([p]);
    const exact = inverseCdfSampler(p);
    let disagreements = 0;
    const counts = histogram(p.length, () => {
      const r = stream.nextUint32();
      const j = lookupDraw(lut, 0, r);
      if (j !== exact(r / 4294967296)) disagreements++;
      return j;
    });
    expect(disagreements).toBe(0);
    const { statistic, critical } = chiSquare(counts, p);
    expect(statistic).toBeLessThan(critical);
  });
});

test('a deliberately wrong sampler fails the same test (the test can fail)', () => {
  const stream = createStream('wrong', 'test');
  const p = [0.5, 0.25, 0.25];
  const biased = inverseCdfSampler([0.49, 0.26, 0.25]);
  const { statistic, critical } = chiSquare(histogram(3, () => biased(stream.nextFloat())), p);
  expect(statistic).toBeGreaterThan(critical);
});

test('lookup-table draws right at the thresholds are exact', () => {
  const lut = buildLookupTable([[0.5, 0.25, 0.25]]);
  expect(lookupDraw(lut, 0, 2 ** 31 - 1)).toBe(0);
  expect(lookupDraw(lut, 0, 2 ** 31)).toBe(1);
  expect(lookupDraw(lut, 0, 3 * 2 ** 30 - 1)).toBe(1);
  expect(lookupDraw(lut, 0, 3 * 2 ** 30)).toBe(2);
  expect(lookupDraw(lut, 0, 2 ** 32 - 1)).toBe(2);
});
