import type { GridSpec } from '@/shared/geo/grid';
import { laeaDefinition, localProjection } from '@/shared/geo/laea';
import { fitFrame } from '@/features/studyAreas/drawing';

import { patchAt, patchOfCell, patchPlace } from './patchGeometry';

const spec: GridSpec = { projection: laeaDefinition(43.5, -116.2), originX: 0, originY: 0, cellSize: 10, rows: 2, cols: 4 };
const frame = fitFrame([0, 0, 40, 20]);
const cells = Int32Array.from([0, 1, 2, 5, 6, 7]);

describe('patch geometry', () => {
  test('finds a patch by its cell, or null for a cell outside the boundary', () => {
    expect(patchOfCell(cells, 5)).toBe(3);
    expect(patchOfCell(cells, 4)).toBeNull();
  });

  test('a point on the drawing picks the patch under it (row 0 at the south, drawn at the bottom)', () => {
    // Centre of cell (row 1, col 2) = cell 6 → patch 4.
    expect(patchAt(frame.x(25), frame.y(15), cells, spec, frame)).toBe(4);
    // Centre of cell (row 0, col 3) = cell 3 → not a patch.
    expect(patchAt(frame.x(35), frame.y(5), cells, spec, frame)).toBeNull();
    expect(patchAt(frame.x(-5), frame.y(5), cells, spec, frame)).toBeNull();
  });

  test('the centre of the grid origin cell sits just north-east of the projection centre', () => {
    const place = patchPlace(0, spec, localProjection(spec.projection));
    expect(place).toMatchObject({ row: 0, col: 0, x: 5, y: 5 });
    expect(place.lat).toBeGreaterThan(43.5);
    expect(place.lon).toBeGreaterThan(-116.2);
    expect(place.lat).toBeCloseTo(43.5, 3);
  });
});
