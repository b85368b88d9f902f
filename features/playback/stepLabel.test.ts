import { stepLabel } from './stepLabel';

test('step and year shown together', () => {
  expect(stepLabel(12, 2)).toBe('Step 12 · Year 24');
  expect(stepLabel(3, 0.5)).toBe('Step 3 · Year 1.5');
});
