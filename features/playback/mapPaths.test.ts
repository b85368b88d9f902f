import type { GridSpec } from '@/shared/geo/grid';
import { fitFrame } from '@/features/studyAreas/drawing';

import { statePaths } from './mapPaths';

const spec: GridSpec = { projection: '', originX: 0, originY: 0, cellSize: 10, rows: 2, cols: 4 };
const frame = fitFrame([0, 0, 40, 20]);
const subpaths = (d: string): number => (d.match(/M/g) ?? []).length;

describe('statePaths', () => {
  test('merges consecutive same-state cells of a row into one rectangle per run', () => {
    // Row 0: A A B B; row 1: A A A A (all eight cells are patches).
    const cells = Int32Array.from([0, 1, 2, 3, 4, 5, 6, 7]);
    const states = Uint8Array.from([0, 0, 1, 1, 0, 0, 0, 0]);
    const [a, b] = statePaths(cells, states, 2, spec, frame);
    expect(subpaths(a)).toBe(2);
    expect(subpaths(b)).toBe(1);
  });

  test('never merges across a gap, a row end, or a state change', () => {
    // Cells 3 and 4 are consecutive numbers but in different rows; cell 1 is missing.
    const cells = Int32Array.from([0, 2, 3, 4]);
    const states = Uint8Array.from([0, 0, 0, 0]);
    const [a, b] = statePaths(cells, states, 3, spec, frame);
    expect(subpaths(a)).toBe(3);
    expect(b).toBe('');
  });

  test('a run of k cells is k cells wide and one cell high, north up', () => {
    const cells = Int32Array.from([4, 5, 6]);
    const [a] = statePaths(cells, Uint8Array.from([0, 0, 0]), 1, spec, frame);
    const side = 10 * frame.scale;
    expect(a).toBe(`M${frame.x(0).toFixed(1)} ${frame.y(20).toFixed(1)}h${(3 * side).toFixed(1)}v${side.toFixed(1)}h-${(3 * side).toFixed(1)}Z`);
  });
});
