// Drawing a boundary and its grid in SVG: metres in the local equal-area frame mapped to a
// fixed drawing box, north up (the frame's y grows northwards, SVG's y grows downwards).
import type { GridSpec } from '@/shared/geo/grid';

/** Width of the drawing box in SVG user units; the height follows the boundary's shape. */
export const DRAWING_WIDTH = 1000;
const PADDING = 12;
/** Keep very tall or very flat boundaries readable. */
const ASPECT_LIMITS = { min: 0.35, max: 1.1 } as const;

export type Bbox = readonly [number, number, number, number];

export type Frame = { width: number; height: number; scale: number; x: (m: number) => number; y: (m: number) => number };

/** The map from metres to drawing units that fits `bbox` in the box, centred, y flipped. */
export function fitFrame(bbox: Bbox): Frame {
  const [minX, minY, maxX, maxY] = bbox;
  const spanX = Math.max(maxX - minX, 1);
  const spanY = Math.max(maxY - minY, 1);
  const aspect = Math.min(ASPECT_LIMITS.max, Math.max(ASPECT_LIMITS.min, spanY / spanX));
  const width = DRAWING_WIDTH;
  const height = Math.round(width * aspect);
  const scale = Math.min((width - 2 * PADDING) / spanX, (height - 2 * PADDING) / spanY);
  const offsetX = (width - spanX * scale) / 2;
  const offsetY = (height - spanY * scale) / 2;
  return {
    width,
    height,
    scale,
    x: (m) => offsetX + (m - minX) * scale,
    y: (m) => height - offsetY - (m - minY) * scale,
  };
}

const n = (v: number): string => v.toFixed(1);

/** One SVG path of every ring of every part (draw it with the even-odd rule so holes stay open). */
export function outlinePath(parts: ReadonlyArray<ReadonlyArray<ReadonlyArray<readonly number[]>>>, frame: Frame): string {
  const rings: string[] = [];
  for (const polygon of parts) {
    for (const ring of polygon) {
      rings.push(`M${ring.map(([x, y]) => `${n(frame.x(x))} ${n(frame.y(y))}`).join('L')}Z`);
    }
  }
  return rings.join('');
}

/** Grid lines are drawn only up to this many cells per axis; past it they would merge into a tint. */
export const MAX_DRAWN_LINES = 150;

export function gridIsDrawable(spec: Pick<GridSpec, 'rows' | 'cols'>): boolean {
  return spec.rows <= MAX_DRAWN_LINES && spec.cols <= MAX_DRAWN_LINES;
}

/** The grid's cell edges over its whole extent, as one path. */
export function gridLinesPath(spec: GridSpec, frame: Frame): string {
  const { originX, originY, cellSize, rows, cols } = spec;
  const left = n(frame.x(originX));
  const right = n(frame.x(originX + cols * cellSize));
  const bottom = n(frame.y(originY));
  const top = n(frame.y(originY + rows * cellSize));
  const lines: string[] = [];
  for (let c = 0; c <= cols; c++) {
    const x = n(frame.x(originX + c * cellSize));
    lines.push(`M${x} ${top}V${bottom}`);
  }
  for (let r = 0; r <= rows; r++) {
    const y = n(frame.y(originY + r * cellSize));
    lines.push(`M${left} ${y}H${right}`);
  }
  return lines.join('');
}

/**
 * The patches' cells as one path. With `merge`, neighbouring cells of a row become one rectangle
 * (far fewer path commands for big grids, but no edges between them to stroke).
 */
export function cellsPath(cells: Int32Array, spec: GridSpec, frame: Frame, merge: boolean): string {
  const { originX, originY, cellSize, cols } = spec;
  const side = n(cellSize * frame.scale);
  const rects: string[] = [];
  let i = 0;
  while (i < cells.length) {
    const start = cells[i];
    let end = start;
    if (merge) {
      while (i + 1 < cells.length && cells[i + 1] === end + 1 && (end + 1) % cols !== 0) {
        i += 1;
        end += 1;
      }
    }
    const row = Math.floor(start / cols);
    const col = start % cols;
    const x = n(frame.x(originX + col * cellSize));
    const y = n(frame.y(originY + (row + 1) * cellSize));
    const width = n((end - start + 1) * cellSize * frame.scale);
    rects.push(`M${x} ${y}h${width}v${side}h-${width}Z`);
    i += 1;
  }
  return rects.join('');
}

/** Little-endian bytes from base64 (the patch-grid answer). */
function bytesOf(base64: string): ArrayBuffer {
  const text = atob(base64);
  const bytes = new Uint8Array(text.length);
  for (let i = 0; i < text.length; i++) bytes[i] = text.charCodeAt(i);
  return bytes.buffer;
}

/** The patch cell indices (row * cols + col, row 0 southernmost) of a patch-grid answer. */
export function decodeCells(base64: string): Int32Array {
  const buffer = bytesOf(base64);
  const view = new DataView(buffer);
  const cells = new Int32Array(buffer.byteLength / 4);
  for (let i = 0; i < cells.length; i++) cells[i] = view.getInt32(i * 4, true);
  return cells;
}
