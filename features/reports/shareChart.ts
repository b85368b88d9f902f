// The report's area-share chart as SVG geometry: one polyline per state of its median share over
// the steps, and a direct label at the line's end, nudged apart so that labels never overlap.

export type ChartBox = { width: number; height: number; left: number; right: number; top: number; bottom: number };

export type ShareLine = { state: number; path: string; labelY: number; endY: number };

/** Smallest vertical distance between two end labels, in SVG units. */
export const LABEL_GAP = 14;

const n = (v: number): string => v.toFixed(1);

/** x of a step and y of a share (0 at the bottom, 1 at the top) inside the box. */
export function chartScales(box: ChartBox, lastStep: number): { x: (step: number) => number; y: (share: number) => number } {
  const plotWidth = box.width - box.left - box.right;
  const plotHeight = box.height - box.top - box.bottom;
  return {
    x: (step) => box.left + (lastStep === 0 ? 0 : (step / lastStep) * plotWidth),
    y: (share) => box.top + (1 - share) * plotHeight,
  };
}

/** Spreads sorted label positions so that neighbours are at least `gap` apart, staying inside [min, max]. */
export function spreadLabels(positions: readonly number[], gap: number, min: number, max: number): number[] {
  const order = positions.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  const placed = order.map((p) => p.y);
  for (let k = 0; k < placed.length; k++) placed[k] = Math.max(placed[k], k === 0 ? min : placed[k - 1] + gap);
  // Pushed past the bottom: shift back up from the last one.
  for (let k = placed.length - 1; k >= 0; k--) placed[k] = Math.min(placed[k], k === placed.length - 1 ? max : placed[k + 1] - gap);
  const out = new Array<number>(positions.length);
  order.forEach((p, k) => (out[p.i] = placed[k]));
  return out;
}

/** `medianShare[step][state]` as one line per state with its label position. */
export function shareLines(medianShare: readonly (readonly number[])[], box: ChartBox): ShareLine[] {
  const lastStep = medianShare.length - 1;
  const { x, y } = chartScales(box, lastStep);
  const k = medianShare[0]?.length ?? 0;
  const ends = Array.from({ length: k }, (_, j) => y(medianShare[lastStep][j]));
  const labels = spreadLabels(ends, LABEL_GAP, box.top, box.height - box.bottom);
  return Array.from({ length: k }, (_, j) => ({
    state: j,
    path: medianShare.map((row, step) => `${step === 0 ? 'M' : 'L'}${n(x(step))} ${n(y(row[j]))}`).join(''),
    labelY: labels[j],
    endY: ends[j],
  }));
}
