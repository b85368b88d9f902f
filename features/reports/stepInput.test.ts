import { parseStep } from './stepInput';

test('when a whole step within the run is typed, then it is that step', () => {
  expect(parseStep(' 25 ', 50)).toBe(25);
  expect(parseStep('0', 50)).toBe(0);
  expect(parseStep('50', 50)).toBe(50);
});

test('when the step is past the run, negative or not a whole number, then it is refused', () => {
  expect(parseStep('51', 50)).toBeNull();
  expect(parseStep('-1', 50)).toBeNull();
  expect(parseStep('2.5', 50)).toBeNull();
  expect(parseStep('', 50)).toBeNull();
});
