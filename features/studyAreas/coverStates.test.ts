import { moveRow, newRow, starterRows, toRows, validateRows } from './coverStates';

const demo = toRows([
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'PG', name: 'Perennial grassland', colour: '#56B4E9' },
]);

describe('cover-state rows', () => {
  it('when rows are added, then each takes the next unused Okabe–Ito colour', () => {
    const [first, second] = starterRows();
    expect([first.colour, second.colour]).toEqual(['#E69F00', '#56B4E9']);
    expect(newRow(demo).colour).toBe('#009E73');
  });

  it('when a row moves up, then it swaps with the one above; at the top nothing moves', () => {
    expect(moveRow(demo, 1, -1).map((r) => r.code)).toEqual(['PG', 'SS']);
    expect(moveRow(demo, 0, -1).map((r) => r.code)).toEqual(['SS', 'PG']);
  });

  it('when the rows are valid, then no errors', () => {
    expect(validateRows(demo)).toBeNull();
  });

  it('when a code repeats, a name is empty and a colour is malformed, then a message on each of those fields', () => {
    const rows = [...demo, { key: 'x', code: 'ss', name: '', colour: 'orange' }];
    const errors = validateRows(rows);
    expect(errors?.rows[2].code).toMatch(/used twice/);
    expect(errors?.rows[2].name).toMatch(/State name must not be empty/);
    expect(errors?.rows[2].colour).toMatch(/#3E7A5E/);
    expect(errors?.list).toBeNull();
  });

  it('when there is one row, then a message for the whole list', () => {
    expect(validateRows(demo.slice(0, 1))?.list).toMatch(/at least 2/);
  });
});
