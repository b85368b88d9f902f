import { shortForm } from './cellDisplay';

test('when a value has more than 4 decimals, then it shows 4 and an ellipsis; short values stay as typed', () => {
  expect(shortForm('0.70588235294')).toBe('0.7059…');
  expect(shortForm('0.25')).toBe('0.25');
  expect(shortForm('0.1875')).toBe('0.1875');
  expect(shortForm('1')).toBe('1');
  expect(shortForm('abc')).toBe('abc');
});
