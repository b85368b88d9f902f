// Checks on polygon candidates, in the order they run: structure (before reprojection), then
// lon/lat range, repeated positions, ring areas. Each failure is a BoundaryInputError saying where.
import { isPolygonCoor } from 'geojson-validation';
import { BoundaryInputError } from './errors';
import { toLonLat } from './reproject';
import type { LonLat, LonLatCandidate, PolygonCandidate, PolygonRings, Ring } from './types';

/** Most positions a boundary may have, summed over all candidates. */
export const MAX_VERTICES = 200_000;

/** "polygon 2, ring 1 (exterior)", the polygon named only when there are several. */
export function ringName(polygon: number, ring: number, polygonCount: number): string {
  const part = polygonCount > 1 ? `polygon ${polygon + 1}, ` : '';
  return `${part}ring ${ring + 1} (${ring === 0 ? 'exterior' : `hole ${ring}`})`;
}

export function ringWhere(label: string, polygon: number, ring: number, polygonCount: number): string {
  return `${label}, ${ringName(polygon, ring, polygonCount)}`;
}

function formatPosition(position: readonly number[]): string {
  return `[${position.slice(0, 2).map((v) => Number(v.toPrecision(10))).join(', ')}]`;
}

export function countPositions(candidates: readonly PolygonCandidate[]): number {
  let count = 0;
  for (const c of candidates) for (const polygon of c.polygons) for (const ring of polygon) count += ring.length;
  return count;
}

export function checkVertexCount(count: number): void {
  if (count > MAX_VERTICES) {
    throw new BoundaryInputError(
      'too-many-vertices',
      `the boundary has ${count.toLocaleString('en-US')} positions, more than the ${MAX_VERTICES.toLocaleString('en-US')} allowed; ` +
        'simplify it in a GIS (e.g. to a 1 m tolerance) and upload it again',
    );
  }
}

function isPosition(value: unknown): value is number[] {
  return (
    Array.isArray(value) &&
    value.length >= 2 &&
    value.every((v) => typeof v === 'number' && Number.isFinite(v))
  );
}

/** Ring shape per RFC 7946 §3.1.6: arrays of ≥ 4 numeric positions, first equal to last. */
export function checkStructure(candidate: PolygonCandidate): void {
  const { label, polygons } = candidate;
  if (polygons.length === 0) {
    throw new BoundaryInputError('empty', `${label} has no coordinates: the polygon is empty`);
  }
  polygons.forEach((polygon, p) => {
    if (!Array.isArray(polygon) || polygon.length === 0) {
      throw new BoundaryInputError('empty', `${label}, polygon ${p + 1} has no rings: the polygon is empty`);
    }
    polygon.forEach((ring, r) => {
      const where = ringWhere(label, p, r, polygons.length);
      if (!Array.isArray(ring)) throw new BoundaryInputError('bad-coordinates', `${where} is not an array of positions`);
      const bad = ring.findIndex((position) => !isPosition(position));
      if (bad >= 0) {
        throw new BoundaryInputError(
          'bad-coordinates',
          `${where}, position ${bad + 1} is ${JSON.stringify(ring[bad])}; a position is [longitude, latitude] with two finite numbers (RFC 7946 §3.1.1)`,
        );
      }
      if (ring.length < 4) {
        throw new BoundaryInputError(
          'short-ring',
          `${where} has ${ring.length} positions; a ring needs at least 4 (three corners and the first repeated at the end, RFC 7946 §3.1.6)`,
        );
      }
      const first = ring[0];
      const last = ring[ring.length - 1];
      if (first[0] !== last[0] || first[1] !== last[1]) {
        throw new BoundaryInputError(
          'unclosed-ring',
          `${where} is not closed: it starts at ${formatPosition(first)} but ends at ${formatPosition(last)}; ` +
            'repeat the first position at the end (RFC 7946 §3.1.6)',
        );
      }
    });
    const problems = isPolygonCoor(polygon, true);
    if (problems.length > 0) {
      throw new BoundaryInputError('invalid-geojson', `${label}, polygon ${p + 1}: ${problems[0]}`);
    }
  });
}

