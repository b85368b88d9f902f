import { patchStrip, stepsInState } from './patchHistory';

describe('patch history', () => {
  test('reads the patch from each loaded frame and counts steps per state', () => {
    const frames = new Map<number, Uint8Array>([
      [0, Uint8Array.from([0, 1])],
      [1, Uint8Array.from([0, 2])],
      [3, Uint8Array.from([1, 2])],
    ]);
    const strip = patchStrip(1, 3, (step) => frames.get(step));
    expect(strip).toEqual([1, 2, null, 2]);
    expect(stepsInState(strip, 3)).toEqual([0, 1, 2]);
  });
});
