// Ring orientation. RFC 7946 §3.1.6: exterior rings counter-clockwise, holes clockwise.
import type { PolygonRings, Ring } from './types';

/** Twice the signed planar area of a closed ring (shoelace formula); > 0 when counter-clockwise. */
export function ringSignedArea(ring: ReadonlyArray<readonly number[]>): number {
  let sum = 0;
  const [x0, y0] = ring[0];
  for (let i = 1; i + 1 < ring.length; i++) {
    // Relative to the first corner, for precision with large coordinates.
    sum += (ring[i][0] - x0) * (ring[i + 1][1] - y0) - (ring[i + 1][0] - x0) * (ring[i][1] - y0);
  }
  return sum;
}

/** Rings turned to the RFC 7946 orientation, and how many had to be reversed. */
export function orientRings(parts: PolygonRings[]): { parts: PolygonRings[]; reversed: number } {
  let reversed = 0;
  const oriented = parts.map((polygon) =>
    polygon.map((ring, r): Ring => {
      const wantPositive = r === 0;
      if (ringSignedArea(ring) > 0 === wantPositive) return ring;
      reversed++;
      return [...ring].reverse();
    }),
  );
  return { parts: oriented, reversed };
}
