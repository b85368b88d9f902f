// Downloads that leave Patchcast for GIS: patch geometry and patch states as GeoJSON, streamed.
import { once } from 'node:events';
import type { Response } from 'express';
import { StartCover } from '../models';
import { notFound } from '../http/errors';
import { patchAttributes, patchFeatureCollection, projectBoundary, localProjection, type PatchProperties } from '../../shared/geo';
import type { StudyAreaAccess } from './study-areas';
import { loadStoredGrid } from './stored-grid';

/** A file-name-safe form of a name: "Cinder Flat allotment" → "cinder-flat-allotment". */
export function fileSlug(name: string): string {
  return name.normalize('NFKD').replace(/[^\w\s-]/g, '').trim().toLowerCase().replace(/[\s_]+/g, '-').slice(0, 60) || 'study-area';
}

/**
 * Writes text pieces to the response as a download, waiting whenever the socket's buffer is full.
 * The type defaults to application/geo+json, registered by RFC 7946 §12.
 */
export async function streamPieces(res: Response, fileName: string, pieces: Iterable<string> | AsyncIterable<string>, type = 'application/geo+json'): Promise<void> {
  res.attachment(fileName).type(type);
  for await (const piece of pieces) {
    if (!res.write(piece)) await once(res, 'drain');
  }
  res.end();
}

/** Streams every patch of the study area's grid as a Feature with `properties(i, base)`. */
export async function streamPatches(res: Response, access: StudyAreaAccess, fileName: string, properties: (i: number, base: PatchProperties) => PatchProperties): Promise<void> {
  const { grid, boundary } = await loadStoredGrid(access.studyArea.id);
  const shape = projectBoundary(boundary, localProjection(grid.spec.projection));
  await streamPieces(res, fileName, patchFeatureCollection(grid, shape, (i) => properties(i, patchAttributes(grid, i))));
}

/** Every patch's clipped outline with index, row, column and area: the geometry to join tables to. */
export function streamPatchGeometry(res: Response, access: StudyAreaAccess): Promise<void> {
  return streamPatches(res, access, `${fileSlug(access.studyArea.name)}-patches.geojson`, (_i, base) => base);
}

/** The start cover as patch states at step 0. */
export async function streamStartCover(res: Response, access: StudyAreaAccess): Promise<void> {
  const cover = await StartCover.findByPk(access.studyArea.id);
  if (!cover) throw notFound('Start cover');
  const states = new Uint8Array(cover.states);
  const defs = access.studyArea.states ?? [];
  await streamPatches(res, access, `${fileSlug(access.studyArea.name)}-start-cover-step-0.geojson`, (i, base) => ({
    ...base,
    stateCode: defs[states[i]].code,
    stateName: defs[states[i]].name,
    step: 0,
    year: 0,
  }));
}
