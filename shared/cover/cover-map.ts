// Start cover from a cover map: each patch takes the state of the map polygon under its
// centroid. Works in the study area's equal-area frame: whole cells by a scanline along each
// grid row's centre line, clipped boundary cells by a point-in-polygon test at their centroid.
import { localProjection, patchCentroid, projectBoundary, type Boundary, type PatchGrid, type PolygonFeature } from '../geo';

type XY = [number, number];
type ProjectedPolygon = { state: number; rings: XY[][]; bbox: [number, number, number, number] };

export type CoverMapResult = {
  /** State index per patch; `fallback` (or 255 when none was given) where no mapped polygon lies under the centroid. */
  states: Uint8Array;
  unmatchedCount: number;
};

export const UNASSIGNED = 255;

function projectPolygons(features: readonly PolygonFeature[], stateOf: (f: PolygonFeature) => number | null, forward: (p: XY) => XY): ProjectedPolygon[] {
  const polygons: ProjectedPolygon[] = [];
  for (const feature of features) {
    const state = stateOf(feature);
    if (state === null) continue;
    for (const polygon of feature.parts) {
      const rings = polygon.map((ring) => ring.map((p) => forward(p)));
      const bbox: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
      for (const [x, y] of rings[0]) {
        if (x < bbox[0]) bbox[0] = x;
        if (y < bbox[1]) bbox[1] = y;
        if (x > bbox[2]) bbox[2] = x;
        if (y > bbox[3]) bbox[3] = y;
      }
      polygons.push({ state, rings, bbox });
    }
  }
  return polygons;
}

/** x positions where the horizontal line at y crosses the rings' edges (half-open rule, so vertices count once). */
function crossings(rings: XY[][], y: number): number[] {
  const xs: number[] = [];
  for (const ring of rings) {
    for (let i = 1; i < ring.length; i++) {
      const [x1, y1] = ring[i - 1];
      const [x2, y2] = ring[i];
      if (y1 <= y !== y2 <= y) xs.push(x1 + ((y - y1) / (y2 - y1)) * (x2 - x1));
    }
  }
  return xs.sort((a, b) => a - b);
}

/** Even–odd point-in-polygon by ray casting (Shimrat 1962, Algorithm 112). */
function contains(rings: XY[][], [x, y]: XY): boolean {
  let inside = false;
  for (const ring of rings) {
    for (let i = 1; i < ring.length; i++) {
      const [x1, y1] = ring[i - 1];
      const [x2, y2] = ring[i];
      if (y1 <= y !== y2 <= y && x < x1 + ((y - y1) / (y2 - y1)) * (x2 - x1)) inside = !inside;
    }
  }
  return inside;
}

/**
 * Assigns a state to every patch from map polygons; `stateOf` maps a feature to a state index
 * (null = unmapped, ignored). Where polygons overlap, the first in file order wins.
 */
export function assignFromCoverMap(
  grid: PatchGrid,
  boundary: Pick<Boundary, 'parts'>,
  features: readonly PolygonFeature[],
  stateOf: (f: PolygonFeature) => number | null,
  fallback: number | null,
): CoverMapResult {
  const { spec, cells, areas } = grid;
  const projection = localProjection(spec.projection);
  const polygons = projectPolygons(features, stateOf, projection.forward);
  const states = new Uint8Array(cells.length).fill(UNASSIGNED);
  const patchOfCell = new Map<number, number>();
  cells.forEach((cell, i) => patchOfCell.set(cell, i));
  const whole = spec.cellSize ** 2 * (1 - 1e-6);

  for (const polygon of polygons) {
    const firstRow = Math.max(0, Math.floor((polygon.bbox[1] - spec.originY) / spec.cellSize - 0.5));
    const lastRow = Math.min(spec.rows - 1, Math.ceil((polygon.bbox[3] - spec.originY) / spec.cellSize - 0.5));
    for (let row = firstRow; row <= lastRow; row++) {
      const xs = crossings(polygon.rings, spec.originY + (row + 0.5) * spec.cellSize);
      for (let k = 0; k + 1 < xs.length; k += 2) {
        const fromCol = Math.max(0, Math.ceil((xs[k] - spec.originX) / spec.cellSize - 0.5));
        const toCol = Math.min(spec.cols - 1, Math.floor((xs[k + 1] - spec.originX) / spec.cellSize - 0.5));
        for (let col = fromCol; col <= toCol; col++) {
          const i = patchOfCell.get(row * spec.cols + col);
          if (i !== undefined && areas[i] >= whole && states[i] === UNASSIGNED) states[i] = polygon.state;
        }
      }
    }
  }

  // Clipped cells: their centroid is not the cell centre, so test it directly.
  const shape = projectBoundary(boundary, projection);
  for (let i = 0; i < cells.length; i++) {
    if (areas[i] >= whole) continue;
    const point = projection.forward(patchCentroid(grid, shape, i));
    const hit = polygons.find((p) => point[0] >= p.bbox[0] && point[0] <= p.bbox[2] && point[1] >= p.bbox[1] && point[1] <= p.bbox[3] && contains(p.rings, point));
    if (hit) states[i] = hit.state;
  }

  let unmatchedCount = 0;
  for (let i = 0; i < states.length; i++) {
    if (states[i] !== UNASSIGNED) continue;
    unmatchedCount++;
    if (fallback !== null) states[i] = fallback;
  }
  return { states, unmatchedCount };
}
