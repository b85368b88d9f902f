import { MarkovInputError } from './errors';

/** One parsed CSV record with the 1-based line it starts on. */
export type CsvRecord = { line: number; cells: string[] };

/**
 * Parses RFC 4180 CSV: comma-separated, double-quoted fields may hold commas, quotes ("") and
 * line breaks; CRLF or LF; a leading byte-order mark is dropped; unquoted text is trimmed (a quoted
 * field keeps its spaces, as csvField writes them); blank lines are skipped.
 */
export function parseCsv(text: string): CsvRecord[] {
  const source = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  const records: CsvRecord[] = [];
  let cells: string[] = [];
  let cell = '';
  let quoted = false;
  /** Length of the cell's quoted part once its quote has closed; -1 for an unquoted cell. */
  let quotedLength = -1;
  let line = 1;
  let recordLine = 1;
  const endCell = (): void => {
    cells.push(quotedLength < 0 ? cell.trim() : cell.slice(0, quotedLength) + cell.slice(quotedLength).trimEnd());
    cell = '';
    quotedLength = -1;
  };
  const endRecord = (): void => {
    endCell();
    if (cells.length > 1 || cells[0] !== '') records.push({ line: recordLine, cells });
    cells = [];
  };
  for (let i = 0; i < source.length; i++) {
    const ch = source[i];
    if (quoted) {
      if (ch === '"' && source[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (ch === '"') {
        quoted = false;
        quotedLength = cell.length;
      } else {
        if (ch === '\n') line++;
        cell += ch;
      }
    } else if (ch === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (ch === ',') {
      endCell();
    } else if (ch === '\n' || ch === '\r') {
      if (ch === '\r' && source[i + 1] === '\n') i++;
      endRecord();
      line++;
      recordLine = line;
    } else {
      cell += ch;
    }
  }
  if (quoted) throw new MarkovInputError(`line ${recordLine}: a quoted field is never closed; add the closing "`);
  if (cell !== '' || cells.length > 0) endRecord();
  return records;
}

/** A CSV field, quoted only when it must be. */
export function csvField(value: string): string {
  return /[",\r\n]/.test(value) || value !== value.trim() ? `"${value.replace(/"/g, '""')}"` : value;
}

/** Parses a cell as a number (decimal point, optional exponent); a named error otherwise. */
export function parseNumberCell(raw: string, where: string): number {
  if (!/^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/.test(raw)) {
    const hint = /^\d+,\d+$/.test(raw) ? ' (use a decimal point, not a comma)' : '';
    throw new MarkovInputError(`${where}: '${raw}' is not a number${hint}`);
  }
  return Number(raw);
}
