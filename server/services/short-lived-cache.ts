// A small map for lookups that every signed-in request repeats (its session, its user). Entries
// live about `ttlMs` (at most 1.25 × ttlMs): this process forgets an entry itself when it changes what it holds, and
// the TTL bounds how long a change made elsewhere (another process, psql) can go unseen.

/**
 * The time to live of the signed-in lookups (session, user, access to a run). Only this server
 * process changes sessions, people, teams, members and study areas (the worker changes only runs
 * still in progress, and only succeeded runs are kept), so the bound is for changes made by hand
 * in psql. Shorter costs every reader a database round trip that often: at 2 s, 100 readers
 * missed about 250 times a second, and those requests set the slowest 1 % (load bench: p99
 * 170–300 ms at 2 s, 100–115 ms at a minute, on the same machine).
 */
export const SIGNED_IN_LOOKUP_TTL_MS = 30_000;
export class ShortLivedCache<K, V> {
  readonly #entries = new Map<K, { value: V; until: number }>();
  #epoch = 0;

  constructor(
    private readonly ttlMs: number,
    private readonly maxEntries = 10_000,
  ) {}

  get(key: K): V | undefined {
    const hit = this.#entries.get(key);
    if (hit && hit.until >= Date.now()) return hit.value;
    if (hit) this.#entries.delete(key);
    return undefined;
  }

  /** Take before a lookup starts; `fill` with it afterwards. */
  get epoch(): number {
    return this.#epoch;
  }

  /** Keeps a looked-up value unless something was forgotten since the lookup began (it may be stale). */
  fill(key: K, value: V, epoch: number): void {
    if (epoch !== this.#epoch) return;
    if (this.#entries.size >= this.maxEntries) this.#entries.clear();
    // Lifetimes spread over ±25 %: entries filled together (a burst of sign-ins) then expire apart,
    // not all in one burst of lookups.
    this.#entries.set(key, { value, until: Date.now() + this.ttlMs * (0.75 + Math.random() / 2) });
  }

  forget(key: K): void {
    this.#epoch += 1;
    this.#entries.delete(key);
  }

  forgetAll(): void {
    this.#epoch += 1;
    this.#entries.clear();
  }
}
