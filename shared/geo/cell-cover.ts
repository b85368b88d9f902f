// Fraction of every grid cell covered by a polygon, exactly, in one pass over the edges.
//
// Green's theorem: area(P ∩ C) = −∮ (y − y_top) dx over the boundary of P ∩ C. That boundary is
// the part of P's rings inside the cell C plus the part of C's outline inside P; on C's outline
// only the bottom side counts (the top has y = y_top, the sides dx = 0), giving
//   area(P ∩ C) = h · |bottom side of C inside P| − Σ over ring pieces in C of ∫ (y − y_top) dx.
// The first term is a scanline fill: crossings of the rings with each row's bottom line give the
// spans inside P (even–odd rule), so interior cells come out whole with no clipping at all. The
// second is non-zero only in cells the rings pass through, found by walking each edge through
// the grid (Amanatides & Woo 1987, "A fast voxel traversal algorithm", Eurographics). Holes and
// several parts need nothing special: rings are oriented (exterior counter-clockwise, holes
// clockwise), so their pieces add and subtract by themselves.
//
// Coordinates are in cell units relative to the grid origin, so a cell is [c, c+1] × [r, r+1].
// A point on a grid line belongs to the row below and the column to its left (half-open rule).
import { ceilInt, floorInt } from './int-round';

export type CellCover = {
  /** Cell indices row * cols + col, ascending. */
  cells: Int32Array;
  /** Covered fraction of each cell, in (0, 1]. */
  fractions: Float64Array;
};

export type CoverOptions = { rows: number; cols: number; minFraction: number; maxPatches: number };

/** Covered fractions below this count as touching only (a shared edge or corner), not overlap. */
const TOUCH_ONLY = 1e-9;

/** Crossings of each row's bottom line v = k with the rings, sorted per line (CSR layout). */
function bottomLineCrossings(rings: readonly Float64Array[], rows: number): { starts: Int32Array; xs: Float64Array } {
  const starts = new Int32Array(rows + 1);
  const each = (fn: (k: number, u: number) => void): void => {
    for (const ring of rings) {
      for (let i = 0; i + 3 < ring.length; i += 2) {
        const ua = ring[i], va = ring[i + 1], ub = ring[i + 2], vb = ring[i + 3];
        if (va === vb) continue;
        // The edge crosses v = k when exactly one end is at or below it: k in [min v, max v).
        const lo = ceilInt(va < vb ? va : vb);
        const hi = ceilInt(va < vb ? vb : va) - 1;
        const k0 = lo > 0 ? lo : 0;
        const k1 = hi < rows - 1 ? hi : rows - 1;
        for (let k = k0; k <= k1; k++) fn(k, ua + ((k - va) * (ub - ua)) / (vb - va));
      }
    }
  };
  each((k) => starts[k + 1]++);
  for (let k = 0; k < rows; k++) starts[k + 1] += starts[k];
  const xs = new Float64Array(starts[rows]);
  const fill = starts.slice(0, rows);
  each((k, u) => (xs[fill[k]++] = u));
  for (let k = 0; k < rows; k++) xs.subarray(starts[k], starts[k + 1]).sort();
  return { starts, xs };
}

