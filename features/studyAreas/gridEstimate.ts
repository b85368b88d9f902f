import { estimatePatchCount, GRID_LIMITS, gridSpecFor, smallestFittingCellSize, type GridSpec } from '@/shared/geo/grid';
import type { ProjectedBoundary } from '@/shared/geo/projected-boundary';

import { gridIsDrawable } from './drawing';
import { formatCount, formatMetres } from './formatArea';

/** What the live preview says about a cell size, before anything is sent. */
export type GridEstimate =
  | { kind: 'invalid'; message: string }
  | { kind: 'too-many'; fits: number | null; message: string }
  | { kind: 'ok'; patches: number; spec: GridSpec; drawable: boolean };

/** Parses the typed cell size; the limits are the grid's own (10 m to 10 km). */
export function parseCellSize(text: string): { ok: true; cellSize: number } | { ok: false; message: string } {
  const cellSize = Number(text.trim().replace(',', '.'));
  const { minCellSizeM, maxCellSizeM } = GRID_LIMITS;
  if (text.trim() === '' || !Number.isFinite(cellSize)) return { ok: false, message: 'Type the cell size in metres, e.g. 100.' };
  if (cellSize < minCellSizeM || cellSize > maxCellSizeM) {
    return { ok: false, message: `The cell size must be between ${formatMetres(minCellSizeM)} and ${formatMetres(maxCellSizeM)}.` };
  }
  return { ok: true, cellSize };
}

/** The live patch-count estimate (within about 5 %) and the grid extent, or a refusal past the cap. */
export function estimateGrid(boundary: ProjectedBoundary, cellSizeText: string, minFraction: number): GridEstimate {
  const parsed = parseCellSize(cellSizeText);
  if (!parsed.ok) return { kind: 'invalid', message: parsed.message };
  const patches = estimatePatchCount(boundary, parsed.cellSize);
  const cap = GRID_LIMITS.maxPatches;
  if (patches > cap) {
    const fits = smallestFittingCellSize(boundary, cap, minFraction);
    const advice = fits === null ? 'No cell size up to 10 km fits.' : `The smallest cell size that fits is ${formatMetres(fits)}.`;
    return {
      kind: 'too-many',
      fits,
      message: `A ${formatMetres(parsed.cellSize)} grid would give about ${formatCount(patches)} patches, more than the ${formatCount(cap)} allowed. ${advice}`,
    };
  }
  const spec = gridSpecFor(boundary, parsed.cellSize);
  return { kind: 'ok', patches, spec, drawable: gridIsDrawable(spec) };
}
