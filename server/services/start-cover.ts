// Start cover: the state of every patch at step 0, by proportions (seeded) or from a cover map.
import { createHash, randomBytes } from 'node:crypto';
import { StartCover, StudyArea } from '../models';
import { AppError, forbidden } from '../http/errors';
import { assignByProportions, checkProportions, CoverInputError } from '../../shared/cover/proportions';
import { assignFromCoverMap } from '../../shared/cover/cover-map';
import { readPolygonFeatures, type PolygonFeature } from '../../shared/geo';
import type { CoverMapFields, CoverMapInspection, ProportionsStartCoverBody, StartCoverSummary } from '../../shared/schemas';
import type { StudyAreaAccess, UploadedFile } from './study-areas';
import { bytesOf, float32s, loadStoredGrid } from './stored-grid';

function summarise(cover: StartCover, areas: Float32Array, stateCount: number): StartCoverSummary {
  const patches = new Array<number>(stateCount).fill(0);
  const areaM2 = new Array<number>(stateCount).fill(0);
  new Uint8Array(cover.states).forEach((s, i) => {
    patches[s] += 1;
    areaM2[s] += areas[i];
  });
  return {
    method: cover.method,
    seed: cover.seed,
    proportions: cover.proportions,
    patches,
    areaM2,
    unmatchedCount: cover.unmatchedCount,
    sourceName: cover.sourceName,
    updatedAt: cover.updatedAt.toISOString(),
  };
}

async function patchAreas(studyAreaId: number): Promise<Float32Array> {
  const row = await StudyArea.scope('withGrid').findByPk(studyAreaId, { attributes: ['patchAreas'] });
  return float32s(row!.patchAreas);
}

export async function startCoverSummary(access: StudyAreaAccess): Promise<StartCoverSummary | null> {
  const cover = await StartCover.findByPk(access.studyArea.id);
  if (!cover) return null;
  return summarise(cover, await patchAreas(access.studyArea.id), access.studyArea.states?.length ?? 0);
}

function requireEditor(access: StudyAreaAccess): void {
  if (access.role === 'viewer') throw forbidden('Only owners and editors can set the start cover.');
}

function requireMapFile(file: UploadedFile | undefined): UploadedFile {
  if (!file) throw new AppError(400, 'file_missing', 'Attach the cover map as the form field "file" (GeoJSON, zipped shapefile or KML with polygons).');
  return file;
}

const MAX_VALUES_LISTED = 100;

/** The cover map's attribute names with their distinct values, for the mapping step. */
export async function inspectCoverMap(access: StudyAreaAccess, file: UploadedFile | undefined): Promise<CoverMapInspection> {
  requireEditor(access);
  const upload = requireMapFile(file);
  const { features, warnings } = await readPolygonFeatures(new Uint8Array(upload.buffer), upload.originalname);
  const tallies = new Map<string, Map<string, number>>();
  for (const f of features) {
    for (const [name, value] of Object.entries(f.properties)) {
      if (value === null || typeof value === 'object') continue;
      const tally = tallies.get(name) ?? new Map<string, number>();
      tally.set(String(value), (tally.get(String(value)) ?? 0) + 1);
      tallies.set(name, tally);
    }
  }
  const properties = [...tallies].map(([name, tally]) => ({
    name,
    values: [...tally].map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count || a.value.localeCompare(b.value)).slice(0, MAX_VALUES_LISTED),
  }));
  return { featureCount: features.length, properties, warnings };
}

function parseMapping(json: string, codes: string[]): Map<string, number> {
  let raw: unknown;
  try {
    raw = JSON.parse(json);
  } catch {
    throw new AppError(400, 'invalid_input', 'mapping must be JSON: an object from map values to cover-state codes, e.g. {"sage": "SS"}.');
  }
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) throw new AppError(400, 'invalid_input', 'mapping must be a JSON object from map values to state codes.');
  const mapping = new Map<string, number>();
  for (const [value, code] of Object.entries(raw)) {
    const index = codes.indexOf(String(code));
    if (index < 0) throw new AppError(400, 'invalid_mapping', `The map value "${value}" is mapped to "${String(code)}", which is not a cover state of this study area (${codes.join(', ')}).`);
    mapping.set(value, index);
  }
  return mapping;
}

export async function setStartCoverFromMap(access: StudyAreaAccess, file: UploadedFile | undefined, fields: CoverMapFields): Promise<StartCoverSummary> {
  requireEditor(access);
  const upload = requireMapFile(file);
  const codes = (access.studyArea.states ?? []).map((s) => s.code);
  const mapping = parseMapping(fields.mapping, codes);
  const fallback = fields.fallback ? codes.indexOf(fields.fallback) : null;
  if (fallback === -1) throw new AppError(400, 'invalid_mapping', `The fallback "${fields.fallback}" is not a cover state of this study area (${codes.join(', ')}).`);
  const { features } = await readPolygonFeatures(new Uint8Array(upload.buffer), upload.originalname);
  // Own attributes only: `in` would also find Object.prototype's ("constructor", "toString").
  if (!features.some((f) => Object.hasOwn(f.properties, fields.property))) {
    throw new AppError(400, 'invalid_mapping', `No polygon in the map has the attribute "${fields.property}"; choose one of the attributes the map has.`);
  }
  const { grid, boundary } = await loadStoredGrid(access.studyArea.id);
  const stateOf = (f: PolygonFeature): number | null => mapping.get(String(f.properties[fields.property])) ?? null;
  const { states, unmatchedCount } = assignFromCoverMap(grid, boundary, features, stateOf, fallback);
  if (unmatchedCount > 0 && fallback === null) {
    throw new AppError(400, 'unmatched_patches', `${unmatchedCount} patch(es) lie under no mapped polygon: choose a fallback state for them, or map more values.`, { unmatchedCount });
  }
  const [cover] = await StartCover.upsert({
    studyAreaId: access.studyArea.id,
    method: 'cover-map',
    proportions: null,
    seed: null,
    states: bytesOf(states),
    unmatchedCount,
    mapping: Object.fromEntries([...mapping].map(([value, index]) => [value, codes[index]])),
    sourceName: upload.originalname,
    sourceSha256: createHash('sha256').update(upload.buffer).digest('hex'),
  });
  return summarise(cover, grid.areas, codes.length);
}

export async function setStartCoverByProportions(access: StudyAreaAccess, body: ProportionsStartCoverBody): Promise<StartCoverSummary> {
  requireEditor(access);
  const { studyArea } = access;
  const names = (studyArea.states ?? []).map((s) => s.name);
  try {
    checkProportions(body.proportions, names);
  } catch (err) {
    if (err instanceof CoverInputError) throw new AppError(400, 'invalid_proportions', `The start cover was refused: ${err.message}.`);
    throw err;
  }
  const seed = body.seed ?? randomBytes(6).toString('hex');
  const states = assignByProportions(body.proportions, studyArea.patchCount, seed, body.method);
  const [cover] = await StartCover.upsert({
    studyAreaId: studyArea.id,
    method: body.method,
    proportions: body.proportions,
    seed,
    states: bytesOf(states),
    unmatchedCount: 0,
    mapping: null,
    sourceName: null,
    sourceSha256: null,
  });
  return summarise(cover, await patchAreas(studyArea.id), names.length);
}
