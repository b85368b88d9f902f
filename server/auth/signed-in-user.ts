// The signed-in person of a request, looked up by the id in the session. Every signed-in request
// asks, so a user read in the last USER_CACHE_MS is reused; any save through the User model in
// this process (rename, disable, password) forgets them all at once.
import type { Sequelize } from 'sequelize';
import { User } from '../models';
import { ShortLivedCache } from './short-lived-cache';

const USER_CACHE_MS = 2_000;
const FORGET_HOOK = 'forget-signed-in-users';
const cache = new ShortLivedCache<number, User>(USER_CACHE_MS);
/** The database the cached users came from; the models are re-initialised when it changes (tests). */
let cachedFor: Sequelize | null = null;

function useDatabase(sequelize: Sequelize): void {
  if (sequelize === cachedFor) return;
  cache.forgetAll();
  cachedFor = sequelize;
  // User.init (per database) resets the model's hooks, so they are added again here.
  for (const hook of ['afterSave', 'afterDestroy', 'afterBulkUpdate', 'afterBulkDestroy'] as const) {
    User.removeHook(hook, FORGET_HOOK);
    User.addHook(hook, FORGET_HOOK, () => cache.forgetAll());
  }
}

export async function signedInUser(id: number): Promise<User | null> {
  const sequelize = User.sequelize!;
  useDatabase(sequelize);
  const cached = cache.get(id);
  if (cached) return cached;
  const epoch = cache.epoch;
  // A plain query mapped onto the model costs a third of findByPk, whose option handling dominates.
  const user = await sequelize.query('SELECT * FROM users WHERE id = $1', { bind: [id], model: User, mapToModel: true, plain: true });
  if (user) cache.fill(id, user, epoch);
  return user;
}
