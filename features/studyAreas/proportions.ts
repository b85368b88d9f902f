/** Percent fields shown for a start cover: its saved proportions, else equal shares. */
export function initialPercents(stateCount: number, proportions: ReadonlyArray<number> | null): string[] {
  const shares = proportions && proportions.length === stateCount ? proportions : new Array<number>(stateCount).fill(1 / stateCount);
  return shares.map((share) => String(Math.round(share * 1000) / 10));
}

export type PercentCheck = { sum: number; proportions: number[] | null; message: string | null };

/** How far the typed percentages are from 100 %: within 0.05 % they are scaled to sum to exactly 1. */
export function checkPercents(texts: ReadonlyArray<string>): PercentCheck {
  const values = texts.map((text) => (text.trim() === '' ? 0 : Number(text.trim().replace(',', '.'))));
  if (values.some((v) => !Number.isFinite(v) || v < 0)) return { sum: Number.NaN, proportions: null, message: 'Each share must be a number of 0 % or more.' };
  const sum = values.reduce((a, b) => a + b, 0);
  if (Math.abs(sum - 100) > 0.05) return { sum, proportions: null, message: `The shares add up to ${sum.toFixed(1)} %; they must add up to 100 %.` };
  return { sum, proportions: values.map((v) => v / sum), message: null };
}
