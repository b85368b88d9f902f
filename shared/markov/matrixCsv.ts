import { csvField, parseCsv, parseNumberCell } from './csvTable';
import { MarkovInputError } from './errors';
import { createMatrix, transpose, type MatrixLocator, type TransitionMatrix } from './matrix';

/** 'rows': one line per from-state (the stored form). 'columns': one line per to-state (transposed). */
export type Orientation = 'rows' | 'columns';

export type MatrixCsvOptions = { orientation?: Orientation; normalise?: boolean };

/**
 * Reads a transition matrix CSV: header `from,<state 1>,…,<state K>`, then one line per state
 * starting with its name (lines may come in any order; each state exactly once). With
 * orientation 'columns' the file is the transpose: line i holds the probabilities into state i.
 */
export function parseMatrixCsv(text: string, options: MatrixCsvOptions = {}): TransitionMatrix {
  const orientation = options.orientation ?? 'rows';
  const records = parseCsv(text);
  if (records.length === 0) throw new MarkovInputError('the matrix file is empty; expected a header `from,<states…>`');
  const [header, ...body] = records;
  const states = header.cells.slice(1);
  const seen = new Map<string, number>();
  states.forEach((state, j) => {
    if (state === '') throw new MarkovInputError(`line ${header.line}, column ${j + 2}: empty state name in the header`);
    if (seen.has(state)) throw new MarkovInputError(`line ${header.line}: state '${state}' is repeated in the header`);
    seen.set(state, j);
  });
  const lineOf: number[] = new Array<number>(states.length);
  const fileRows: number[][] = new Array<number[]>(states.length);
  for (const record of body) {
    const name = record.cells[0];
    const index = seen.get(name);
    if (index === undefined) {
      throw new MarkovInputError(
        `line ${record.line}: unknown state '${name}'; the header lists ${states.map((s) => `'${s}'`).join(', ')}`,
      );
    }
    if (fileRows[index] !== undefined) {
      throw new MarkovInputError(`line ${record.line}: state '${name}' already has a line (line ${lineOf[index]})`);
    }
    if (record.cells.length !== states.length + 1) {
      throw new MarkovInputError(
        `line ${record.line} (state '${name}'): ${record.cells.length - 1} values; the header has ${states.length} states`,
      );
    }
    lineOf[index] = record.line;
    fileRows[index] = record.cells
      .slice(1)
      .map((raw, j) => parseNumberCell(raw, `line ${record.line}, column '${states[j]}' (state '${name}')`));
  }
  states.forEach((state, i) => {
    if (fileRows[i] === undefined) throw new MarkovInputError(`no line for state '${state}'; add one line per state`);
  });
  const locator: MatrixLocator =
    orientation === 'rows'
      ? {
          row: (from) => `line ${lineOf[from]} (from '${states[from]}')`,
          cell: (from, to) => `line ${lineOf[from]}, column '${states[to]}' (from '${states[from]}')`,
        }
      : {
          row: (from) => `column '${states[from]}' (probabilities out of '${states[from]}')`,
          cell: (from, to) => `line ${lineOf[to]}, column '${states[from]}' (from '${states[from]}' to '${states[to]}')`,
        };
  const rows = orientation === 'rows' ? fileRows : transpose(fileRows);
  return createMatrix(states, rows, { normalise: options.normalise, locator });
}

/** Writes the row form read by parseMatrixCsv; numbers keep full precision (round-trip exact). */
export function formatMatrixCsv(matrix: TransitionMatrix): string {
  const lines = [['from', ...matrix.states].map(csvField).join(',')];
  matrix.rows.forEach((row, i) => lines.push([csvField(matrix.states[i]), ...row.map(String)].join(',')));
  return `${lines.join('\n')}\n`;
}
