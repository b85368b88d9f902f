import { MarkovInputError } from './errors';
import { fsum } from './fsum';
import { createMatrix } from './matrix';
import { formatMatrixCsv, parseMatrixCsv } from './matrixCsv';

// The Land of Oz chain of Grinstead & Snell, Introduction to Probability, ch. 11.1, as a CSV.
const OZ = 'from,R,N,S\nR,0.5,0.25,0.25\nN,0.5,0,0.5\nS,0.25,0.25,0.5\n';

const message = (f: () => unknown): string => {
  try {
    f();
  } catch (err) {
    expect(err).toBeInstanceOf(MarkovInputError);
    return (err as Error).message;
  }
  throw new Error('expected a MarkovInputError');
};

describe('matrix CSV', () => {
  test('reads the row form and writes it back unchanged', () => {
    const m = parseMatrixCsv(OZ);
    expect(m.states).toEqual(['R', 'N', 'S']);
    expect(m.rows[1]).toEqual([0.5, 0, 0.5]);
    expect(parseMatrixCsv(formatMatrixCsv(m))).toEqual(m);
  });

  test('reads the transposed (columns) form into the same row-stochastic matrix', () => {
    const columns = 'to,R,N,S\nR,0.5,0.5,0.25\nN,0.25,0,0.25\nS,0.25,0.5,0.5\n';
    expect(parseMatrixCsv(columns, { orientation: 'columns' })).toEqual(parseMatrixCsv(OZ));
  });

  test('accepts quoted names, CRLF, a BOM and lines in any order', () => {
    const text = '\ufefffrom,"Shrub, dense",Grass\r\nGrass,0.3,0.7\r\n"Shrub, dense",0.9,0.1\r\n';
    const m = parseMatrixCsv(text);
    expect(m.states).toEqual(['Shrub, dense', 'Grass']);
    expect(m.rows).toEqual([[0.9, 0.1], [0.3, 0.7]]);
    expect(parseMatrixCsv(formatMatrixCsv(m))).toEqual(m);
  });

  test('names the cell or row of each kind of bad input', () => {
    expect(message(() => parseMatrixCsv('from,A,B\nA,0.5,x\nB,0.5,0.5'))).toMatch(/line 2, column 'B'.*'x' is not a number/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,0,5\nB,0.5,0.5'))).toMatch(/line 2, column 'B'.*greater than 1/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,-0.5,1.5\nB,0.5,0.5'))).toMatch(/line 2, column 'A'.*negative/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,0.5,0.5\nC,0.5,0.5'))).toMatch(/line 3: unknown state 'C'/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,0.5,0.5\nA,0.5,0.5'))).toMatch(/line 3: state 'A' already has a line \(line 2\)/);
    expect(message(() => parseMatrixCsv('from,A,A\nA,0.5,0.5'))).toMatch(/'A' is repeated/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,0.5,0.5'))).toMatch(/no line for state 'B'/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,0.5,0.4\nB,0.5,0.5'))).toMatch(/line 2 \(from 'A'\) sums to 0\.9/);
    expect(message(() => parseMatrixCsv('from,A,B\nA,"0,5",0.5\nB,0.5,0.5'))).toMatch(/decimal point/);
    expect(message(() => parseMatrixCsv('from,A\nA,1'))).toMatch(/1 states given; a model needs 2 to 12/);
    const columns = message(() => parseMatrixCsv('to,A,B\nA,0.5,0.5\nB,0.4,0.5', { orientation: 'columns' }));
    expect(columns).toMatch(/column 'A' \(probabilities out of 'A'\) sums to 0\.9/);
  });

  test('accepts a row off by at most 1e-9, refuses one off by more, and normalises only when asked', () => {
    expect(() => createMatrix(['A', 'B'], [[0.5 + 5e-10, 0.5], [0, 1]])).not.toThrow();
    expect(() => createMatrix(['A', 'B'], [[0.5 + 2e-9, 0.5], [0, 1]])).toThrow(/sums to/);
    const m = createMatrix(['A', 'B'], [[30, 10], [1, 1]], { normalise: true });
    expect(m.rows).toEqual([[0.75, 0.25], [0.5, 0.5]]);
    expect(message(() => createMatrix(['A', 'B'], [[0, 0], [1, 1]], { normalise: true }))).toMatch(/all zeros/);
  });

  test('row sums are compensated: ten 0.1 entries sum to exactly 1 (naive summation gives 0.9999999999999999)', () => {
    const tenths = new Array<number>(10).fill(0.1);
    expect(tenths.reduce((a, b) => a + b, 0)).not.toBe(1);
    expect(fsum(tenths)).toBe(1);
  });
});
