import { spreadLabels } from './spreadLabels';

describe('spreadLabels', () => {
  test('leaves labels that are far enough apart where they are', () => {
    expect(spreadLabels([10, 50, 90], 12, 0, 100)).toEqual([10, 50, 90]);
  });

  test('pushes crowded labels apart in their order', () => {
    expect(spreadLabels([50, 48, 52], 12, 0, 100)).toEqual([60, 48, 72]);
  });

  test('pulls labels back inside the bottom edge', () => {
    expect(spreadLabels([99, 100, 98], 10, 0, 100)).toEqual([90, 100, 80]);
  });
});
