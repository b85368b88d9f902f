import { formatTimeLeft } from './progressText';

test.each([
  [0.2, 'about 1 s'],
  [42, 'about 42 s'],
  [61, 'about 2 min'],
  [3500, 'about 59 min'],
  [3660, 'about 1 h 1 min'],
])('when %s seconds are left, then it reads "%s"', (seconds, text) => {
  expect(formatTimeLeft(seconds)).toBe(text);
});
