import { projectBoundary } from '@/shared/geo/projected-boundary';

import { estimateGrid, parseCellSize } from './gridEstimate';

// About 10 km × 10 km around 40° N (0.1173° of longitude ≈ 10 km there, 0.0901° of latitude ≈ 10 km).
const square = projectBoundary({
  parts: [[[[-110, 40], [-109.8827, 40], [-109.8827, 40.0901], [-110, 40.0901], [-110, 40]]]],
});

describe('estimateGrid', () => {
  it('when the cell size is 100 m on a 100 km² square, then about 10,000 patches and a drawable 100 × 100 grid', () => {
    const estimate = estimateGrid(square, '100', 0);
    if (estimate.kind !== 'ok') throw new Error(`expected ok, got ${estimate.kind}`);
    expect(Math.abs(estimate.patches - 10_000) / 10_000).toBeLessThan(0.05);
    expect(estimate.drawable).toBe(true);
  });

  it('when the cell size is 10 m, then refused with the smallest cell size that fits 250,000 patches', () => {
    const estimate = estimateGrid(square, '10', 0);
    if (estimate.kind !== 'too-many') throw new Error(`expected too-many, got ${estimate.kind}`);
    // 100 km² / 250,000 = 400 m² per patch: 20 m cells, a little more for the cut edges.
    expect(estimate.fits).toBeGreaterThanOrEqual(20);
    expect(estimate.fits).toBeLessThan(22);
    expect(estimate.message).toContain('The smallest cell size that fits is');
  });

  it('when the grid is finer than 150 cells a side, then it is not drawn line by line', () => {
    const estimate = estimateGrid(square, '50', 0);
    expect(estimate.kind === 'ok' && estimate.drawable).toBe(false);
  });
});

describe('parseCellSize', () => {
  it('when the text is empty, not a number or out of range, then a message', () => {
    expect(parseCellSize('').ok).toBe(false);
    expect(parseCellSize('abc').ok).toBe(false);
    expect(parseCellSize('5').ok).toBe(false);
    expect(parseCellSize('20000').ok).toBe(false);
    expect(parseCellSize(' 250 ')).toEqual({ ok: true, cellSize: 250 });
  });
});
