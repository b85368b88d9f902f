// A map of one step as one SVG path per cover state: the cells of the patches in that state.
import type { GridSpec } from '@/shared/geo/grid';
import { cellsPath, fitFrame, type Frame } from '@/features/studyAreas/drawing';

/** The drawing frame of the whole grid extent. */
export function gridFrame(spec: GridSpec): Frame {
  return fitFrame([spec.originX, spec.originY, spec.originX + spec.cols * spec.cellSize, spec.originY + spec.rows * spec.cellSize]);
}

/** The patch cells grouped by state: `states[i]` is the state index of patch i (cells[i]). */
export function cellsByState(cells: Int32Array, states: Uint8Array, stateCount: number): Int32Array[] {
  const counts = new Array<number>(stateCount).fill(0);
  for (const s of states) counts[s] += 1;
  const groups = counts.map((c) => new Int32Array(c));
  const filled = new Array<number>(stateCount).fill(0);
  states.forEach((s, i) => (groups[s][filled[s]++] = cells[i]));
  return groups;
}

/** One path per state (merged runs of cells along each row). */
export function statePaths(cells: Int32Array, states: Uint8Array, stateCount: number, spec: GridSpec, frame: Frame): string[] {
  return cellsByState(cells, states, stateCount).map((group) => cellsPath(group, spec, frame, true));
}
