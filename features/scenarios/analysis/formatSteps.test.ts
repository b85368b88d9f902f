import { formatStepsAndYears } from './formatSteps';

test('steps with years, and "never" for an infinite residence', () => {
  expect(formatStepsAndYears(4, 2)).toBe('4 steps · 8 yr');
  expect(formatStepsAndYears(1234.56, 0.5)).toBe('1,234.6 steps · 617.3 yr');
  expect(formatStepsAndYears(null, 1)).toBe('never left');
});
