// The signed-in person of a request, looked up by the id in the session: every signed-in request
// asks, so a user read lately is reused until a save through the User model forgets it.
import { User } from '../models';
import { lookupCache } from '../services/lookup-cache';
import { SIGNED_IN_LOOKUP_TTL_MS } from '../services/short-lived-cache';

const users = lookupCache<number, User>('forget-signed-in-users', SIGNED_IN_LOOKUP_TTL_MS, [User]);

export function signedInUser(id: number): Promise<User | null> {
  // A plain query mapped onto the model costs a third of findByPk, whose option handling dominates.
  return users.get(id, () => User.sequelize!.query('SELECT * FROM users WHERE id = $1', { bind: [id], model: User, mapToModel: true, plain: true }));
}
