import type { RunSummary } from '@/shared/schemas';

import { compareTable } from './compareTable';

const states = [
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'BS', name: 'Bare soil', colour: '#999999' },
];
const q = (median: number, p5: number, p95: number) => ({ mean: median, median, p5, p95 });
const summaryOf = (runId: number, shares: [number, number, number][], order = states): RunSummary => ({
  runId,
  states: order,
  steps: 0,
  yearsPerStep: 1,
  replicates: 20,
  totalAreaM2: 1e6,
  area: [shares.map(([m, lo, hi]) => q(m * 1e6, lo * 1e6, hi * 1e6))],
  share: [shares.map(([m, lo, hi]) => q(m, lo, hi))],
  expectedShare: [shares.map(([m]) => m)],
  method: '',
  caution: '',
});

describe('compareTable', () => {
  test('differences to the first run and band overlap, matched by state code', () => {
    const a = summaryOf(3, [
      [0.6, 0.55, 0.65],
      [0.4, 0.35, 0.45],
    ]);
    // Run 5 lists its states the other way round.
    const b = summaryOf(
      5,
      [
        [0.31, 0.28, 0.34],
        [0.69, 0.64, 0.72],
      ],
      [states[1], states[0]],
    );
    const [ss, bs] = compareTable([a, b], 0);
    expect(ss.cells[0]).toMatchObject({ runId: 3, share: 0.6, shareDifference: null, bandsOverlap: null });
    expect(ss.cells[1]?.share).toBe(0.69);
    expect(ss.cells[1]?.shareDifference).toBeCloseTo(0.09, 12);
    expect(ss.cells[1]?.areaDifferenceM2).toBeCloseTo(90_000, 6);
    expect(ss.cells[1]?.bandsOverlap).toBe(true);
    expect(bs.cells[1]?.bandsOverlap).toBe(false);
  });

  test('a state missing from a later run shows as null', () => {
    const a = summaryOf(1, [
      [0.5, 0.4, 0.6],
      [0.5, 0.4, 0.6],
    ]);
    const b = summaryOf(2, [[1, 1, 1]], [states[0]]);
    expect(compareTable([a, b], 0)[1].cells[1]).toBeNull();
  });
});
