import { chartScales, LABEL_GAP, shareLines, spreadLabels, type ChartBox } from './shareChart';

const box: ChartBox = { width: 400, height: 200, left: 40, right: 120, top: 10, bottom: 30 };

test('when steps and shares are scaled, then step 0 is at the left edge, the last step at the right and share 1 at the top', () => {
  const { x, y } = chartScales(box, 10);
  expect(x(0)).toBe(40);
  expect(x(10)).toBe(280);
  expect(y(1)).toBe(10);
  expect(y(0)).toBe(170);
});

test('when two lines end at the same share, then their labels are pushed LABEL_GAP apart in the same order', () => {
  expect(spreadLabels([50, 50, 120], LABEL_GAP, 10, 170)).toEqual([50, 64, 120]);
});

test('when labels crowd the bottom edge, then they are shifted up to stay inside', () => {
  expect(spreadLabels([168, 169], LABEL_GAP, 10, 170)).toEqual([156, 170]);
});

test('when two states swap shares over two steps, then each line runs from its first to its last median share', () => {
  const lines = shareLines(
    [
      [0.75, 0.25],
      [0.25, 0.75],
    ],
    box,
  );
  expect(lines[0].path).toBe('M40.0 50.0L280.0 130.0');
  expect(lines[1].path).toBe('M40.0 130.0L280.0 50.0');
  expect(lines.map((l) => l.labelY)).toEqual([130, 50]);
});
