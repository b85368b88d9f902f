// Two dated cover maps as a survey: each patch's state on each map is the state of the polygon
// under its centroid (shared/cover assignFromCoverMap), and the pairs are counted per patch.
import { AppError } from '../http/errors';
import { assignFromCoverMap, UNASSIGNED } from '../../shared/cover/cover-map';
import { countMapPairs, type TransitionCounts } from '../../shared/markov';
import { readPolygonFeatures, type PolygonFeature } from '../../shared/geo';
import type { CoverState } from '../../shared/schemas';
import type { UploadedFile } from './study-areas';
import { requireAllMapped, type LabelMap } from './state-mapping';
import { approx } from './chain-readings';
import { loadStoredGrid } from './stored-grid';

export type MapPairCounts = { counts: TransitionCounts; unmatched: { earlier: number; later: number }; readings: string[] };

export type DatedMap = { file: UploadedFile; date: string; role: 'earlier' | 'later' };

async function mapFeatures(map: DatedMap, property: string, labels: LabelMap): Promise<PolygonFeature[]> {
  const { features } = await readPolygonFeatures(new Uint8Array(map.file.buffer), map.file.originalname);
  // Own attributes only: `in` would also find Object.prototype's ("constructor", "toString").
  if (!features.some((f) => Object.hasOwn(f.properties, property))) {
    throw new AppError(400, 'invalid_mapping', `No polygon on the ${map.role} map (${map.file.originalname}) has the attribute "${property}"; choose an attribute both maps have.`);
  }
  const firstSeen = new Map<string, string>();
  features.forEach((f, n) => {
    const value = String(f.properties[property] ?? '');
    if (!firstSeen.has(value)) firstSeen.set(value, `polygon ${n + 1} of the ${map.role} map`);
  });
  requireAllMapped(firstSeen, labels, `The maps' "${property}"`);
  return features;
}

const years = (from: string, to: string): number => (Date.parse(to) - Date.parse(from)) / (365.25 * 86_400_000);

/** Paired patch states from the two maps, counted (shared/markov countMapPairs). */
export async function countMapPair(studyAreaId: number, maps: [DatedMap, DatedMap], property: string, labels: LabelMap, states: readonly CoverState[]): Promise<MapPairCounts> {
  const { grid, boundary } = await loadStoredGrid(studyAreaId);
  const names = states.map((s) => s.name);
  const [before, after] = await Promise.all(
    maps.map(async (map) => {
      const features = await mapFeatures(map, property, labels);
      const stateOf = (f: PolygonFeature): number | null => labels.get(String(f.properties[property] ?? '')) ?? null;
      const { states: assigned, unmatchedCount } = assignFromCoverMap(grid, boundary, features, stateOf, null);
      return { states: [...assigned].map((s) => (s === UNASSIGNED ? null : names[s])), unmatchedCount };
    }),
  );
  const [earlier, later] = maps;
  const counts = countMapPairs(before.states, after.states, {
    states: names,
    beforeTime: new Date(earlier.date).getUTCFullYear(),
    afterTime: new Date(later.date).getUTCFullYear(),
  });
  const gap = approx(years(earlier.date, later.date));
  const readings = [`The maps are ${gap} years apart, so this matrix is for a step of ${gap} years: set the scenario's years per step to ${gap} when you use it.`];
  return { counts, unmatched: { earlier: before.unmatchedCount, later: after.unmatchedCount }, readings };
}
