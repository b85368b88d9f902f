// The per-request lookup cache: entries expire, and a lookup that began before something was
// forgotten is not kept (it may have read the old row).
import { ShortLivedCache } from '../../../server/services/short-lived-cache';

afterEach(() => jest.useRealTimers());

test('when an entry is older than its time to live, then it is gone (lifetimes spread over ±25 %)', () => {
  jest.useFakeTimers({ now: 0 });
  const cache = new ShortLivedCache<string, number>(2_000);
  cache.fill('a', 1, cache.epoch);
  jest.setSystemTime(1_500);
  expect(cache.get('a')).toBe(1);
  jest.setSystemTime(2_501);
  expect(cache.get('a')).toBeUndefined();
});

test('when something is forgotten while a lookup runs, then that lookup is not kept', () => {
  const cache = new ShortLivedCache<string, string>(60_000);
  const started = cache.epoch;
  cache.forget('session-1');
  cache.fill('session-2', 'read before the sign-out', started);
  expect(cache.get('session-2')).toBeUndefined();
  cache.fill('session-2', 'read after it', cache.epoch);
  expect(cache.get('session-2')).toBe('read after it');
  cache.forgetAll();
  expect(cache.get('session-2')).toBeUndefined();
});

test('when it is full, then it starts again rather than grow', () => {
  const cache = new ShortLivedCache<number, number>(60_000, 3);
  for (let i = 0; i < 4; i++) cache.fill(i, i, cache.epoch);
  expect([0, 1, 2, 3].map((i) => cache.get(i))).toEqual([undefined, undefined, undefined, 3]);
});
