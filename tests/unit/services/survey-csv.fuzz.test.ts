// Fuzzing the server's survey-table reading (inspection for the mapping steps, then the mapped
// observations): any text gives an answer or a 4xx error (AppError, or the MarkovInputError the
// server maps to 400), never another exception.
import fc from 'fast-check';
import { csvNoise, fuzz, readOrRefuse } from '../../fixtures/fuzz';
import { AppError } from '../../../server/http/errors';
import { inspectSurveyCsv, readPlotObservations } from '../../../server/services/survey-csv';
import { MarkovInputError } from '../../../shared/markov';
import type { CoverState } from '../../../shared/schemas';

const states: CoverState[] = [
  { code: 'S1', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'S2', name: 'Grassland', colour: '#009E73' },
];
const text = fc.oneof(fc.string({ unit: 'grapheme', maxLength: 200 }), csvNoise, csvNoise.map((rest) => `plot,time,state\n${rest}`));

/** The reader's value, or a refusal the API answers with a 4xx. */
function answerOrClientError<T>(read: () => T): T | null {
  const outcome = readOrRefuse(Error, read);
  if ('value' in outcome) return outcome.value;
  const { refused } = outcome;
  if (refused instanceof AppError) expect(refused.status).toBe(400);
  else expect(refused).toBeInstanceOf(MarkovInputError);
  return null;
}

describe('survey table fuzzing', () => {
  test('inspection of any text lists the header columns and at most 5 sample rows, or is a 400', () => {
    fc.assert(
      fc.property(text, (t) => {
        const inspection = answerOrClientError(() => inspectSurveyCsv('plots.csv', t, states));
        if (inspection === null) return;
        expect(inspection.sampleRows.length).toBeLessThanOrEqual(Math.min(5, inspection.rowCount));
        for (const column of inspection.columns) expect(column.values.reduce((n, v) => n + v.count, 0)).toBe(inspection.rowCount);
      }),
      fuzz(400),
    );
  });

  test('mapped observations of any text are in the study area\'s states, or the text is a 400', () => {
    const labels = new Map<string, number | null>([['A', 0], ['B', 1], ['', null]]);
    fc.assert(
      fc.property(text, (t) => {
        const read = answerOrClientError(() => readPlotObservations(t, { plot: 'plot', time: 'time', state: 'state' }, labels, states));
        if (read === null) return;
        for (const o of read.observations) expect(states.map((s) => s.name)).toContain(o.state);
        expect(read.observations.length + read.rowsLeftOut).toBe(read.total);
      }),
      fuzz(400),
    );
  });
});
