// Exact clipped polygon of one cell, for export and centroids (areas come from cell-cover.ts):
// turf's bboxClip cuts the rings to the cell (Sutherland–Hodgman, 1974), then turf's intersect
// (polyclip-ts, Martinez–Rueda sweep) cleans the result into valid polygons.
import { bboxClip, bboxPolygon, featureCollection, intersect, polygon as turfPolygon } from '@turf/turf';
import type { Polygon } from 'geojson';
import type { ProjectedBoundary } from './projected-boundary';

export type Rect = [number, number, number, number];

/** Polygons (in metres) of the boundary inside `rect`; empty when they do not overlap. */
export function clipToRect(shape: ProjectedBoundary, rect: Rect): number[][][][] {
  const pieces: number[][][][] = [];
  for (const part of shape.parts) {
    // bboxClip drops rings left with no area; holes lie inside their exterior, so when anything
    // is left the exterior comes first.
    const rings = (bboxClip(turfPolygon(part), rect).geometry as Polygon).coordinates;
    if (rings.length === 0) continue;
    const cleaned = intersect(featureCollection([turfPolygon(rings), bboxPolygon(rect)]));
    if (cleaned === null) continue;
    const g = cleaned.geometry;
    pieces.push(...(g.type === 'Polygon' ? [g.coordinates] : g.coordinates));
  }
  return pieces;
}

/** Area-weighted centroid of polygons (shoelace moments; holes count negatively by orientation). */
export function polygonsCentroid(polygons: number[][][][]): [number, number] | null {
  let area = 0;
  let cx = 0;
  let cy = 0;
  for (const polygon of polygons) {
    for (const ring of polygon) {
      const [x0, y0] = ring[0];
      for (let i = 0; i + 1 < ring.length; i++) {
        const [xa, ya] = [ring[i][0] - x0, ring[i][1] - y0];
        const [xb, yb] = [ring[i + 1][0] - x0, ring[i + 1][1] - y0];
        const cross = xa * yb - xb * ya;
        area += cross;
        cx += (xa + xb) * cross + 3 * x0 * cross;
        cy += (ya + yb) * cross + 3 * y0 * cross;
      }
    }
  }
  return area === 0 ? null : [cx / (3 * area), cy / (3 * area)];
}
