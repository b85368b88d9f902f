import { fsum } from './fsum';

/** Index of the last positive entry: cumulative sums end there at exactly 1, so later zeros are never drawn. */
function lastPositive(p: readonly number[]): number {
  for (let j = p.length - 1; j > 0; j--) if (p[j] > 0) return j;
  return 0;
}

/** Cumulative sums of a probability row, compensated, ending at exactly 1 at its last positive entry. */
export function cumulative(p: readonly number[]): number[] {
  const last = lastPositive(p);
  return p.map((_, j) => (j >= last ? 1 : fsum(p.slice(0, j + 1))));
}

/** Inverse-CDF sampler: the first j with u < F_j, F the cumulative row (binary search). */
export function inverseCdfSampler(p: readonly number[]): (u: number) => number {
  const cdf = cumulative(p);
  return (u) => {
    let lo = 0;
    let hi = cdf.length - 1;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (u < cdf[mid]) hi = mid;
      else lo = mid + 1;
    }
    return lo;
  };
}

/**
 * Walker's alias method with Vose's stable construction (Vose 1991, IEEE TSE 17:972–975): one
 * uniform u picks column ⌊uK⌋ and its fractional part chooses between the column and its alias.
 */
export function aliasSampler(p: readonly number[]): (u: number) => number {
  const k = p.length;
  const total = fsum(p);
  const prob = new Float64Array(k);
  const alias = new Uint8Array(k);
  const scaled = p.map((v) => (v * k) / total);
  const small: number[] = [];
  const large: number[] = [];
  scaled.forEach((v, j) => (v < 1 ? small : large).push(j));
  while (small.length > 0 && large.length > 0) {
    const s = small.pop() as number;
    const l = large.pop() as number;
    prob[s] = scaled[s];
    alias[s] = l;
    scaled[l] = scaled[l] + scaled[s] - 1;
    (scaled[l] < 1 ? small : large).push(l);
  }
  for (const j of [...small, ...large]) prob[j] = 1;
  return (u) => {
    const x = u * k;
    const column = Math.min(k - 1, Math.floor(x));
    return x - column < prob[column] ? column : alias[column];
  };
}

/** Bits of a raw 32-bit draw that index the lookup table (1,024 bins per row). */
export const TABLE_BITS = 10;
/** Entries ≥ FALLBACK mean "bin straddles a threshold": search thresholds from (entry − FALLBACK). */
export const FALLBACK = 0x80;

/**
 * Lookup-table sampler on raw 32-bit draws r for many rows at once. Exact: state j is drawn iff
 * T_{j−1} ≤ r < T_j with T_j = ⌈2³² F_j⌉, i.e. iff u < F_j for u = r / 2³² (inverse CDF on the
 * 2⁻³² grid). table[(row << bits) | (r >>> (32 − bits))] holds j when every r of that bin gives
 * the same j; for the ≤ K − 1 bins per row that straddle a threshold it holds FALLBACK + the first
 * candidate, and the caller compares r with the thresholds from there.
 */
export type LookupTable = {
  k: number;
  bits: number;
  table: Uint8Array;
  /** thresholds[row * k + j] = T_j of that row (exact integers up to 2³² in doubles). */
  thresholds: Float64Array;
};

export function buildLookupTable(rows: readonly (readonly number[])[], bits: number = TABLE_BITS): LookupTable {
  const k = rows[0].length;
  const bins = 1 << bits;
  const width = 2 ** (32 - bits);
  const table = new Uint8Array(rows.length * bins);
  const thresholds = new Float64Array(rows.length * k);
  rows.forEach((p, row) => {
    const t = cumulative(p).map((f) => Math.ceil(f * 4294967296));
    thresholds.set(t, row * k);
    let j = 0;
    for (let b = 0; b < bins; b++) {
      const first = b * width;
      while (first >= t[j]) j++;
      table[row * bins + b] = first + width - 1 < t[j] ? j : FALLBACK + j;
    }
  });
  return { k, bits, table, thresholds };
}

/** One draw from the lookup table (reference form; the kernel inlines the same steps). */
export function lookupDraw(lut: LookupTable, row: number, r: number): number {
  let j = lut.table[(row << lut.bits) | (r >>> (32 - lut.bits))];
  if (j >= FALLBACK) {
    j -= FALLBACK;
    while (r >= lut.thresholds[row * lut.k + j]) j++;
  }
  return j;
}
