import { frameTotals } from './frameTotals';

describe('frameTotals', () => {
  test('the legend’s areas add up to the frame’s patch areas, state by state and in total', () => {
    const areas = Float32Array.from([100, 100, 50, 25, 100]);
    const states = Uint8Array.from([0, 1, 1, 2, 0]);
    const totals = frameTotals(states, areas, 3);
    expect(totals.map((t) => t.areaM2)).toEqual([200, 150, 25]);
    expect(totals.map((t) => t.patches)).toEqual([2, 2, 1]);
    expect(totals.reduce((sum, t) => sum + t.areaM2, 0)).toBe(375);
    expect(totals.reduce((sum, t) => sum + t.share, 0)).toBeCloseTo(1, 12);
  });

  test('a state no patch is in shows 0', () => {
    expect(frameTotals(Uint8Array.from([0]), Float32Array.from([5]), 2)[1]).toEqual({ areaM2: 0, share: 0, patches: 0 });
  });
});
