import type { ReactElement } from 'react';

import { Badge, type BadgeTone } from '@/components/Badge';
import type { Role } from '@/shared/schemas';

import { roleLabel } from './roles';

export type RoleBadgeProps = { role: Role };

const tone: Record<Role, BadgeTone> = { owner: 'accent', editor: 'primary', viewer: 'info' };

export function RoleBadge({ role }: RoleBadgeProps): ReactElement {
  return <Badge label={roleLabel[role]} tone={tone[role]} />;
}
