// Patch-state GeoJSON, written piece by piece: an RFC 7946 FeatureCollection in WGS84 lon/lat
// with one Polygon (or MultiPolygon, where the boundary cuts a cell in two) per patch. No whole
// file is ever held as one string, so 250,000 features stream in constant memory.
import type { PatchGrid } from './grid';
import { patchPolygon, rowCol } from './patch-geometry';
import type { ProjectedBoundary } from './projected-boundary';

export type PatchProperties = Record<string, string | number | null>;

// 7 decimals of a degree is about 1 cm: RFC 7946 §11.2 advises against needless precision.
const round7 = (v: number): number => Math.round(v * 1e7) / 1e7;

function roundPositions(value: unknown): unknown {
  return typeof value === 'number' ? round7(value) : Array.isArray(value) ? value.map(roundPositions) : value;
}

/** The standard per-patch attributes: index, row and column (row 0 is the southern edge), area in m². */
export function patchAttributes(grid: PatchGrid, i: number): { patch: number; row: number; col: number; areaM2: number } {
  const { row, col } = rowCol(grid.spec, grid.cells[i]);
  return { patch: i, row, col, areaM2: Math.round(grid.areas[i] * 100) / 100 };
}

/**
 * Yields the FeatureCollection text in chunks of about `batch` features. `properties(i)` gives
 * each patch's attributes (e.g. state code and name, step, year).
 */
export function* patchFeatureCollection(grid: PatchGrid, shape: ProjectedBoundary, properties: (i: number) => PatchProperties, batch = 500): Generator<string> {
  yield '{"type":"FeatureCollection","features":[';
  let chunk: string[] = [];
  for (let i = 0; i < grid.cells.length; i++) {
    const geometry = patchPolygon(grid, shape, i);
    const feature = { type: 'Feature', properties: properties(i), geometry: { type: geometry.type, coordinates: roundPositions(geometry.coordinates) } };
    chunk.push(JSON.stringify(feature));
    if (chunk.length === batch) {
      yield (i + 1 > batch ? ',' : '') + chunk.join(',');
      chunk = [];
    }
  }
  if (chunk.length > 0) yield (grid.cells.length > chunk.length ? ',' : '') + chunk.join(',');
  yield ']}';
}
