import { parseRunIds, toggleRunId } from './runIds';

describe('compared run ids', () => {
  test('read from the address, in order, without repeats or junk, at most four', () => {
    expect(parseRunIds('3,5')).toEqual([3, 5]);
    expect(parseRunIds(' 5, x,3,5,,-1,2.5,7,8,9')).toEqual([5, 3, 7, 8]);
    expect(parseRunIds(undefined)).toEqual([]);
    expect(parseRunIds(['3', '4'])).toEqual([3, 4]);
  });

  test('toggling adds at the end, removes anywhere, and stops at four', () => {
    expect(toggleRunId([3], 5)).toEqual([3, 5]);
    expect(toggleRunId([3, 5], 3)).toEqual([5]);
    expect(toggleRunId([1, 2, 3, 4], 9)).toEqual([1, 2, 3, 4]);
  });
});
