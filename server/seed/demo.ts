// The invented demo: the "Juniper Wash Restoration Cooperative" and its owner, editor and viewer.
// Idempotent: running it again changes nothing that exists.
import { Membership, Team, User } from '../models';
import { hashPassword } from '../services/accounts';
import type { Role } from '../../shared/schemas';

export const DEMO_PASSWORD = 'juniper-wash-demo';
export const DEMO_TEAM = 'Juniper Wash Restoration Cooperative';

export const demoPeople: { email: string; name: string; role: Role; isAdmin: boolean }[] = [
  { email: 'owner@juniper-wash.example', name: 'Rosa Delgado (demo owner)', role: 'owner', isAdmin: true },
  { email: 'editor@juniper-wash.example', name: 'Tomas Whitfield (demo editor)', role: 'editor', isAdmin: false },
  { email: 'viewer@juniper-wash.example', name: 'Amara Okafor (demo viewer)', role: 'viewer', isAdmin: false },
];

export async function seedDemo(): Promise<void> {
  const [team] = await Team.findOrCreate({ where: { name: DEMO_TEAM }, defaults: { name: DEMO_TEAM } });
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  for (const person of demoPeople) {
    const [user] = await User.findOrCreate({
      where: { email: person.email },
      defaults: { email: person.email, name: person.name, passwordHash, emailVerifiedAt: new Date(), isAdmin: person.isAdmin },
    });
    await Membership.findOrCreate({
      where: { teamId: team.id, userId: user.id },
      defaults: { teamId: team.id, userId: user.id, role: person.role, notifyRuns: person.role !== 'viewer' },
    });
  }
}
