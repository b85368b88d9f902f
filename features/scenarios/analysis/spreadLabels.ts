/**
 * Moves label positions apart so that no two are closer than `gap`, keeping their order and
 * staying within [top, bottom]: a pass down pushes crowded labels below, a pass up pulls back
 * any that fell off the bottom.
 */
export function spreadLabels(ys: readonly number[], gap: number, top: number, bottom: number): number[] {
  const order = ys.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  const placed = order.map((entry) => entry.y);
  for (let n = 0; n < placed.length; n++) placed[n] = Math.max(placed[n], n === 0 ? top : placed[n - 1] + gap);
  for (let n = placed.length - 1; n >= 0; n--) placed[n] = Math.min(placed[n], n === placed.length - 1 ? bottom : placed[n + 1] - gap);
  const out = new Array<number>(ys.length);
  order.forEach((entry, n) => {
    out[entry.i] = placed[n];
  });
  return out;
}
