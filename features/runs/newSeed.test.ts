import { newSeed } from './newSeed';

test('when a seed is drawn twice, then both are 16 hex digits and differ', () => {
  const [a, b] = [newSeed(), newSeed()];
  expect(a).toMatch(/^[0-9a-f]{16}$/);
  expect(a).not.toBe(b);
});
