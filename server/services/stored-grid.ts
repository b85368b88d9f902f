// The stored patch grid of a study area as typed arrays (the columns hold their raw bytes).
import { StudyArea } from '../models';
import { notFound } from '../http/errors';
import type { Boundary, PatchGrid } from '../../shared/geo';

// Copies into aligned buffers: a Buffer from the pool may start at an offset typed arrays refuse.
export const float32s = (bytes: Buffer): Float32Array => new Float32Array(new Uint8Array(bytes).buffer);
export const uint8s = (bytes: Buffer): Uint8Array => new Uint8Array(bytes);
export const int32s = (bytes: Buffer): Int32Array => new Int32Array(new Uint8Array(bytes).buffer);
export const bytesOf = (array: ArrayBufferView): Buffer => Buffer.from(array.buffer, array.byteOffset, array.byteLength);

export async function loadStoredGrid(studyAreaId: number): Promise<{ grid: PatchGrid; boundary: Boundary }> {
  const row = await StudyArea.scope('withGrid').findByPk(studyAreaId);
  if (!row) throw notFound('Study area');
  return {
    grid: { spec: row.gridSpec, cells: int32s(row.patchCells), areas: float32s(row.patchAreas), totalAreaM2: row.totalAreaM2 },
    boundary: row.boundary,
  };
}
