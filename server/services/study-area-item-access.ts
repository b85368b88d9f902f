// Access to something kept inside a study area (a scenario, a survey): the study area's roles
// decide, and an outsider learns nothing, not even that the item exists.
import type { User } from '../models';
import { AppError, notFound } from '../http/errors';
import type { Role } from '../../shared/schemas';
import { studyAreaAccess, type StudyAreaAccess } from './study-areas';

export const EDITORS: readonly Role[] = ['owner', 'editor'];

/** The caller's access to the study area that holds the item; 404 naming the item when there is none. */
export async function itemAccess(item: { studyAreaId: number } | null, what: string, user: User, allowed?: readonly Role[]): Promise<StudyAreaAccess> {
  if (!item) throw notFound(what);
  try {
    return await studyAreaAccess(item.studyAreaId, user, allowed);
  } catch (err) {
    if (err instanceof AppError && err.status === 404) throw notFound(what);
    throw err;
  }
}
