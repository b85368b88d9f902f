// Finds where polygon edges cross or touch, like turf's kinks but in about O(n) time: segments
// are binned into a uniform grid of ~n buckets and only segments sharing a bucket are compared.
import type { LonLat, PolygonRings } from './types';

export type SegmentRef = { polygon: number; ring: number; segment: number };
export type Crossing = { at: LonLat; first: SegmentRef; second: SegmentRef };

type Segments = {
  ax: Float64Array;
  ay: Float64Array;
  bx: Float64Array;
  by: Float64Array;
  /** Bounding box of each segment. */
  loX: Float64Array;
  loY: Float64Array;
  hiX: Float64Array;
  hiY: Float64Array;
  ref: SegmentRef[];
  /** Index of the first segment of each segment's ring, and the ring's segment count. */
  ringStart: Int32Array;
  ringCount: Int32Array;
};

function flatten(parts: PolygonRings[]): Segments {
  let n = 0;
  for (const polygon of parts) for (const ring of polygon) n += ring.length - 1;
  const s: Segments = {
    ax: new Float64Array(n),
    ay: new Float64Array(n),
    bx: new Float64Array(n),
    by: new Float64Array(n),
    loX: new Float64Array(n),
    loY: new Float64Array(n),
    hiX: new Float64Array(n),
    hiY: new Float64Array(n),
    ref: [],
    ringStart: new Int32Array(n),
    ringCount: new Int32Array(n),
  };
  let k = 0;
  parts.forEach((polygon, p) =>
    polygon.forEach((ring, r) => {
      const start = k;
      for (let i = 0; i + 1 < ring.length; i++, k++) {
        [s.ax[k], s.ay[k]] = ring[i];
        [s.bx[k], s.by[k]] = ring[i + 1];
        s.loX[k] = Math.min(s.ax[k], s.bx[k]);
        s.loY[k] = Math.min(s.ay[k], s.by[k]);
        s.hiX[k] = Math.max(s.ax[k], s.bx[k]);
        s.hiY[k] = Math.max(s.ay[k], s.by[k]);
        s.ref.push({ polygon: p, ring: r, segment: i });
        s.ringStart[k] = start;
        s.ringCount[k] = ring.length - 1;
      }
    }),
  );
  return s;
}

// Orientation of c relative to the directed line a→b (twice the signed triangle area).
function orient(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): number {
  return (bx - ax) * (cy - ay) - (by - ay) * (cx - ax);
}

function onSegment(ax: number, ay: number, bx: number, by: number, cx: number, cy: number): boolean {
  return (ax <= cx ? cx <= bx : cx >= bx) && (ay <= cy ? cy <= by : cy >= by);
}

/** The point where segments i and j meet (crossing, touching or overlapping), or null. */
function meet(s: Segments, i: number, j: number): LonLat | null {
  // Plain reads, not array destructuring: the hot loop must not depend on the array iterator.
  const ax = s.ax[i], ay = s.ay[i], bx = s.bx[i], by = s.by[i];
  const cx = s.ax[j], cy = s.ay[j], dx = s.bx[j], dy = s.by[j];
  const d1 = orient(ax, ay, bx, by, cx, cy);
  const d2 = orient(ax, ay, bx, by, dx, dy);
  const d3 = orient(cx, cy, dx, dy, ax, ay);
  const d4 = orient(cx, cy, dx, dy, bx, by);
  if (((d1 > 0 && d2 < 0) || (d1 < 0 && d2 > 0)) && ((d3 > 0 && d4 < 0) || (d3 < 0 && d4 > 0))) {
    const t = d3 / (d3 - d4);
    return [ax + t * (bx - ax), ay + t * (by - ay)];
  }
  if (d1 === 0 && onSegment(ax, ay, bx, by, cx, cy)) return [cx, cy];
  if (d2 === 0 && onSegment(ax, ay, bx, by, dx, dy)) return [dx, dy];
  if (d3 === 0 && onSegment(cx, cy, dx, dy, ax, ay)) return [ax, ay];
  if (d4 === 0 && onSegment(cx, cy, dx, dy, bx, by)) return [bx, by];
  return null;
}

