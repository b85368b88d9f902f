import { formatLatLon, plural } from './formatPlace';

test('latitude and longitude carry their hemisphere', () => {
  expect(formatLatLon(42.718191, -118.459171)).toBe('42.71819° N, 118.45917° W');
  expect(formatLatLon(-33.9, 18.4)).toBe('33.90000° S, 18.40000° E');
});

test('counts agree with their unit', () => {
  expect(plural(1, 'step')).toBe('1 step');
  expect(plural(0, 'year')).toBe('0 years');
  expect(plural(1.5, 'year')).toBe('1.5 years');
});
