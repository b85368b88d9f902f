import type { Role } from '@/shared/schemas';

export const roleLabel: Record<Role, string> = { owner: 'Owner', editor: 'Editor', viewer: 'Viewer' };

/** What each role may do (brief §2), for the invite form. */
export const roleDescription: Record<Role, string> = {
  owner: 'Manages members and can delete the team.',
  editor: 'Creates and changes study areas and scenarios, starts runs.',
  viewer: 'Reads, downloads and comments.',
};

export const roleOptions = (['owner', 'editor', 'viewer'] as const).map((role) => ({ value: role, label: roleLabel[role] }));
