// A boundary in its local equal-area frame (metres), with the planar measures the grid needs.
import { projectionFor, type LocalProjection } from './laea';
import { ringSignedArea } from './winding';
import type { Boundary } from './types';

export type ProjectedBoundary = {
  projection: LocalProjection;
  /** Polygons in metres: exterior counter-clockwise, holes clockwise, as in the lon/lat boundary. */
  parts: [number, number][][][];
  /** [minX, minY, maxX, maxY] in metres. */
  bbox: [number, number, number, number];
  /** Planar area in the equal-area frame, m² (equals the ellipsoidal area up to edge shape). */
  areaM2: number;
  perimeterM: number;
};

export function projectBoundary(boundary: Pick<Boundary, 'parts'>, projection = projectionFor(boundary)): ProjectedBoundary {
  const bbox: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  let areaM2 = 0;
  let perimeterM = 0;
  const parts = boundary.parts.map((polygon) =>
    polygon.map((ring, r) => {
      const projected = ring.map(projection.forward);
      // Orientation is kept by the projection, but check it in metres: exterior > 0, holes < 0.
      const signed = ringSignedArea(projected) / 2;
      if (signed > 0 !== (r === 0)) projected.reverse();
      areaM2 += r === 0 ? Math.abs(signed) : -Math.abs(signed);
      for (let i = 0; i < projected.length; i++) {
        const [x, y] = projected[i];
        bbox[0] = Math.min(bbox[0], x);
        bbox[1] = Math.min(bbox[1], y);
        bbox[2] = Math.max(bbox[2], x);
        bbox[3] = Math.max(bbox[3], y);
        if (i > 0) perimeterM += Math.hypot(x - projected[i - 1][0], y - projected[i - 1][1]);
      }
      return projected;
    }),
  );
  return { projection, parts, bbox, areaM2, perimeterM };
}
