// Fuzzing the matrix CSV reader: any text gives a valid matrix or a MarkovInputError, never another
// exception; a random valid matrix written and read back (either orientation) is the same matrix.
import fc from 'fast-check';
import { csvNoise, fuzz, readOrRefuse } from '../../tests/fixtures/fuzz';
import { stochasticMatrix } from '../../tests/fixtures/markov/arbitraries';
import { csvField } from './csvTable';
import { MarkovInputError } from './errors';
import { fsum } from './fsum';
import { ROW_SUM_TOLERANCE, transpose, type TransitionMatrix } from './matrix';
import { formatMatrixCsv, parseMatrixCsv, type Orientation } from './matrixCsv';

const options = fc.record({ orientation: fc.constantFrom<Orientation>('rows', 'columns'), normalise: fc.boolean() });

function expectStochastic(m: TransitionMatrix): void {
  expect(m.rows).toHaveLength(m.states.length);
  for (const row of m.rows) {
    expect(row).toHaveLength(m.states.length);
    expect(row.every((p) => p >= 0 && p <= 1)).toBe(true);
    expect(Math.abs(fsum(row) - 1)).toBeLessThanOrEqual(ROW_SUM_TOLERANCE);
  }
}

/** A file shaped like a matrix CSV (header, then lines of a name and cells) with any tokens in it. */
const matrixShapedText = fc
  .record({
    states: fc.array(fc.constantFrom('A', 'B', 'C', '', ' A', 'A,B'), { minLength: 0, maxLength: 4 }),
    lines: fc.array(fc.array(fc.constantFrom('A', 'B', 'C', 'D', '0', '1', '0.5', '0,5', '-0.1', '1e400', 'NaN', 'Infinity', '', '"0.5"', '1e-10', '.5', '+1'), { maxLength: 5 }), { maxLength: 5 }),
    newline: fc.constantFrom('\n', '\r\n', '\r'),
    bom: fc.boolean(),
  })
  .map(({ states, lines, newline, bom }) => (bom ? '\uFEFF' : '') + [['from', ...states], ...lines].map((cells) => cells.join(',')).join(newline));

describe('parseMatrixCsv fuzzing', () => {
  test.each([
    ['any Unicode text', fc.string({ unit: 'grapheme', maxLength: 200 })],
    ['text of CSV punctuation and numbers', csvNoise],
    ['text shaped like a matrix file', matrixShapedText],
  ])('%s gives a valid matrix or a MarkovInputError', (_what, text) => {
    fc.assert(
      fc.property(text, options, (t, o) => {
        const outcome = readOrRefuse(MarkovInputError, () => parseMatrixCsv(t, o));
        if ('value' in outcome) expectStochastic(outcome.value);
        else expect(outcome.refused.message).not.toBe('');
      }),
      fuzz(400),
    );
  });

  test('a random valid matrix written and read back is the same matrix, bit for bit', () => {
    fc.assert(
      fc.property(stochasticMatrix, (m) => {
        expect(parseMatrixCsv(formatMatrixCsv(m))).toEqual(m);
      }),
      fuzz(300),
    );
  });

  test('the transposed file read with orientation "columns" is the same matrix', () => {
    fc.assert(
      fc.property(stochasticMatrix, (m) => {
        const columns = transpose(m.rows);
        const text = [['to', ...m.states], ...columns.map((column, j) => [m.states[j], ...column.map(String)])].map((cells) => cells.map(csvField).join(',')).join('\n');
        expect(parseMatrixCsv(text, { orientation: 'columns' })).toEqual(m);
      }),
      fuzz(200),
    );
  });
});
