import { fsum } from '@/shared/markov/fsum';
import type { Orientation } from '@/shared/markov/matrixCsv';

import { checkCell, checkRow, readNumber, type CellCheck, type RowCheck } from './cellCheck';
import { importMatrixCsv } from './matrixCsvIO';
import { splitBlock, type StateKey } from './pasteBlock';

/** A message about the last action: what it did, or why it did nothing. */
export type EditorNotice = { tone: 'info' | 'danger'; text: string };

/**
 * What the matrix editor holds. `cells` is always stored row = from, column = to, as typed text
 * (so a half-typed "0." survives); `orientation` only changes how it is shown and read in.
 */
export type MatrixEditorState = {
  states: readonly StateKey[];
  cells: string[][];
  orientation: Orientation;
  /** Earlier `cells`, newest last, for undo. */
  past: string[][][];
  notice: EditorNotice | null;
};

/** A position in the grid as shown: `row` and `col` of the displayed orientation. */
export type DisplayCell = { row: number; col: number };

export type MatrixEditorAction =
  | { type: 'edit'; from: number; to: number; text: string }
  | { type: 'paste'; at: DisplayCell; text: string }
  | { type: 'importCsv'; text: string }
  | { type: 'load'; rows: readonly (readonly number[])[]; note: string }
  | { type: 'normalise' }
  | { type: 'orient'; orientation: Orientation }
  | { type: 'undo' }
  | { type: 'dismissNotice' };

/** How many earlier versions undo can go back through. */
export const UNDO_DEPTH = 50;

const textOf = (rows: readonly (readonly number[])[]): string[][] => rows.map((row) => row.map(String));

/** A new editor: the given matrix, or "every state stays" (the identity) when there is none. */
export function initialEditorState(states: readonly StateKey[], rows?: readonly (readonly number[])[] | null): MatrixEditorState {
  const identity = states.map((_, i) => states.map((__, j) => (i === j ? 1 : 0)));
  return { states, cells: textOf(rows ?? identity), orientation: 'rows', past: [], notice: null };
}

/** Stored (from, to) of a displayed cell. */
export function storedCell(orientation: Orientation, { row, col }: DisplayCell): { from: number; to: number } {
  return orientation === 'rows' ? { from: row, to: col } : { from: col, to: row };
}

function withCells(state: MatrixEditorState, cells: string[][], notice: EditorNotice | null): MatrixEditorState {
  const unchanged = cells.every((row, i) => row.every((text, j) => text === state.cells[i][j]));
  if (unchanged) return { ...state, notice };
  return { ...state, cells, past: [...state.past, state.cells].slice(-UNDO_DEPTH), notice };
}

function paste(state: MatrixEditorState, at: DisplayCell, text: string): MatrixEditorState {
  const block = splitBlock(text, state.states);
  const k = state.states.length;
  const cells = state.cells.map((row) => [...row]);
  let placed = 0;
  let outside = 0;
  block.forEach((line, r) =>
    line.forEach((value, c) => {
      const shown = { row: at.row + r, col: at.col + c };
      if (shown.row >= k || shown.col >= k) {
        outside++;
        return;
      }
      const { from, to } = storedCell(state.orientation, shown);
      cells[from][to] = value;
      placed++;
    }),
  );
  const left = outside > 0 ? `; ${outside} did not fit in the grid and ${outside === 1 ? 'was' : 'were'} left out` : '';
  return withCells(state, cells, { tone: outside > 0 ? 'danger' : 'info', text: `Pasted ${placed} ${placed === 1 ? 'entry' : 'entries'}${left}.` });
}

/**
 * Divides each row by its sum. Rows may hold any non-negative weights (counts, percentages);
 * a row with a non-number, a negative entry or a zero sum is left as it is and named.
 */
function normalise(state: MatrixEditorState): MatrixEditorState {
  const skipped: string[] = [];
  const cells = state.cells.map((row, i) => {
    const values = row.map(readNumber);
    const numbers = values.filter((v): v is number => v !== null && v >= 0);
    const sum = fsum(numbers);
    if (numbers.length < row.length || sum === 0) {
      skipped.push(state.states[i].code);
      return row;
    }
    return numbers.map((v) => String(v / sum));
  });
  const text =
    skipped.length === 0
      ? 'Each row now sums to 1.'
      : `Rows ${skipped.join(', ')} were left as they are: they need numbers ≥ 0 with a sum above 0.`;
  return withCells(state, cells, { tone: skipped.length === 0 ? 'info' : 'danger', text });
}

function importCsv(state: MatrixEditorState, text: string): MatrixEditorState {
  try {
    const cells = importMatrixCsv(text, state.states, state.orientation);
    const read = state.orientation === 'rows' ? 'one line per from-state' : 'one line per to-state (transposed)';
    return withCells(state, cells, { tone: 'info', text: `Imported the matrix file, read as ${read}.` });
  } catch (error) {
    const reason = error instanceof Error ? error.message : String(error);
    return { ...state, notice: { tone: 'danger', text: `The file was not imported: ${reason}.` } };
  }
}

export function matrixEditorReducer(state: MatrixEditorState, action: MatrixEditorAction): MatrixEditorState {
  switch (action.type) {
    case 'edit': {
      const cells = state.cells.map((row, i) => (i === action.from ? row.map((text, j) => (j === action.to ? action.text : text)) : row));
      return withCells(state, cells, null);
    }
    case 'paste':
      return paste(state, action.at, action.text);
    case 'importCsv':
      return importCsv(state, action.text);
    case 'load':
      return withCells(state, textOf(action.rows), { tone: 'info', text: action.note });
    case 'normalise':
      return normalise(state);
    case 'orient':
      return { ...state, orientation: action.orientation, notice: null };
    case 'undo': {
      const previous = state.past[state.past.length - 1];
      if (!previous) return state;
      return { ...state, cells: previous, past: state.past.slice(0, -1), notice: { tone: 'info', text: 'Undid the last change.' } };
    }
    case 'dismissNotice':
      return { ...state, notice: null };
  }
}

/** Everything the grid shows about the entries, and the matrix when it is valid. */
export type MatrixReading = {
  cells: CellCheck[][];
  rows: RowCheck[];
  /** The row-stochastic matrix, or null while any entry or row is wrong. */
  matrix: number[][] | null;
  /** One line per wrong row, naming it, for "Save" and the analysis panel. */
  problems: string[];
};

export function readMatrix(state: MatrixEditorState): MatrixReading {
  const cells = state.cells.map((row) => row.map(checkCell));
  const rows = cells.map(checkRow);
  const problems = rows.flatMap((row, i) => (row.issue ? [`From ${state.states[i].name} (${state.states[i].code}): ${row.issue.toLowerCase()}`] : []));
  const matrix = problems.length === 0 ? cells.map((row) => row.map((cell) => cell.value ?? 0)) : null;
  return { cells, rows, matrix, problems };
}

/** The entry shown at a displayed position. */
export function shownText(state: MatrixEditorState, at: DisplayCell): string {
  const { from, to } = storedCell(state.orientation, at);
  return state.cells[from][to];
}
