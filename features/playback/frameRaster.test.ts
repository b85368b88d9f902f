import { rasterizeFrame, rgbaWord } from './frameRaster';

describe('rasterizeFrame', () => {
  test('colours each patch’s pixel, north up, and leaves cells outside the boundary clear', () => {
    const words = [rgbaWord('#E69F00'), rgbaWord('#56B4E9')];
    const pixels = new Uint32Array(2 * 3).fill(7);
    // 2 rows × 3 cols; patches at cells 0 (row 0, col 0) and 4 (row 1, col 1).
    rasterizeFrame(pixels, Int32Array.from([0, 4]), Uint8Array.from([1, 0]), words, { rows: 2, cols: 3 });
    expect(Array.from(pixels)).toEqual([0, words[0], 0, words[1], 0, 0]);
  });

  test('the word’s bytes are R, G, B, A in memory order', () => {
    const bytes = new Uint8Array(Uint32Array.of(rgbaWord('#E69F00')).buffer);
    expect(Array.from(bytes)).toEqual([0xe6, 0x9f, 0x00, 0xff]);
  });
});
