import { useMe } from '@/features/auth/queries';
import { useOutboxAvailable } from '@/features/outbox/queries';

import type { NavIconName } from './NavIcon';

export type NavEntry = { href: '/' | '/team' | '/account' | '/outbox' | '/admin'; label: string; icon: NavIconName };

const studyAreas: NavEntry = { href: '/', label: 'Study areas', icon: 'studyAreas' };
const team: NavEntry = { href: '/team', label: 'Team', icon: 'team' };
const account: NavEntry = { href: '/account', label: 'Account', icon: 'account' };
const outbox: NavEntry = { href: '/outbox', label: 'Outbox', icon: 'outbox' };
const admin: NavEntry = { href: '/admin', label: 'Admin', icon: 'admin' };

/** The navigation entries this person sees: Outbox on development servers, Admin for site admins. */
export function useNavEntries(): NavEntry[] {
  const me = useMe();
  const showOutbox = useOutboxAvailable();
  return [
    studyAreas,
    team,
    account,
    ...(showOutbox ? [outbox] : []),
    ...(me.data?.isAdmin ? [admin] : []),
  ];
}

/** A section is active on its own path and below it; the list only on its own. */
export function isActive(entry: NavEntry, pathname: string): boolean {
  if (entry.href === '/') return pathname === '/';
  return pathname === entry.href || pathname.startsWith(`${entry.href}/`);
}
