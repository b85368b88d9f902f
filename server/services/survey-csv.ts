// Plot resurvey tables (CSV, one row per plot visit): inspection for the mapping steps, and the
// observations in the study area's cover states.
import { parseCsv, parseObservationsCsv, type Observation } from '../../shared/markov';
import type { CoverState, SurveyInspection } from '../../shared/schemas';
import { AppError } from '../http/errors';
import { requireAllMapped, type LabelMap } from './state-mapping';

const MAX_VALUES_LISTED = 100;
const SAMPLE_ROWS = 5;

/** Header names that usually hold each column (any case). */
const COLUMN_NAMES = {
  plot: /^(plot|plot[ _-]?id|site|quadrat|transect|point)$/i,
  time: /^(time|year|yr|visit|survey[ _-]?year|date)$/i,
  state: /^(state|cover|cover[ _-]?class|class|cover[ _-]?state|vegetation|veg[ _-]?type|community)$/i,
};

export function inspectSurveyCsv(fileName: string, text: string, states: readonly CoverState[]): SurveyInspection {
  const [header, ...body] = parseCsv(text);
  if (!header) throw new AppError(400, 'empty_file', 'The survey file is empty: expected a header row naming the plot, time and state columns, then one row per visit.');
  const columns = header.cells.map((name, c) => {
    const tally = new Map<string, number>();
    for (const record of body) {
      const value = record.cells[c] ?? '';
      tally.set(value, (tally.get(value) ?? 0) + 1);
    }
    const values = [...tally].map(([value, count]) => ({ value, count })).sort((a, b) => b.count - a.count || a.value.localeCompare(b.value));
    return { name, distinctCount: values.length, values: values.slice(0, MAX_VALUES_LISTED) };
  });
  const guess = (pattern: RegExp): string | null => header.cells.find((name) => pattern.test(name)) ?? null;
  const guessedColumns = { plot: guess(COLUMN_NAMES.plot), time: guess(COLUMN_NAMES.time), state: guess(COLUMN_NAMES.state) };
  const stateColumn = columns.find((c) => c.name === guessedColumns.state);
  const codeFor = (label: string): string | null =>
    states.find((s) => [s.code, s.name].some((n) => n.toLowerCase() === label.trim().toLowerCase()))?.code ?? null;
  return {
    fileName,
    columns,
    rowCount: body.length,
    sampleRows: body.slice(0, SAMPLE_ROWS).map((r) => r.cells),
    guessedColumns,
    suggestedMapping: Object.fromEntries((stateColumn?.values ?? []).map((v) => [v.value, codeFor(v.value)])),
  };
}

export type PlotObservations = { observations: Observation[]; plots: number; rowsLeftOut: number; total: number };

/** Reads the table with the chosen columns and maps each label to its state's name; every label must be mapped. */
export function readPlotObservations(text: string, columns: { plot: string; time: string; state: string }, labels: LabelMap, states: readonly CoverState[]): PlotObservations {
  const raw = parseObservationsCsv(text, columns);
  const firstSeen = new Map<string, string>();
  for (const o of raw) if (!firstSeen.has(o.state)) firstSeen.set(o.state, `line ${o.line}`);
  requireAllMapped(firstSeen, labels, `The file's state`);
  const observations = raw.flatMap((o) => {
    const index = labels.get(o.state);
    return index === null || index === undefined ? [] : [{ ...o, state: states[index].name }];
  });
  return { observations, plots: new Set(observations.map((o) => o.plot)).size, rowsLeftOut: raw.length - observations.length, total: raw.length };
}