/** For consecutive segments (sharing a corner): a spike that doubles back along itself. */
function doublesBack(s: Segments, i: number, j: number): LonLat | null {
  const ax = s.ax[i], ay = s.ay[i], bx = s.bx[i], by = s.by[i];
  const cx = s.ax[j], cy = s.ay[j], dx = s.bx[j], dy = s.by[j];
  const collinear = orient(ax, ay, bx, by, cx, cy) === 0 && orient(ax, ay, bx, by, dx, dy) === 0;
  if (!collinear || (bx - ax) * (dx - cx) + (by - ay) * (dy - cy) >= 0) return null;
  return bx === cx && by === cy ? [bx, by] : [ax, ay];
}

function consecutive(s: Segments, i: number, j: number): boolean {
  if (s.ringStart[i] !== s.ringStart[j]) return false;
  const gap = i > j ? i - j : j - i;
  return gap === 1 || gap === s.ringCount[i] - 1;
}

/** Up to `limit` places where the rings cross or touch themselves or each other. */
export function findSelfIntersections(parts: PolygonRings[], limit: number): Crossing[] {
  const s = flatten(parts);
  const n = s.ax.length;
  const minX = s.loX.reduce((a, b) => (b < a ? b : a), Infinity);
  const minY = s.loY.reduce((a, b) => (b < a ? b : a), Infinity);
  const maxX = s.hiX.reduce((a, b) => (b > a ? b : a), -Infinity);
  const maxY = s.hiY.reduce((a, b) => (b > a ? b : a), -Infinity);
  const side = Math.max(1, Math.ceil(Math.sqrt(n)));
  const w = (maxX - minX) / side || 1;
  const h = (maxY - minY) / side || 1;
  // Coordinates here are ≥ the minimum, so truncation is floor; hot paths avoid Math calls.
  const bucketX = (x: number): number => {
    const b = ((x - minX) / w) | 0;
    return b < side ? b : side - 1;
  };
  const bucketY = (y: number): number => {
    const b = ((y - minY) / h) | 0;
    return b < side ? b : side - 1;
  };
  // Bucket lists in compressed form: a counting pass, then a filling pass.
  const starts = new Int32Array(side * side + 1);
  const visit = (k: number, fn: (bucket: number) => void): void => {
    const x1 = bucketX(s.hiX[k]);
    const y1 = bucketY(s.hiY[k]);
    for (let y = bucketY(s.loY[k]); y <= y1; y++) {
      for (let x = bucketX(s.loX[k]); x <= x1; x++) fn(y * side + x);
    }
  };
  for (let k = 0; k < n; k++) visit(k, (b) => starts[b + 1]++);
  for (let b = 0; b < side * side; b++) starts[b + 1] += starts[b];
  const fill = starts.slice(0, side * side);
  const members = new Int32Array(starts[side * side]);
  for (let k = 0; k < n; k++) visit(k, (b) => (members[fill[b]++] = k));

  const found: Crossing[] = [];
  for (let b = 0; b < side * side && found.length < limit; b++) {
    for (let p = starts[b]; p < starts[b + 1] && found.length < limit; p++) {
      for (let q = p + 1; q < starts[b + 1] && found.length < limit; q++) {
        const i = members[p];
        const j = members[q];
        const loX = s.loX[i] > s.loX[j] ? s.loX[i] : s.loX[j];
        const loY = s.loY[i] > s.loY[j] ? s.loY[i] : s.loY[j];
        if (loX > (s.hiX[i] < s.hiX[j] ? s.hiX[i] : s.hiX[j]) || loY > (s.hiY[i] < s.hiY[j] ? s.hiY[i] : s.hiY[j])) continue;
        // Compare each pair once: in the bucket holding the lower-left corner of the boxes' overlap.
        if (bucketY(loY) * side + bucketX(loX) !== b) continue;
        const at = consecutive(s, i, j) ? doublesBack(s, i, j) : meet(s, i, j);
        if (at) found.push({ at, first: s.ref[i < j ? i : j], second: s.ref[i < j ? j : i] });
      }
    }
  }
  return found;
}