/** −∫ (v − v_top) du of every ring piece, summed per cell the rings pass through. */
function edgeTerms(rings: readonly Float64Array[], rows: number, cols: number): Map<number, number> {
  const terms = new Map<number, number>();
  for (const ring of rings) {
    for (let i = 0; i + 3 < ring.length; i += 2) {
      // Plain reads, not array destructuring: hot loops must not depend on the array iterator.
      const ua = ring[i], va = ring[i + 1], ub = ring[i + 2], vb = ring[i + 3];
      const du = ub - ua;
      const dv = vb - va;
      // Parameters t in (0, 1) where the edge meets a vertical (u) or horizontal (v) grid line.
      const stepU = du > 0 ? 1 : -1;
      const stepV = dv > 0 ? 1 : -1;
      let iu = du > 0 ? floorInt(ua) + 1 : ceilInt(ua) - 1;
      let iv = dv > 0 ? floorInt(va) + 1 : ceilInt(va) - 1;
      const tAtU = (): number => (du === 0 ? 2 : (iu - ua) / du);
      const tAtV = (): number => (dv === 0 ? 2 : (iv - va) / dv);
      let tu = tAtU();
      let tv = tAtV();
      let t0 = 0;
      for (;;) {
        const t1 = tu < tv ? (tu < 1 ? tu : 1) : tv < 1 ? tv : 1;
        if (t1 > t0) {
          const u0 = ua + t0 * du;
          const u1 = ua + t1 * du;
          const vMid = va + ((t0 + t1) / 2) * dv;
          const row = ceilInt(vMid) - 1;
          const col = ceilInt((u0 + u1) / 2) - 1;
          if (row >= 0 && row < rows && col >= 0 && col < cols) {
            const key = row * cols + col;
            terms.set(key, (terms.get(key) ?? 0) - (vMid - (row + 1)) * (u1 - u0));
          }
        }
        if (t1 >= 1) break;
        if (tu === t1) {
          iu += stepU;
          tu = tAtU();
        }
        if (tv === t1) {
          iv += stepV;
          tv = tAtV();
        }
        t0 = t1;
      }
    }
  }
  return terms;
}

/**
 * Covered fraction of every cell the oriented rings overlap, or null if more than `maxPatches`
 * cells would be kept. Cells under `minFraction` are dropped.
 */
export function coverCells(rings: readonly Float64Array[], options: CoverOptions): CellCover | null {
  const { rows, cols, minFraction, maxPatches } = options;
  const { starts, xs } = bottomLineCrossings(rings, rows);
  const terms = edgeTerms(rings, rows, cols);
  const touched = Float64Array.from(terms.keys()).sort();
  const cells = new Int32Array(Math.min(maxPatches, rows * cols));
  const fractions = new Float64Array(cells.length);
  let count = 0;
  let next = 0; // first entry of `touched` not yet emitted
  const keep = (key: number, raw: number): boolean => {
    const fraction = raw < 0 ? 0 : raw > 1 ? 1 : raw;
    if (fraction <= TOUCH_ONLY || fraction < minFraction) return true;
    if (count === cells.length) return false;
    cells[count] = key;
    fractions[count++] = fraction;
    return true;
  };
  // Emits a cell covered `coverage` along its bottom side, after any touched cells before it.
  const emit = (key: number, coverage: number): boolean => {
    while (next < touched.length && touched[next] < key) {
      if (!keep(touched[next], terms.get(touched[next]) ?? 0)) return false;
      next++;
    }
    const term = next < touched.length && touched[next] === key ? (terms.get(touched[next++]) ?? 0) : 0;
    return keep(key, coverage + term);
  };
  for (let row = 0; row < rows; row++) {
    const base = row * cols;
    let pendingCol = -1;
    let pendingCover = 0;
    for (let s = starts[row]; s + 1 < starts[row + 1]; s += 2) {
      const a = xs[s] > 0 ? xs[s] : 0;
      const b = xs[s + 1] < cols ? xs[s + 1] : cols;
      for (let col = floorInt(a); col < b; col++) {
        const cover = (b < col + 1 ? b : col + 1) - (a > col ? a : col);
        if (col === pendingCol) {
          pendingCover += cover;
          continue;
        }
        if (pendingCol >= 0 && !emit(base + pendingCol, pendingCover)) return null;
        pendingCol = col;
        pendingCover = cover;
      }
    }
    if (pendingCol >= 0 && !emit(base + pendingCol, pendingCover)) return null;
  }
  while (next < touched.length) {
    if (!keep(touched[next], terms.get(touched[next]) ?? 0)) return null;
    next++;
  }
  return { cells: cells.slice(0, count), fractions: fractions.slice(0, count) };
}
