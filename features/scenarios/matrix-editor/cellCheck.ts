import { parseNumberCell } from '@/shared/markov/csvTable';
import { fsum } from '@/shared/markov/fsum';
import { ROW_SUM_TOLERANCE } from '@/shared/markov/matrix';

/** One typed entry, read: its number when it is one, and what is wrong with it otherwise. */
export type CellCheck = { value: number | null; issue: string | null };

/** One from-state's row: the compensated sum of its numeric entries and what is wrong with the row. */
export type RowCheck = { sum: number; complete: boolean; issue: string | null };

/** Reads a typed entry as a number with the engine's CSV rule (decimal point, optional exponent). */
export function readNumber(text: string): number | null {
  try {
    return parseNumberCell(text.trim(), 'entry');
  } catch {
    return null;
  }
}

/** The reason an entry cannot be a transition probability, or none. */
export function checkCell(text: string): CellCheck {
  const raw = text.trim();
  if (raw === '') return { value: null, issue: 'Empty: type 0 for no transition' };
  const value = readNumber(raw);
  if (value === null) {
    const hint = /^\d*,\d+$/.test(raw) ? ': use a decimal point, not a comma' : '';
    return { value: null, issue: `Not a number${hint}` };
  }
  if (value < 0) return { value, issue: 'Negative: probabilities are 0 to 1' };
  if (value > 1) return { value, issue: 'More than 1: probabilities are 0 to 1' };
  return { value, issue: null };
}

/** A sum shown to the person: up to 12 significant digits, so 0.9999999999 is not shown as 1. */
export function formatSum(sum: number): string {
  return String(Number(sum.toPrecision(12)));
}

/** Checks one row: every entry must be a probability and the row must sum to 1 within 1e-9. */
export function checkRow(cells: readonly CellCheck[]): RowCheck {
  const values = cells.map((cell) => cell.value ?? 0);
  const sum = fsum(values);
  const bad = cells.filter((cell) => cell.issue !== null).length;
  if (bad > 0) {
    return { sum, complete: false, issue: `${bad} ${bad === 1 ? 'entry needs' : 'entries need'} fixing` };
  }
  const off = Math.abs(sum - 1);
  if (off > ROW_SUM_TOLERANCE) {
    return { sum, complete: true, issue: `Sums to ${formatSum(sum)}, not 1 (off by ${off.toExponential(1)})` };
  }
  return { sum, complete: true, issue: null };
}
