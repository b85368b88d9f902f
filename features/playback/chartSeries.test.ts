import type { RunSummary } from '@/shared/schemas';

import { chartSeries } from './chartSeries';

const q = (v: number) => ({ mean: v, median: v, p5: v * 0.9, p95: v * 1.1 });
const summary: RunSummary = {
  runId: 1,
  states: [
    { code: 'A', name: 'Alpha', colour: '#E69F00' },
    { code: 'B', name: 'Beta', colour: '#56B4E9' },
  ],
  steps: 1,
  yearsPerStep: 1,
  replicates: 10,
  totalAreaM2: 1_000_000,
  area: [
    [q(600_000), q(400_000)],
    [q(500_000), q(500_000)],
  ],
  share: [
    [q(0.6), q(0.4)],
    [q(0.5), q(0.5)],
  ],
  expectedShare: [
    [0.6, 0.4],
    [0.5, 0.5],
  ],
  method: '',
  caution: '',
};

describe('chartSeries', () => {
  test('shares: replicate quantiles as they are, binomial band around the expected path', () => {
    const [a] = chartSeries(summary, 'share', 10_000, 100, [0.3, 0.7]);
    expect(a.median).toEqual([0.6, 0.5]);
    expect(a.expected).toEqual([0.6, 0.5]);
    expect(a.binomialHigh[1]).toBeCloseTo(0.5 + 1.96 * Math.sqrt(0.25 / 100), 3);
    expect(a.longRun).toBe(0.3);
  });

  test('areas in hectares: shares times the total area', () => {
    const [, b] = chartSeries(summary, 'area', 10_000, 100, null);
    expect(b.median).toEqual([40, 50]);
    expect(b.expected).toEqual([40, 50]);
    expect(b.p95[1]).toBeCloseTo(55, 10);
    expect(b.longRun).toBeNull();
  });
});
