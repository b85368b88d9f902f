// Start cover: the state of every patch at step 0, by proportions (seeded) or from a cover map.
import { randomBytes } from 'node:crypto';
import { StartCover, StudyArea } from '../models';
import { AppError, forbidden } from '../http/errors';
import { assignByProportions, checkProportions, CoverInputError } from '../../shared/cover/proportions';
import type { ProportionsStartCoverBody, StartCoverSummary } from '../../shared/schemas';
import type { StudyAreaAccess } from './study-areas';

function summarise(cover: StartCover, areas: Float32Array, stateCount: number): StartCoverSummary {
  const patches = new Array<number>(stateCount).fill(0);
  const areaM2 = new Array<number>(stateCount).fill(0);
  const states = new Uint8Array(cover.states.buffer, cover.states.byteOffset, cover.states.byteLength);
  states.forEach((s, i) => {
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
  const bytes = row!.patchAreas;
  // Copy into an aligned buffer: a Buffer from the pool may start at an odd offset.
  return new Float32Array(new Uint8Array(bytes).buffer);
}

export async function startCoverSummary(access: StudyAreaAccess): Promise<StartCoverSummary | null> {
  const cover = await StartCover.findByPk(access.studyArea.id);
  if (!cover) return null;
  return summarise(cover, await patchAreas(access.studyArea.id), access.studyArea.states?.length ?? 0);
}

export async function setStartCoverByProportions(access: StudyAreaAccess, body: ProportionsStartCoverBody): Promise<StartCoverSummary> {
  if (access.role === 'viewer') throw forbidden('Only owners and editors can set the start cover.');
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
    states: Buffer.from(states.buffer, states.byteOffset, states.byteLength),
    unmatchedCount: 0,
    mapping: null,
    sourceName: null,
    sourceSha256: null,
  });
  return summarise(cover, await patchAreas(studyArea.id), names.length);
}
