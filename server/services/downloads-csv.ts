// CSV downloads: one RFC 4180 line per row (fields quoted by csvField only when they must be),
// streamed through the same writer as the GeoJSON downloads.
import type { Response } from 'express';
import { csvField } from '../../shared/markov';
import type { AreaUnit } from '../../shared/schemas';
import { streamPieces } from './exports';

export type CsvCell = string | number | null;

/** One CSV line; null becomes an empty field, numbers keep full precision. */
export function csvRow(cells: readonly CsvCell[]): string {
  return `${cells.map((c) => (c === null ? '' : typeof c === 'number' ? String(c) : csvField(c))).join(',')}\n`;
}

/** Sends lines (or batches of lines) as a CSV attachment named `fileName`. */
export function streamCsv(res: Response, fileName: string, lines: Iterable<string> | AsyncIterable<string>): Promise<void> {
  return streamPieces(res, fileName, lines, 'text/csv; charset=utf-8');
}

/** Square metres per unit: 1 ha = 10,000 m²; 1 international acre = 4,046.8564224 m². */
export const M2_PER_UNIT: Record<AreaUnit, number> = { ha: 10_000, acres: 4_046.8564224 };
