// Fuzzing the CSV tokenizer every table reader shares: any text gives records or a MarkovInputError;
// any table written with csvField reads back cell for cell, on the lines it was written.
import fc from 'fast-check';
import { csvNoise, fuzz, readOrRefuse } from '../../tests/fixtures/fuzz';
import { awkwardName } from '../../tests/fixtures/markov/arbitraries';
import { csvField, parseCsv, parseNumberCell } from './csvTable';
import { MarkovInputError } from './errors';

/** Rows the reader keeps: a blank line (one empty cell) is skipped by design. */
const table = fc.array(fc.array(fc.oneof(awkwardName, fc.constant('')), { minLength: 1, maxLength: 6 }), { minLength: 1, maxLength: 8 }).map((rows) => rows.filter((r) => r.length > 1 || r[0] !== ''));

describe('parseCsv fuzzing', () => {
  test.each([
    ['any Unicode text', fc.string({ unit: 'grapheme', maxLength: 200 })],
    ['text of CSV punctuation', csvNoise],
  ])('%s gives records on increasing lines, or a MarkovInputError about a quote', (_what, text) => {
    fc.assert(
      fc.property(text, (t) => {
        const outcome = readOrRefuse(MarkovInputError, () => parseCsv(t));
        if ('refused' in outcome) {
          expect(outcome.refused.message).toMatch(/quoted field is never closed/);
          return;
        }
        const lines = outcome.value.map((r) => r.line);
        expect(lines.every((line, i) => line >= 1 && (i === 0 || line > lines[i - 1]))).toBe(true);
        expect(outcome.value.every((r) => r.cells.length > 1 || r.cells[0] !== '')).toBe(true);
      }),
      fuzz(500),
    );
  });

  test('a table written with csvField reads back cell for cell, each record on the line it starts', () => {
    fc.assert(
      fc.property(table, fc.constantFrom('\n', '\r\n'), fc.boolean(), (rows, newline, bom) => {
        const written = rows.map((cells) => cells.map(csvField).join(','));
        const records = parseCsv((bom ? '\uFEFF' : '') + written.join(newline));
        expect(records.map((r) => r.cells)).toEqual(rows);
        // Each line feed written, those inside quoted cells too, moves the next record one line down.
        let line = 1;
        const starts = written.map((w) => {
          const start = line;
          line += (w + newline).split('\n').length - 1;
          return start;
        });
        expect(records.map((r) => r.line)).toEqual(starts);
      }),
      fuzz(400),
    );
  });

  test('a finite number written by String() reads back exactly; any other cell is a number or a MarkovInputError', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        const value = Object.is(x, -0) ? 0 : x;
        expect(parseNumberCell(String(value), 'cell')).toBe(value);
      }),
      fuzz(500),
    );
    fc.assert(
      fc.property(fc.oneof(fc.string({ maxLength: 12 }), fc.stringMatching(/^[-+.eE0-9,]{1,10}$/)), (raw) => {
        const outcome = readOrRefuse(MarkovInputError, () => parseNumberCell(raw, 'cell'));
        if ('value' in outcome) expect(Number.isNaN(outcome.value)).toBe(false);
        else expect(outcome.refused.message).toContain(`'${raw}' is not a number`);
      }),
      fuzz(500),
    );
  });
});
