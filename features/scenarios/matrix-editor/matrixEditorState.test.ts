import { initialEditorState, matrixEditorReducer, readMatrix, shownText, UNDO_DEPTH, type MatrixEditorAction, type MatrixEditorState } from './matrixEditorState';

const states = [
  { code: 'SS', name: 'Shrub steppe' },
  { code: 'PG', name: 'Perennial grassland' },
  { code: 'BS', name: 'Bare soil' },
];

const apply = (state: MatrixEditorState, ...actions: MatrixEditorAction[]): MatrixEditorState => actions.reduce(matrixEditorReducer, state);
const start = (): MatrixEditorState => initialEditorState(states);

describe('a new matrix editor', () => {
  test('starts with every state staying put, which is a valid matrix', () => {
    const reading = readMatrix(start());
    expect(reading.matrix).toEqual([
      [1, 0, 0],
      [0, 1, 0],
      [0, 0, 1],
    ]);
    expect(reading.problems).toEqual([]);
  });
});

describe('typing entries', () => {
  test('when a row no longer sums to 1, then the row is marked with its sum and the matrix is withheld', () => {
    const state = apply(start(), { type: 'edit', from: 0, to: 1, text: '0.2' });
    const reading = readMatrix(state);
    expect(reading.rows[0]).toEqual({ sum: 1.2, complete: true, issue: 'Sums to 1.2, not 1 (off by 2.0e-1)' });
    expect(reading.matrix).toBeNull();
    expect(reading.problems).toEqual(['From Shrub steppe (SS): sums to 1.2, not 1 (off by 2.0e-1)']);
  });

  test('when ten entries of 0.1 fill a row, then the compensated sum is exactly 1', () => {
    const ten = Array.from({ length: 10 }, (_, i) => ({ code: `S${i}`, name: `State ${i}` }));
    let state = initialEditorState(ten);
    for (let j = 0; j < 10; j++) state = matrixEditorReducer(state, { type: 'edit', from: 0, to: j, text: '0.1' });
    expect(readMatrix(state).rows[0].issue).toBeNull();
  });

  test('each bad entry is marked with its own reason', () => {
    const state = apply(
      start(),
      { type: 'edit', from: 0, to: 0, text: 'abc' },
      { type: 'edit', from: 0, to: 1, text: '-0.1' },
      { type: 'edit', from: 0, to: 2, text: '1.5' },
      { type: 'edit', from: 1, to: 0, text: '' },
      { type: 'edit', from: 1, to: 1, text: '0,5' },
    );
    const { cells, rows } = readMatrix(state);
    expect(cells[0].map((c) => c.issue)).toEqual(['Not a number', 'Negative: probabilities are 0 to 1', 'More than 1: probabilities are 0 to 1']);
    expect(cells[1][0].issue).toBe('Empty: type 0 for no transition');
    expect(cells[1][1].issue).toBe('Not a number: use a decimal point, not a comma');
    expect(rows[0].issue).toBe('3 entries need fixing');
  });

  test('a row off by less than 1e-9 is accepted, by more is refused', () => {
    const near = apply(start(), { type: 'edit', from: 0, to: 0, text: '0.9999999999' });
    expect(readMatrix(near).rows[0].issue).toBeNull();
    const off = apply(start(), { type: 'edit', from: 0, to: 0, text: '0.999999998' });
    expect(readMatrix(off).rows[0].issue).toBe('Sums to 0.999999998, not 1 (off by 2.0e-9)');
  });
});

describe('pasting a block copied from a spreadsheet', () => {
  test('when a tab-separated block is pasted into the first entry, then it fills the grid from there', () => {
    const state = apply(start(), { type: 'paste', at: { row: 0, col: 0 }, text: '0.8\t0.15\t0.05\n0.1\t0.85\t0.05\n0\t0.3\t0.7\n' });
    expect(readMatrix(state).matrix).toEqual([
      [0.8, 0.15, 0.05],
      [0.1, 0.85, 0.05],
      [0, 0.3, 0.7],
    ]);
    expect(state.notice).toEqual({ tone: 'info', text: 'Pasted 9 entries.' });
  });

  test('when the block comes with its state labels, then the labels are dropped', () => {
    const text = 'from,SS,PG,Bare soil\nSS,0.5,0.5,0\nPG,0,1,0\nbare soil,0,0,1';
    expect(readMatrix(apply(start(), { type: 'paste', at: { row: 0, col: 0 }, text })).matrix).toEqual([
      [0.5, 0.5, 0],
      [0, 1, 0],
      [0, 0, 1],
    ]);
  });

  test('when the block runs past the edge, then what fits is placed and the rest is reported', () => {
    const state = apply(start(), { type: 'paste', at: { row: 1, col: 1 }, text: '0.5\t0.5\t9\n0.2\t0.8' });
    expect(state.cells[1]).toEqual(['0', '0.5', '0.5']);
    expect(state.cells[2]).toEqual(['0', '0.2', '0.8']);
    expect(state.notice).toEqual({ tone: 'danger', text: 'Pasted 4 entries; 1 did not fit in the grid and was left out.' });
  });

  test('when the grid shows columns = from, then a pasted line fills one to-state', () => {
    const state = apply(start(), { type: 'orient', orientation: 'columns' }, { type: 'paste', at: { row: 0, col: 0 }, text: '0.9\t0.2\t0.1' });
    // Shown row 0 is "into SS": from SS, from PG, from BS.
    expect(state.cells.map((row) => row[0])).toEqual(['0.9', '0.2', '0.1']);
    expect(shownText(state, { row: 0, col: 1 })).toBe('0.2');
  });
});

