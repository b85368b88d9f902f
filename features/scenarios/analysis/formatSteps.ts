// Whole steps (a mixing time) read as whole numbers; averages (residence times) keep one decimal.
const oneDecimal = new Intl.NumberFormat('en-US', { minimumFractionDigits: 0, maximumFractionDigits: 1 });

/** A number of steps and what it means in years: "4 steps · 8 yr"; null reads as "never left". */
export function formatStepsAndYears(steps: number | null, yearsPerStep: number, separator = ' · '): string {
  if (steps === null) return 'never left';
  return `${oneDecimal.format(steps)} steps${separator}${oneDecimal.format(steps * yearsPerStep)} yr`;
}
