import { MarkovInputError } from '@/shared/markov/errors';
import { formatMatrixCsv, parseMatrixCsv, type Orientation } from '@/shared/markov/matrixCsv';

import { namesState, type StateKey } from './pasteBlock';

/**
 * Reads a matrix CSV in the command-line format (header `from,<state…>`, strictly checked by the
 * engine) and lines its states up with the study area's, matched by code or name. Returns the
 * entries as text in the stored orientation (row = from). Throws MarkovInputError with the reason.
 */
export function importMatrixCsv(text: string, states: readonly StateKey[], orientation: Orientation): string[][] {
  const parsed = parseMatrixCsv(text, { orientation });
  const known = states.map((state) => state.code).join(', ');
  parsed.states.forEach((label) => {
    if (!states.some((state) => namesState(label, state))) {
      throw new MarkovInputError(`the file's state '${label}' is not a cover state here; use the codes ${known} or the state names`);
    }
  });
  const fileIndex = states.map((state) => {
    const index = parsed.states.findIndex((label) => namesState(label, state));
    if (index < 0) throw new MarkovInputError(`the file has no state '${state.code}' (${state.name}); it needs all of ${known}`);
    return index;
  });
  return fileIndex.map((from) => fileIndex.map((to) => String(parsed.rows[from][to])));
}

/** Writes the matrix in the command-line format, row = from, states by code (full precision). */
export function exportMatrixCsv(states: readonly StateKey[], rows: readonly (readonly number[])[]): string {
  return formatMatrixCsv({ states: states.map((state) => state.code), rows: rows.map((row) => [...row]) });
}
