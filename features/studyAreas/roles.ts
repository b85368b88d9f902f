import type { Role } from '@/shared/schemas';

/** Owners and editors create and change study areas (brief §2); viewers only read. */
export const canEdit = (role: Role | undefined): boolean => role === 'owner' || role === 'editor';

/** Only owners delete. */
export const canDelete = (role: Role | undefined): boolean => role === 'owner';
