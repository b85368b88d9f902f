import { parseCsv, parseNumberCell } from './csvTable';
import { MarkovInputError } from './errors';
import type { Observation } from './estimate';

export type ObservationColumns = { plot: string; time: string; state: string };

export const DEFAULT_OBSERVATION_COLUMNS: ObservationColumns = { plot: 'plot', time: 'time', state: 'state' };

/** Reads a survey's long table (a header naming the plot, time and state columns; any order, extra columns ignored). */
export function parseObservationsCsv(text: string, columns: ObservationColumns = DEFAULT_OBSERVATION_COLUMNS): Observation[] {
  const [header, ...body] = parseCsv(text);
  if (!header) throw new MarkovInputError('the observations file is empty; expected a header with plot, time and state columns');
  const find = (name: string): number => {
    const index = header.cells.indexOf(name);
    if (index < 0) {
      throw new MarkovInputError(`line ${header.line}: no column '${name}' in the header (${header.cells.join(', ')}); name the column or pick another`);
    }
    return index;
  };
  const [plot, time, state] = [find(columns.plot), find(columns.time), find(columns.state)];
  return body.map((record) => {
    const cell = (index: number, name: string): string => {
      const value = record.cells[index] ?? '';
      if (value === '') throw new MarkovInputError(`line ${record.line}, column '${name}': empty; every row needs a ${name}`);
      return value;
    };
    return {
      plot: cell(plot, columns.plot),
      time: parseNumberCell(cell(time, columns.time), `line ${record.line}, column '${columns.time}'`),
      state: cell(state, columns.state),
      line: record.line,
    };
  });
}
