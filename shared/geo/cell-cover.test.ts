import { bboxPolygon, featureCollection, intersect, polygon } from '@turf/turf';
import fc from 'fast-check';
import { starRing, starSpec } from '../../tests/fixtures/geo/arbitraries';
import { coverCells } from './cell-cover';
import { ringSignedArea } from './winding';

const flat = (ring: number[][]): Float64Array => Float64Array.from(ring.flat());
const all = { minFraction: 0, maxPatches: 1000 };

function asMap(rings: number[][][], rows: number, cols: number, minFraction = 0): Map<number, number> {
  const cover = coverCells(rings.map(flat), { rows, cols, ...all, minFraction })!;
  return new Map(Array.from(cover.cells, (cell, i) => [cell, cover.fractions[i]]));
}

/** Reference: exact planar area of ring ∩ cell by polygon clipping (polyclip-ts through turf). */
function clippedArea(rings: number[][][], col: number, row: number): number {
  const result = intersect(featureCollection([polygon(rings), bboxPolygon([col, row, col + 1, row + 1])]));
  if (result === null) return 0;
  const polygons = result.geometry.type === 'Polygon' ? [result.geometry.coordinates] : result.geometry.coordinates;
  let twice = 0;
  for (const p of polygons) for (const ring of p) twice += ringSignedArea(ring);
  return twice / 2;
}

describe('coverCells', () => {
  it('splits a square with a square hole into its worked-out fractions', () => {
    // Square [0.5, 2.5]² with hole [1.2, 1.8]²: corner cells ¼, edge cells ½, centre 1 − 0.36.
    const outer = [[0.5, 0.5], [2.5, 0.5], [2.5, 2.5], [0.5, 2.5], [0.5, 0.5]];
    const hole = [[1.2, 1.2], [1.2, 1.8], [1.8, 1.8], [1.8, 1.2], [1.2, 1.2]];
    const got = asMap([outer, hole], 3, 3);
    expect([...got.keys()]).toEqual([0, 1, 2, 3, 4, 5, 6, 7, 8]);
    [0, 2, 6, 8].forEach((c) => expect(got.get(c)).toBeCloseTo(0.25, 12));
    [1, 3, 5, 7].forEach((c) => expect(got.get(c)).toBeCloseTo(0.5, 12));
    expect(got.get(4)).toBeCloseTo(0.64, 12);
  });

  it('leaves out cells that only touch the polygon along a grid line', () => {
    // Triangle with legs on the grid lines: the diagonal cells are halves, cells beyond are absent.
    const got = asMap([[[0, 0], [3, 0], [0, 3], [0, 0]]], 3, 3);
    expect([...got.entries()]).toEqual([[0, 1], [1, 1], [2, 0.5], [3, 1], [4, 0.5], [6, 0.5]]);
  });

  it('drops cells under the minimum fraction', () => {
    const outer = [[0.5, 0.5], [2.5, 0.5], [2.5, 2.5], [0.5, 2.5], [0.5, 0.5]];
    expect([...asMap([outer], 3, 3, 0.3).keys()]).toEqual([1, 3, 4, 5, 7]);
  });

  it('returns null past the patch limit', () => {
    const outer = [[0, 0], [3, 0], [3, 3], [0, 3], [0, 0]];
    expect(coverCells([flat(outer)], { rows: 3, cols: 3, minFraction: 0, maxPatches: 8 })).toBeNull();
  });

  it('matches exact polygon clipping cell by cell on random polygons with a hole', () => {
    fc.assert(
      fc.property(starSpec, starSpec, fc.double({ min: 0, max: 1, noNaN: true }), (outerSpec, holeSpec, shift) => {
        const outer = starRing(outerSpec, 3 + shift, 3.2, 2.9);
        const hole = starRing(holeSpec, 3 + shift, 3.2, 0.2).reverse();
        const got = asMap([outer, hole], 7, 7);
        let total = 0;
        for (let row = 0; row < 7; row++) {
          for (let col = 0; col < 7; col++) {
            const expected = clippedArea([outer, hole], col, row);
            expect(got.get(row * 7 + col) ?? 0).toBeCloseTo(expected, 9);
            total += got.get(row * 7 + col) ?? 0;
          }
        }
        // The total adds 49 cells' rounding: compare it to 1e-8, not the per-cell 1e-9.
        expect(total).toBeCloseTo((ringSignedArea(outer) + ringSignedArea(hole)) / 2, 8);
      }),
      // A fixed seed keeps CI repeatable; change it locally to explore more polygons.
      { numRuns: 30, seed: 20261201 },
    );
  });
});
