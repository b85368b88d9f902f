// The map's patches as one SVG path per cover state: each row's consecutive cells of the same
// state merge into one rectangle subpath, so a step change rewrites K strings, not N elements.
import type { GridSpec } from '@/shared/geo/grid';
import type { Frame } from '@/features/studyAreas/drawing';

const n = (v: number): string => v.toFixed(1);

/**
 * One path `d` per state (index = state). `cells` are ascending `row * cols + col` cell indices
 * (row 0 = south), `states[i]` the state of patch i.
 */
export function statePaths(cells: Int32Array, states: Uint8Array, stateCount: number, spec: GridSpec, frame: Frame): string[] {
  const { originX, originY, cellSize, cols } = spec;
  const side = n(cellSize * frame.scale);
  const parts: string[][] = Array.from({ length: stateCount }, () => []);
  let i = 0;
  while (i < cells.length) {
    const start = cells[i];
    const state = states[i];
    let end = start;
    while (i + 1 < cells.length && cells[i + 1] === end + 1 && (end + 1) % cols !== 0 && states[i + 1] === state) {
      i += 1;
      end += 1;
    }
    const row = Math.floor(start / cols);
    const col = start - row * cols;
    const width = n((end - start + 1) * cellSize * frame.scale);
    parts[state]?.push(`M${n(frame.x(originX + col * cellSize))} ${n(frame.y(originY + (row + 1) * cellSize))}h${width}v${side}h-${width}Z`);
    i += 1;
  }
  return parts.map((list) => list.join(''));
}
