// Geometry of single patches for export and lookups: cell outlines, clipped outlines and
// centroids, in lon/lat (RFC 7946 order and winding).
import type { MultiPolygon, Polygon } from 'geojson';
import { clipToRect, polygonsCentroid, type Rect } from './clip';
import type { GridSpec, PatchGrid } from './grid';
import { localProjection } from './laea';
import type { ProjectedBoundary } from './projected-boundary';
import type { LonLat } from './types';

export function rowCol(spec: GridSpec, cell: number): { row: number; col: number } {
  return { row: Math.floor(cell / spec.cols), col: cell % spec.cols };
}

export function cellRect(spec: GridSpec, cell: number): Rect {
  const { row, col } = rowCol(spec, cell);
  const x = spec.originX + col * spec.cellSize;
  const y = spec.originY + row * spec.cellSize;
  return [x, y, x + spec.cellSize, y + spec.cellSize];
}

/** Centre of a cell in the grid's projection, metres. */
export function cellCentre(spec: GridSpec, cell: number): [number, number] {
  const [x0, y0, x1, y1] = cellRect(spec, cell);
  return [(x0 + x1) / 2, (y0 + y1) / 2];
}

export function cellCentreLonLat(spec: GridSpec, cell: number): LonLat {
  return localProjection(spec.projection).inverse(cellCentre(spec, cell));
}

/** The whole cell as a lon/lat polygon (its four corners, counter-clockwise). */
export function cellPolygon(spec: GridSpec, cell: number): Polygon {
  const [x0, y0, x1, y1] = cellRect(spec, cell);
  const { inverse } = localProjection(spec.projection);
  const corners = [[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]].map(inverse);
  return { type: 'Polygon', coordinates: [corners] };
}

/** Whether the i-th patch is a whole cell (no clipping needed). */
function isWhole(grid: PatchGrid, i: number): boolean {
  return grid.areas[i] >= grid.spec.cellSize ** 2 * (1 - 1e-6);
}

/** The i-th patch clipped to the boundary, in lon/lat. */
export function patchPolygon(grid: PatchGrid, shape: ProjectedBoundary, i: number): Polygon | MultiPolygon {
  const cell = grid.cells[i];
  if (isWhole(grid, i)) return cellPolygon(grid.spec, cell);
  const { inverse } = localProjection(grid.spec.projection);
  const pieces = clipToRect(shape, cellRect(grid.spec, cell)).map((polygon) => polygon.map((ring) => ring.map(inverse)));
  return pieces.length === 1 ? { type: 'Polygon', coordinates: pieces[0] } : { type: 'MultiPolygon', coordinates: pieces };
}

/** Area-weighted centroid of the i-th clipped patch, in lon/lat (the cell centre for whole cells). */
export function patchCentroid(grid: PatchGrid, shape: ProjectedBoundary, i: number): LonLat {
  const cell = grid.cells[i];
  const { inverse } = localProjection(grid.spec.projection);
  if (isWhole(grid, i)) return inverse(cellCentre(grid.spec, cell));
  return inverse(polygonsCentroid(clipToRect(shape, cellRect(grid.spec, cell))) ?? cellCentre(grid.spec, cell));
}
