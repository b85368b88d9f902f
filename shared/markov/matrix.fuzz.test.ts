// Fuzzing the matrix model: whatever states and rows it is given, createMatrix returns a valid
// row-stochastic matrix or refuses with a MarkovInputError; rows of normalised weights are kept.
import fc from 'fast-check';
import { fuzz, readOrRefuse } from '../../tests/fixtures/fuzz';
import { stochasticMatrix } from '../../tests/fixtures/markov/arbitraries';
import { MarkovInputError } from './errors';
import { fsum } from './fsum';
import { createMatrix, MAX_STATES, MIN_STATES, ROW_SUM_TOLERANCE, validateDistribution, type TransitionMatrix } from './matrix';

/** Entries of every kind a form or file can produce once parsed, the non-finite ones included. */
const entry = fc.oneof(
  fc.double(),
  fc.double({ min: 0, max: 1, noNaN: true }),
  fc.constantFrom(0, 1, -0, 0.5, NaN, Infinity, -Infinity, Number('1e400'), Number.MIN_VALUE, Number.MAX_VALUE, 1 + 1e-9, 1 - 1e-10),
);
const names = fc.array(fc.oneof(fc.string({ maxLength: 6 }), fc.constantFrom('A', 'B', ' ', '')), { maxLength: 14 });
const rows = fc.array(fc.array(entry, { maxLength: 14 }), { maxLength: 14 });

function expectValid(m: TransitionMatrix): void {
  expect(m.states.length).toBeGreaterThanOrEqual(MIN_STATES);
  expect(m.states.length).toBeLessThanOrEqual(MAX_STATES);
  expect(new Set(m.states).size).toBe(m.states.length);
  expect(m.rows).toHaveLength(m.states.length);
  for (const row of m.rows) {
    expect(row).toHaveLength(m.states.length);
    for (const p of row) expect(p >= 0 && p <= 1).toBe(true);
    expect(Math.abs(fsum(row) - 1)).toBeLessThanOrEqual(ROW_SUM_TOLERANCE);
  }
}

describe('createMatrix fuzzing', () => {
  test('any states and rows give a valid matrix or a MarkovInputError with a message', () => {
    fc.assert(
      fc.property(names, rows, (states, given) => {
        const outcome = readOrRefuse(MarkovInputError, () => createMatrix(states, given));
        if ('value' in outcome) expectValid(outcome.value);
        else expect(outcome.refused.message).not.toBe('');
      }),
      fuzz(500),
    );
  });

  test('square rows of any entries, normalised or not, give a valid matrix or a MarkovInputError', () => {
    // Non-negative weights as large as a double holds, so that row sums can overflow.
    const weight = fc.oneof(entry, fc.double({ min: 0, noNaN: true }), fc.constant(Number.MAX_VALUE));
    const square = fc.integer({ min: 2, max: 5 }).chain((k) => fc.array(fc.array(weight, { minLength: k, maxLength: k }), { minLength: k, maxLength: k }));
    fc.assert(
      fc.property(square, fc.boolean(), (given, normalise) => {
        const states = given.map((_, i) => `s${i}`);
        const outcome = readOrRefuse(MarkovInputError, () => createMatrix(states, given, { normalise }));
        if ('value' in outcome) expectValid(outcome.value);
      }),
      fuzz(500),
    );
  });

  test('rows of positive weights divided by their sum are accepted unchanged', () => {
    fc.assert(
      fc.property(stochasticMatrix, (m) => {
        expect(createMatrix(m.states, m.rows)).toEqual(m);
      }),
      fuzz(200),
    );
  });

  test('any start shares are accepted as given or refused with a MarkovInputError', () => {
    fc.assert(
      fc.property(fc.array(entry, { maxLength: 6 }), (shares) => {
        const states = ['A', 'B', 'C'];
        const outcome = readOrRefuse(MarkovInputError, () => validateDistribution(shares, states, 'the start cover'));
        if ('value' in outcome) {
          expect(outcome.value).toEqual(shares);
          expect(Math.abs(fsum(shares) - 1)).toBeLessThanOrEqual(ROW_SUM_TOLERANCE);
        }
      }),
      fuzz(300),
    );
  });
});
