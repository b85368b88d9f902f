// Area of a lon/lat boundary on the WGS84 ellipsoid, with geodesic edges (Karney 2013,
// "Algorithms for geodesics", J. Geodesy 87:43–55, via geographiclib-geodesic).
import { Geodesic, PolygonArea } from 'geographiclib-geodesic';
import type { Boundary, Ring } from './types';

function ringArea(ring: Ring): number {
  const polygon = new PolygonArea.PolygonArea(Geodesic.WGS84, false);
  // The closing position repeats the first; PolygonArea closes the ring itself.
  for (let i = 0; i + 1 < ring.length; i++) polygon.AddPoint(ring[i][1], ring[i][0]);
  return Math.abs(polygon.Compute(false, true).area ?? 0);
}

/** Ellipsoidal area in m²: exterior rings minus their holes, summed over the parts. */
export function geodesicArea(boundary: Pick<Boundary, 'parts'>): number {
  let total = 0;
  for (const polygon of boundary.parts) {
    polygon.forEach((ring, r) => (total += r === 0 ? ringArea(ring) : -ringArea(ring)));
  }
  return total;
}
