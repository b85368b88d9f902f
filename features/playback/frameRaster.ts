// The image layer of the map for big grids: one pixel per grid cell, coloured by the patch's
// state, transparent outside the patches; row 0 (south) is the image's bottom line.
import type { GridSpec } from '@/shared/geo/grid';

/** `#RRGGBB` as the little-endian RGBA word of an opaque pixel. */
export function rgbaWord(hex: string): number {
  const value = Number.parseInt(hex.slice(1), 16);
  return ((0xff << 24) | ((value & 0xff) << 16) | (value & 0xff00) | ((value >> 16) & 0xff)) >>> 0;
}

/** Fills `pixels` (cols × rows RGBA words, cleared first) with the state colour of every patch. */
export function rasterizeFrame(pixels: Uint32Array, cells: Int32Array, states: Uint8Array, words: readonly number[], spec: Pick<GridSpec, 'rows' | 'cols'>): void {
  const { rows, cols } = spec;
  pixels.fill(0);
  for (let i = 0; i < cells.length; i++) {
    const row = Math.floor(cells[i] / cols);
    pixels[(rows - 1 - row) * cols + (cells[i] - row * cols)] = words[states[i]] ?? 0;
  }
}
