// Lookups that every signed-in request repeats (its user, its access to a run), kept for about
// ttlMs in a ShortLivedCache. Any save or delete through the given models in this process forgets
// them all at once (Sequelize hooks), so a rename, a role change or a removal shows on the very
// next request; the TTL bounds how long a change made by another process can go unseen. Misses
// (null) are never kept, so what is created shows at once too.
import type { Model, ModelStatic, Sequelize } from 'sequelize';
import { ShortLivedCache } from './short-lived-cache';

const CHANGE_HOOKS = ['afterSave', 'afterDestroy', 'afterBulkUpdate', 'afterBulkDestroy'] as const;

export type LookupCache<K, V> = { get(key: K, load: () => Promise<V | null>): Promise<V | null> };

export function lookupCache<K, V>(name: string, ttlMs: number, models: ModelStatic<Model>[]): LookupCache<K, V> {
  const cache = new ShortLivedCache<K, V>(ttlMs);
  /** The database the entries came from; the models are initialised again for another (tests). */
  let cachedFor: Sequelize | undefined;

  function watch(sequelize: Sequelize): void {
    if (sequelize === cachedFor) return;
    cache.forgetAll();
    cachedFor = sequelize;
    // Model.init resets a model's hooks, so they are added again for each database.
    for (const model of models) {
      for (const hook of CHANGE_HOOKS) {
        model.removeHook(hook, name);
        model.addHook(hook, name, () => cache.forgetAll());
      }
    }
  }

  return {
    async get(key, load) {
      watch(models[0].sequelize!);
      const cached = cache.get(key);
      if (cached !== undefined) return cached;
      const epoch = cache.epoch;
      const value = await load();
      if (value !== null) cache.fill(key, value, epoch);
      return value;
    },
  };
}