/** 2-D lon/lat copies of a structurally valid candidate, reprojected from `definition` if given. */
export function toLonLatCandidate(candidate: PolygonCandidate, definition: string | null): LonLatCandidate {
  const convert = definition === null ? (p: number[]): LonLat => [p[0], p[1]] : toLonLat(definition);
  return {
    label: candidate.label,
    properties: candidate.properties,
    parts: candidate.polygons.map((polygon) => polygon.map((ring) => ring.map(convert))),
  };
}

/**
 * Refuses positions that cannot be lon/lat: |lat| > 90 or |lon| > 180. If every position would
 * fit with the two numbers exchanged, they are reported as swapped (RFC 7946 §3.1.1 wants
 * [longitude, latitude]); otherwise as projected metres, with what to do.
 */
export function checkLonLatRange(candidates: readonly LonLatCandidate[], hint: string): void {
  let firstBad: { where: string; position: LonLat } | null = null;
  let fitsSwapped = true;
  for (const c of candidates) {
    c.parts.forEach((polygon, p) =>
      polygon.forEach((ring, r) =>
        ring.forEach((position, i) => {
          const [lon, lat] = position;
          if (Math.abs(lat) > 90 || Math.abs(lon) > 180) {
            firstBad ??= { where: `${ringWhere(c.label, p, r, c.parts.length)}, position ${i + 1}`, position };
          }
          if (Math.abs(lon) > 90 || Math.abs(lat) > 180) fitsSwapped = false;
        }),
      ),
    );
  }
  if (firstBad === null) return;
  const { where, position } = firstBad as { where: string; position: LonLat };
  if (fitsSwapped) {
    throw new BoundaryInputError(
      'swapped-coordinates',
      `${where} is ${formatPosition(position)}: latitude cannot exceed 90°, and every position fits if the two numbers are exchanged, ` +
        'so the file seems to list [latitude, longitude]; GeoJSON wants [longitude, latitude] (RFC 7946 §3.1.1)',
    );
  }
  throw new BoundaryInputError(
    'projected-coordinates',
    `${where} is ${formatPosition(position)}, which is not a longitude/latitude: numbers this large look like metres in a projected ` +
      `coordinate system (e.g. UTM). ${hint}`,
  );
}

/** Removes positions equal to the one before them; returns how many went. */
export function dropRepeatedPositions(parts: PolygonRings[]): { parts: PolygonRings[]; removed: number } {
  let removed = 0;
  const cleaned = parts.map((polygon) =>
    polygon.map((ring) => {
      const kept = ring.filter((pos, i) => i === 0 || pos[0] !== ring[i - 1][0] || pos[1] !== ring[i - 1][1]);
      removed += ring.length - kept.length;
      return kept;
    }),
  );
  return { parts: cleaned, removed };
}

function allOnOneLine(ring: Ring): boolean {
  const [x0, y0] = ring[0];
  const [x1, y1] = ring[1];
  return ring.every(([x, y]) => (x1 - x0) * (y - y0) - (y1 - y0) * (x - x0) === 0);
}

/** Refuses rings that enclose nothing: fewer than 3 distinct corners, or all on one line. */
export function checkRingAreas(candidate: LonLatCandidate): void {
  candidate.parts.forEach((polygon, p) =>
    polygon.forEach((ring, r) => {
      if (ring.length < 4 || allOnOneLine(ring)) {
        throw new BoundaryInputError(
          'zero-area',
          `${ringWhere(candidate.label, p, r, candidate.parts.length)} encloses no area (its corners are repeated or lie on one line ` +
            `from ${formatPosition(ring[0])}); remove it or redraw it`,
        );
      }
    }),
  );
}
