import { coverStatesBodySchema, DEFAULT_STATE_COLOURS, MAX_STATES, type CoverState } from '@/shared/schemas';

/** A cover state being edited; `key` keeps a row's identity while rows move. */
export type StateRow = CoverState & { key: string };

export type StateField = keyof CoverState;

/** Messages per row and field, plus one for the list as a whole (too few, too many). */
export type StateErrors = { rows: Partial<Record<StateField, string>>[]; list: string | null };

let nextKey = 0;
const newKey = (): string => `state-${(nextKey += 1)}`;

export function toRows(states: ReadonlyArray<CoverState>): StateRow[] {
  return states.map((state) => ({ ...state, key: newKey() }));
}

export function toStates(rows: ReadonlyArray<StateRow>): CoverState[] {
  return rows.map(({ code, name, colour }) => ({ code, name, colour }));
}

/** A new row with the first default colour not yet in use (the palette repeats past eight states). */
export function newRow(rows: ReadonlyArray<StateRow>): StateRow {
  const used = new Set(rows.map((row) => row.colour.toUpperCase()));
  const colour = DEFAULT_STATE_COLOURS.find((c) => !used.has(c)) ?? DEFAULT_STATE_COLOURS[rows.length % DEFAULT_STATE_COLOURS.length];
  return { key: newKey(), code: '', name: '', colour };
}

export const canAddRow = (rows: ReadonlyArray<StateRow>): boolean => rows.length < MAX_STATES;

/** Two empty rows to start a new study area with. */
export function starterRows(): StateRow[] {
  const first = newRow([]);
  return [first, newRow([first])];
}

/** Moves row `index` by `by` places (−1 up, +1 down); unchanged at the ends. */
export function moveRow(rows: ReadonlyArray<StateRow>, index: number, by: -1 | 1): StateRow[] {
  const target = index + by;
  if (target < 0 || target >= rows.length) return [...rows];
  const moved = [...rows];
  [moved[index], moved[target]] = [moved[target], moved[index]];
  return moved;
}

const sentence = (message: string): string => message.charAt(0).toUpperCase() + message.slice(1);

/** Checks the rows with the server's own schema; null when they would be accepted. */
export function validateRows(rows: ReadonlyArray<StateRow>): StateErrors | null {
  const parsed = coverStatesBodySchema.safeParse({ states: toStates(rows) });
  if (parsed.success) return null;
  const errors: StateErrors = { rows: rows.map(() => ({})), list: null };
  for (const issue of parsed.error.issues) {
    const [, index, field] = issue.path;
    if (typeof index === 'number' && (field === 'code' || field === 'name' || field === 'colour')) {
      errors.rows[index][field] ??= sentence(issue.message);
    } else {
      errors.list ??= sentence(issue.message);
    }
  }
  return errors;
}
