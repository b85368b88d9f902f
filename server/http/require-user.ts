import type { Request } from 'express';
import type { User } from '../models';
import { notSignedIn } from './errors';

/** The signed-in person, or a 401. */
export function currentUser(req: Request): User {
  if (!req.user) throw notSignedIn();
  return req.user as User;
}
