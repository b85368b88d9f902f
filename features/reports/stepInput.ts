/** The step typed in a download field, or null when it is not a whole number from 0 to `lastStep`. */
export function parseStep(text: string, lastStep: number): number | null {
  if (!/^\d+$/.test(text.trim())) return null;
  const step = Number(text.trim());
  return step <= lastStep ? step : null;
}