describe('normalise rows (explicit)', () => {
  test('when rows hold counts, then each row is divided by its sum', () => {
    const state = apply(start(), { type: 'paste', at: { row: 0, col: 0 }, text: '6\t3\t1\n0\t5\t5\n0\t0\t2' }, { type: 'normalise' });
    expect(readMatrix(state).matrix).toEqual([
      [0.6, 0.3, 0.1],
      [0, 0.5, 0.5],
      [0, 0, 1],
    ]);
  });

  test('when a row cannot be normalised, then it is kept and named', () => {
    const state = apply(start(), { type: 'paste', at: { row: 0, col: 0 }, text: '0\t0\t0\n2\tx\t1' }, { type: 'normalise' });
    expect(state.cells[0]).toEqual(['0', '0', '0']);
    expect(state.cells[1]).toEqual(['2', 'x', '1']);
    expect(state.notice?.text).toBe('Rows SS, PG were left as they are: they need numbers ≥ 0 with a sum above 0.');
  });
});

describe('CSV import', () => {
  test('when the file names states by code in another order, then rows and columns are lined up', () => {
    const text = 'from,BS,SS,PG\nSS,0,0.9,0.1\nBS,1,0,0\nPG,0,0.2,0.8\n';
    expect(readMatrix(apply(start(), { type: 'importCsv', text })).matrix).toEqual([
      [0.9, 0.1, 0],
      [0.2, 0.8, 0],
      [0, 0, 1],
    ]);
  });

  test('when the toggle says columns, then the file is read transposed', () => {
    const text = 'from,SS,PG,BS\nSS,0.9,0.2,0\nPG,0.1,0.8,0\nBS,0,0,1\n';
    const state = apply(start(), { type: 'orient', orientation: 'columns' }, { type: 'importCsv', text });
    expect(readMatrix(state).matrix).toEqual([
      [0.9, 0.1, 0],
      [0.2, 0.8, 0],
      [0, 0, 1],
    ]);
  });

  test('when the file is wrong, then nothing changes and the engine says where', () => {
    const before = start();
    const state = apply(before, { type: 'importCsv', text: 'from,SS,PG,BS\nSS,0.5,0.4,0\nPG,0,1,0\nBS,0,0,1\n' });
    expect(state.cells).toBe(before.cells);
    expect(state.notice?.tone).toBe('danger');
    expect(state.notice?.text).toMatch(/^The file was not imported: line 2 \(from 'SS'\) sums to 0\.9/);
  });

  test('when the file has a state this study area lacks, then it is refused with the known codes', () => {
    const state = apply(start(), { type: 'importCsv', text: 'from,SS,XX,BS\nSS,1,0,0\nXX,0,1,0\nBS,0,0,1\n' });
    expect(state.notice?.text).toBe("The file was not imported: the file's state 'XX' is not a cover state here; use the codes SS, PG, BS or the state names.");
  });
});

describe('undo', () => {
  test('takes back changes one at a time, newest first', () => {
    const state = apply(start(), { type: 'edit', from: 0, to: 0, text: '0.5' }, { type: 'edit', from: 0, to: 1, text: '0.5' }, { type: 'undo' });
    expect(state.cells[0]).toEqual(['0.5', '0', '0']);
    expect(apply(state, { type: 'undo' }).cells[0]).toEqual(['1', '0', '0']);
  });

  test('an action that changes nothing adds nothing to undo; turning the display is not a change', () => {
    const state = apply(start(), { type: 'edit', from: 0, to: 0, text: '1' }, { type: 'orient', orientation: 'columns' });
    expect(state.past).toHaveLength(0);
    expect(apply(state, { type: 'undo' })).toBe(state);
  });

  test(`keeps the last ${UNDO_DEPTH} versions`, () => {
    let state = start();
    for (let n = 0; n < UNDO_DEPTH + 5; n++) state = matrixEditorReducer(state, { type: 'edit', from: 0, to: 0, text: String(n) });
    expect(state.past).toHaveLength(UNDO_DEPTH);
  });

  test('loading an estimate can be undone', () => {
    const state = apply(start(), { type: 'load', rows: [[0.5, 0.5, 0], [0, 1, 0], [0, 0, 1]], note: 'Filled from the survey.' }, { type: 'undo' });
    expect(readMatrix(state).matrix?.[0]).toEqual([1, 0, 0]);
  });
});
