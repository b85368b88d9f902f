import { kinks, polygon } from '@turf/turf';
import fc from 'fast-check';
import { findSelfIntersections } from './self-intersections';
import type { Ring } from './types';

describe('findSelfIntersections', () => {
  it('finds the crossing of a bow tie and where it is', () => {
    const bowtie: Ring = [[0, 0], [2, 2], [2, 0], [0, 2], [0, 0]];
    const found = findSelfIntersections([[bowtie]], 5);
    expect(found).toHaveLength(1);
    expect(found[0].at).toEqual([1, 1]);
    expect([found[0].first.segment, found[0].second.segment]).toEqual([0, 2]);
  });

  it('finds a hole that crosses its exterior, and nothing in a clean polygon with a hole', () => {
    const outer: Ring = [[0, 0], [4, 0], [4, 4], [0, 4], [0, 0]];
    const crossing: Ring = [[3, 1], [5, 1], [5, 2], [3, 2], [3, 1]];
    const inside: Ring = [[1, 1], [1, 2], [2, 2], [2, 1], [1, 1]];
    expect(findSelfIntersections([[outer, crossing]], 5).map((c) => c.at)).toEqual(
      expect.arrayContaining([[4, 1], [4, 2]]),
    );
    expect(findSelfIntersections([[outer, inside]], 5)).toEqual([]);
  });

  it('finds a spike that doubles back along itself', () => {
    const spike: Ring = [[0, 0], [2, 0], [3, 0], [2, 0], [2, 2], [0, 2], [0, 0]];
    expect(findSelfIntersections([[spike]], 5).length).toBeGreaterThan(0);
  });

  // Reference: turf's kinks (pairwise test of all segments) on random single rings.
  it('agrees with turf kinks on random rings', () => {
    // Corners on a 0.001 lattice, so that no float subtleties decide the comparison.
    const point = fc.tuple(fc.integer({ min: 0, max: 10_000 }), fc.integer({ min: 0, max: 10_000 }));
    fc.assert(
      fc.property(fc.array(point, { minLength: 3, maxLength: 12 }), (corners) => {
        // turf's kinks misses collinear overlaps (it treats parallel segments as disjoint), and
        // repeated corners are removed before this check runs (validate.ts): skip both.
        const collinear = corners.some((a, i) =>
          corners.some((b, j) => j > i && corners.some((c, k) => k > j && (b[0] - a[0]) * (c[1] - a[1]) === (b[1] - a[1]) * (c[0] - a[0]))),
        );
        fc.pre(!collinear);
        const ring: Ring = [...corners, corners[0]].map(([x, y]) => [x / 1000, y / 1000]);
        const ours = findSelfIntersections([[ring]], 1000);
        const theirs = kinks(polygon([ring])).features;
        expect(ours.length > 0).toBe(theirs.length > 0);
      }),
      { numRuns: 300, seed: 20261201 },
    );
  });

  it('is fast on a 100 000-corner ring', () => {
    const n = 100_000;
    const ring: Ring = Array.from({ length: n }, (_, i) => {
      const a = (2 * Math.PI * i) / n;
      const r = 1 + 0.05 * Math.sin(37 * a);
      return [r * Math.cos(a), r * Math.sin(a)];
    });
    ring.push(ring[0]);
    const started = Date.now();
    expect(findSelfIntersections([[ring]], 5)).toEqual([]);
    expect(Date.now() - started).toBeLessThan(3000);
  });
});
