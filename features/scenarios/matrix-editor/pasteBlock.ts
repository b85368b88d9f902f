import { readNumber } from './cellCheck';

/** How a state can be named in a pasted block or a CSV header: by its code or its name. */
export type StateKey = { code: string; name: string };

/** Whether a label names this state (code or name, case and outer spaces ignored). */
export function namesState(label: string, state: StateKey): boolean {
  const wanted = label.trim().toLowerCase();
  return wanted === state.code.toLowerCase() || wanted === state.name.toLowerCase();
}

const isLabel = (cell: string, states: readonly StateKey[]): boolean =>
  cell.trim() === '' || cell.trim().toLowerCase() === 'from' || states.some((state) => namesState(cell, state));

/**
 * Splits text copied from a spreadsheet into cells: lines, then tabs (or commas when there is no
 * tab). A trailing line break is dropped. A first row or column of state labels (codes or names,
 * as copied together with the headers) is dropped too, so a labelled block pastes as its numbers.
 */
export function splitBlock(text: string, states: readonly StateKey[]): string[][] {
  const lines = text.replace(/\r\n?/g, '\n').replace(/\n+$/, '').split('\n');
  const separator = text.includes('\t') ? '\t' : ',';
  let block = lines.map((line) => line.split(separator).map((cell) => cell.trim()));
  const labelsIn = (cells: string[]): boolean =>
    cells.length > 1 && cells.some((cell) => readNumber(cell) === null) && cells.every((cell) => isLabel(cell, states));
  if (block.length > 1 && labelsIn(block[0])) block = block.slice(1);
  if (block.length > 0 && labelsIn(block.map((row) => row[0]))) block = block.map((row) => row.slice(1));
  return block.filter((row) => row.length > 0);
}

/**
 * Whether text typed or pasted into one entry is really a block of several: it holds a tab or a
 * line break, or commas other than one decimal comma ("0,3" stays one entry and is marked).
 */
export function isBlock(text: string): boolean {
  const body = text.replace(/[\r\n]+$/, '').trim();
  if (/[\t\n\r]/.test(body)) return true;
  return body.includes(',') && !/^\d*,\d+$/.test(body);
}
