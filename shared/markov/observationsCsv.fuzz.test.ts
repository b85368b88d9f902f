// Fuzzing the survey table reader: any text and column choice gives observations or a
// MarkovInputError; valid random visit rows, columns in any order, are read back as written.
import fc from 'fast-check';
import { csvNoise, fuzz, readOrRefuse } from '../../tests/fixtures/fuzz';
import { awkwardName } from '../../tests/fixtures/markov/arbitraries';
import { csvField } from './csvTable';
import { MarkovInputError } from './errors';
import { parseObservationsCsv, type ObservationColumns } from './observationsCsv';

const columns: fc.Arbitrary<ObservationColumns> = fc.record({ plot: fc.constantFrom('plot', 'A', ''), time: fc.constantFrom('time', 'B', '1'), state: fc.constantFrom('state', 'A', 'from') });
const headerish = fc.array(fc.constantFrom('plot', 'time', 'state', 'A', 'B', '1', '2001', 'x,y', '"q"', ''), { maxLength: 5 }).map((cells) => cells.join(','));

/** A time as a survey writes it: a year, a fraction of a year, or any finite double. */
const time = fc.oneof(fc.integer({ min: 1900, max: 2100 }), fc.double({ noNaN: true, noDefaultInfinity: true }).map((t) => (Object.is(t, -0) ? 0 : t)));
type Visit = { plot: string; time: number; state: string; note: string };
const visit: fc.Arbitrary<Visit> = fc.record({ plot: awkwardName, time, state: awkwardName, note: fc.oneof(awkwardName, fc.constant('')) });
const cellOf: Record<string, (v: Visit) => string> = { plot_id: (v) => v.plot, year: (v) => String(v.time), cover: (v) => v.state, notes: (v) => v.note };
const asRead = ({ plot, time: t, state }: { plot: string; time: number; state: string }) => ({ plot, time: t, state });

describe('parseObservationsCsv fuzzing', () => {
  test.each([
    ['any Unicode text', fc.string({ unit: 'grapheme', maxLength: 200 })],
    ['text of CSV punctuation', csvNoise],
    ['a header-like first line and noise', fc.tuple(headerish, csvNoise).map(([h, rest]) => `${h}\n${rest}`)],
  ])('%s gives observations or a MarkovInputError', (_what, text) => {
    fc.assert(
      fc.property(text, columns, (t, c) => {
        const outcome = readOrRefuse(MarkovInputError, () => parseObservationsCsv(t, c));
        if ('refused' in outcome) {
          expect(outcome.refused.message).not.toBe('');
          return;
        }
        for (const o of outcome.value) {
          expect(o.plot).not.toBe('');
          expect(o.state).not.toBe('');
          expect(Number.isNaN(o.time)).toBe(false);
          expect(o.line).toBeGreaterThanOrEqual(2);
        }
      }),
      fuzz(400),
    );
  });

  test('valid visit rows, with the columns in any order and an extra one, are read back as written', () => {
    const order = fc.shuffledSubarray(Object.keys(cellOf), { minLength: 4, maxLength: 4 });
    fc.assert(
      fc.property(fc.array(visit, { maxLength: 20 }), order, (visits, header) => {
        const lines = [header.join(','), ...visits.map((v) => header.map((h) => csvField(cellOf[h](v))).join(','))];
        const read = parseObservationsCsv(lines.join('\n'), { plot: 'plot_id', time: 'year', state: 'cover' });
        expect(read.map(asRead)).toEqual(visits.map(asRead));
      }),
      fuzz(300),
    );
  });
});
