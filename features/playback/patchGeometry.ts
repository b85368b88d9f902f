// From a point on the map to a patch, and a patch's place on the ground.
import type { GridSpec } from '@/shared/geo/grid';
import type { LocalProjection } from '@/shared/geo/laea';
import type { Frame } from '@/features/studyAreas/drawing';

/** Index of the patch whose cell is `cell`, or null (binary search; `cells` ascending). */
export function patchOfCell(cells: Int32Array, cell: number): number | null {
  let lo = 0;
  let hi = cells.length - 1;
  while (lo <= hi) {
    const mid = (lo + hi) >> 1;
    if (cells[mid] === cell) return mid;
    if (cells[mid] < cell) lo = mid + 1;
    else hi = mid - 1;
  }
  return null;
}

/** The patch under drawing point (sx, sy), or null outside every patch. */
export function patchAt(sx: number, sy: number, cells: Int32Array, spec: GridSpec, frame: Frame): number | null {
  const mx = (sx - frame.x(0)) / frame.scale;
  const my = (frame.y(0) - sy) / frame.scale;
  const col = Math.floor((mx - spec.originX) / spec.cellSize);
  const row = Math.floor((my - spec.originY) / spec.cellSize);
  if (col < 0 || col >= spec.cols || row < 0 || row >= spec.rows) return null;
  return patchOfCell(cells, row * spec.cols + col);
}

export type PatchPlace = { row: number; col: number; x: number; y: number; lon: number; lat: number };

/** Row, column and the centre of the patch's grid cell, in the grid's metres and in lon/lat. */
export function patchPlace(cell: number, spec: GridSpec, projection: LocalProjection): PatchPlace {
  const row = Math.floor(cell / spec.cols);
  const col = cell - row * spec.cols;
  const x = spec.originX + (col + 0.5) * spec.cellSize;
  const y = spec.originY + (row + 0.5) * spec.cellSize;
  const [lon, lat] = projection.inverse([x, y]);
  return { row, col, x, y, lon, lat };
}

/** Little-endian Float32 values from base64 (the patch areas of the patch-grid answer). */
export function decodeFloat32(base64: string): Float32Array {
  const text = atob(base64);
  const view = new DataView(new ArrayBuffer(text.length));
  for (let i = 0; i < text.length; i++) view.setUint8(i, text.charCodeAt(i));
  const values = new Float32Array(text.length / 4);
  for (let i = 0; i < values.length; i++) values[i] = view.getFloat32(i * 4, true);
  return values;
}
