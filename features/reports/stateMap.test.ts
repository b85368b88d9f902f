import { cellsByState } from './stateMap';

test('when patches are grouped by state, then each group holds the cells of its patches in patch order', () => {
  const groups = cellsByState(Int32Array.from([4, 5, 9, 12]), Uint8Array.from([1, 0, 1, 2]), 3);
  expect(groups.map((g) => Array.from(g))).toEqual([[5], [4, 9], [12]]);
});

test('when a state has no patch, then its group is empty', () => {
  expect(Array.from(cellsByState(Int32Array.from([0]), Uint8Array.from([0]), 2)[1])).toEqual([]);
});
