import { MarkovInputError } from './errors';
import { fsum } from './fsum';

export const MIN_STATES = 2;
export const MAX_STATES = 12;
/** A row may be off from 1 by at most this much before it is refused (or explicitly normalised). */
export const ROW_SUM_TOLERANCE = 1e-9;

/** Row-stochastic transition matrix: rows[i][j] = P(next = states[j] | now = states[i]). */
export type TransitionMatrix = { states: string[]; rows: number[][] };

/** How validation messages name a row and a cell; readers pass file positions here. */
export type MatrixLocator = {
  row: (from: number) => string;
  cell: (from: number, to: number) => string;
};

export type MatrixOptions = {
  /**
   * Divide each row by its sum instead of refusing a row that does not sum to 1. With this on,
   * entries may be any non-negative weights (counts, percentages).
   */
  normalise?: boolean;
  locator?: MatrixLocator;
};

function defaultLocator(states: readonly string[]): MatrixLocator {
  return {
    row: (from) => `row '${states[from]}'`,
    cell: (from, to) => `cell from '${states[from]}' to '${states[to]}'`,
  };
}

/** Checks a state list: 2–12 names, non-empty, no repeats. */
export function validateStates(states: readonly string[]): string[] {
  if (states.length < MIN_STATES || states.length > MAX_STATES) {
    throw new MarkovInputError(
      `${states.length} states given; a model needs ${MIN_STATES} to ${MAX_STATES} cover states`,
    );
  }
  const seen = new Set<string>();
  states.forEach((state, i) => {
    if (state.trim() === '') throw new MarkovInputError(`state ${i + 1} has an empty name; name every state`);
    if (seen.has(state)) throw new MarkovInputError(`state '${state}' is repeated; each state appears once`);
    seen.add(state);
  });
  return [...states];
}

/**
 * Builds a validated row-stochastic matrix. Refuses non-finite, negative or > 1 entries and rows
 * whose compensated sum is off from 1 by more than ROW_SUM_TOLERANCE, naming the cell or row.
 */
export function createMatrix(
  states: readonly string[],
  rows: readonly (readonly number[])[],
  options: MatrixOptions = {},
): TransitionMatrix {
  const names = validateStates(states);
  const k = names.length;
  const locate = options.locator ?? defaultLocator(names);
  if (rows.length !== k) {
    throw new MarkovInputError(`${rows.length} rows given for ${k} states; give one row per state`);
  }
  const out = rows.map((row, i) => {
    if (row.length !== k) {
      throw new MarkovInputError(`${locate.row(i)} has ${row.length} entries; it needs ${k}, one per state`);
    }
    row.forEach((value, j) => {
      if (!Number.isFinite(value)) {
        throw new MarkovInputError(`${locate.cell(i, j)}: '${value}' is not a finite number`);
      }
      if (value < 0) {
        throw new MarkovInputError(`${locate.cell(i, j)}: ${value} is negative; probabilities are 0 to 1`);
      }
      if (value > 1 && !options.normalise) {
        throw new MarkovInputError(
          `${locate.cell(i, j)}: ${value} is greater than 1; probabilities are 0 to 1 (or normalise rows explicitly)`,
        );
      }
    });
    const sum = fsum(row);
    if (options.normalise) {
      if (sum === 0) throw new MarkovInputError(`${locate.row(i)} is all zeros; it cannot be normalised`);
      // Weights near 1.8e308 (Number.MAX_VALUE) overflow the sum, and dividing by it gives NaN or 0.
      if (!Number.isFinite(sum)) throw new MarkovInputError(`${locate.row(i)} adds up past the largest number a computer can hold; scale its weights down before normalising`);
      return row.map((value) => value / sum);
    }
    if (Math.abs(sum - 1) > ROW_SUM_TOLERANCE) {
      throw new MarkovInputError(
        `${locate.row(i)} sums to ${sum} (off by ${Math.abs(sum - 1).toExponential(2)}, more than ${ROW_SUM_TOLERANCE}); ` +
          'fix the row or normalise rows explicitly',
      );
    }
    return [...row];
  });
  return { states: names, rows: out };
}

/** The transpose of a square array: columns become rows (none for none, e.g. a header-only file). */
export function transpose(rows: readonly (readonly number[])[]): number[][] {
  return (rows[0] ?? []).map((_, j) => rows.map((row) => row[j]));
}

/** Row vector times matrix: (x P)_j = Σ_i x_i p_ij, compensated. */
export function vectorTimesMatrix(x: readonly number[], rows: readonly (readonly number[])[]): number[] {
  const terms = new Float64Array(x.length);
  return rows[0].map((_, j) => {
    for (let i = 0; i < x.length; i++) terms[i] = x[i] * rows[i][j];
    return fsum(terms);
  });
}

/** Checks a start distribution over the states: K non-negative shares summing to 1 (±1e-9). */
export function validateDistribution(x: readonly number[], states: readonly string[], what: string): number[] {
  if (x.length !== states.length) {
    throw new MarkovInputError(`${what} has ${x.length} shares for ${states.length} states; give one per state`);
  }
  x.forEach((value, i) => {
    if (!Number.isFinite(value) || value < 0 || value > 1) {
      throw new MarkovInputError(`${what}: share for '${states[i]}' is '${value}'; shares are numbers from 0 to 1`);
    }
  });
  const sum = fsum(x);
  if (Math.abs(sum - 1) > ROW_SUM_TOLERANCE) {
    throw new MarkovInputError(`${what} sums to ${sum}; the shares must sum to 1`);
  }
  return [...x];
}
