// Chooses the boundary among several polygon candidates: those matching `pick`, else all of them,
// merged into one (multi)polygon by a turf union when there is more than one.
import { featureCollection, multiPolygon, union } from '@turf/turf';
import { BoundaryInputError } from './errors';
import type { LonLatCandidate, PickOption, PolygonRings } from './types';

function picked(candidates: LonLatCandidate[], pick: PickOption): LonLatCandidate[] {
  const matches = candidates.filter((c) => String(c.properties[pick.property]) === String(pick.value));
  if (matches.length > 0) return matches;
  const seen = [...new Set(candidates.map((c) => c.properties[pick.property]).filter((v) => v !== undefined))];
  const listed = seen.slice(0, 10).map((v) => JSON.stringify(v)).join(', ');
  throw new BoundaryInputError(
    'pick-not-found',
    `no polygon feature has ${pick.property} = ${JSON.stringify(pick.value)}; ` +
      (seen.length > 0 ? `values found: ${listed}${seen.length > 10 ? ', …' : ''}` : `no feature has a "${pick.property}" property`),
  );
}

export function selectBoundary(
  candidates: LonLatCandidate[],
  pick: PickOption | undefined,
): { parts: PolygonRings[]; notes: string[] } {
  const chosen = pick ? picked(candidates, pick) : candidates;
  const notes = pick ? [`picked ${chosen.map((c) => c.label).join(', ')} by ${pick.property} = ${JSON.stringify(pick.value)}`] : [];
  if (chosen.length === 1) return { parts: chosen[0].parts, notes };
  const merged = union(featureCollection(chosen.map((c) => multiPolygon(c.parts))));
  if (merged === null) {
    throw new BoundaryInputError('zero-area', `merging the ${chosen.length} polygon features left no area`);
  }
  const geometry = merged.geometry;
  const parts = (geometry.type === 'Polygon' ? [geometry.coordinates] : geometry.coordinates) as PolygonRings[];
  notes.push(`merged ${chosen.length} polygon features into one boundary (union)`);
  return { parts, notes };
}
