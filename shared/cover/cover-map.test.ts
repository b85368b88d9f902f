import { readFileSync } from 'node:fs';
import path from 'node:path';
import { booleanPointInPolygon, polygon as turfPolygon } from '@turf/turf';
import { buildPatchGrid, patchCentroid, projectBoundary, readBoundary, localProjection, type PolygonFeature, type LonLat } from '../geo';
import { assignFromCoverMap, UNASSIGNED } from './cover-map';

const file = path.resolve(__dirname, '../../server/seed/boundaries/cinder-flat.geojson');

/** A rectangle in lon/lat with its edges cut into many short pieces, so straight-in-degrees and straight-in-metres agree. */
function densifiedBox(w: number, s: number, e: number, n: number, pieces = 200): LonLat[] {
  const ring: LonLat[] = [];
  const edge = (a: LonLat, b: LonLat): void => {
    for (let k = 0; k < pieces; k++) ring.push([a[0] + ((b[0] - a[0]) * k) / pieces, a[1] + ((b[1] - a[1]) * k) / pieces]);
  };
  edge([w, s], [e, s]);
  edge([e, s], [e, n]);
  edge([e, n], [w, n]);
  edge([w, n], [w, s]);
  ring.push([w, s]);
  return ring;
}

test('when a cover map splits the area, then each patch takes the state of the polygon under its centroid, as turf finds it', async () => {
  const boundary = await readBoundary(readFileSync(file), { fileName: 'cinder-flat.geojson' });
  const grid = buildPatchGrid(boundary, { cellSize: 250 });
  const lons = boundary.parts.flatMap((p) => p[0].map((q) => q[0]));
  const lats = boundary.parts.flatMap((p) => p[0].map((q) => q[1]));
  const [w, e, s, n] = [Math.min(...lons), Math.max(...lons), Math.min(...lats), Math.max(...lats)];
  const midLon = (w + e) / 2;
  const midLat = (s + n) / 2;
  const features: PolygonFeature[] = [
    // A small box in the middle first: where polygons overlap, the first one wins.
    { label: 'centre', properties: { cover: 'bare' }, parts: [[densifiedBox(midLon - 0.01, midLat - 0.01, midLon + 0.01, midLat + 0.01)]] },
    { label: 'west', properties: { cover: 'shrub' }, parts: [[densifiedBox(w - 0.01, s - 0.01, midLon, n + 0.01)]] },
    // The east box stops short of the northern edge, so some patches lie under no polygon.
    { label: 'east', properties: { cover: 'grass' }, parts: [[densifiedBox(midLon, s - 0.01, e + 0.01, midLat + (n - midLat) / 2)]] },
  ];
  const stateIndex: Record<string, number> = { shrub: 0, grass: 1, bare: 2 };
  const result = assignFromCoverMap(grid, boundary, features, (f) => stateIndex[String(f.properties.cover)], null);

  // Reference: turf's booleanPointInPolygon (general-purpose library) at each patch centroid.
  const shape = projectBoundary(boundary, localProjection(grid.spec.projection));
  const turfPolygons = features.map((f) => turfPolygon(f.parts[0]));
  let mismatches = 0;
  let unmatched = 0;
  for (let i = 0; i < grid.cells.length; i++) {
    const centroid = patchCentroid(grid, shape, i);
    const k = turfPolygons.findIndex((p) => booleanPointInPolygon(centroid, p));
    const expected = k < 0 ? UNASSIGNED : stateIndex[String(features[k].properties.cover)];
    if (expected === UNASSIGNED) unmatched++;
    if (result.states[i] !== expected) mismatches++;
  }
  expect(unmatched).toBeGreaterThan(0);
  expect(result.unmatchedCount).toBe(unmatched);
  // Centroids within a few metres of an edge may fall either way; allow 0.2 % of patches.
  expect(mismatches / grid.cells.length).toBeLessThan(0.002);
  expect(new Set(result.states)).toEqual(new Set([0, 1, 2, UNASSIGNED]));
});

test('when a fallback state is given, then patches under no polygon take it', async () => {
  const boundary = await readBoundary(readFileSync(file), { fileName: 'cinder-flat.geojson' });
  const grid = buildPatchGrid(boundary, { cellSize: 500 });
  const result = assignFromCoverMap(grid, boundary, [], () => 0, 3);
  expect(result.unmatchedCount).toBe(grid.cells.length);
  expect(result.states.every((s) => s === 3)).toBe(true);
});
