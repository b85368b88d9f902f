/** "Step 12 · Year 24" (years from the start, to a tenth when a step is not a whole number of years). */
export function stepLabel(step: number, yearsPerStep: number): string {
  const years = step * yearsPerStep;
  const shown = Number.isInteger(years) ? String(years) : years.toFixed(1);
  return `Step ${step} · Year ${shown}`;
}
