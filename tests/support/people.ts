// Fixtures for API tests: verified accounts and team memberships written straight to the test database.
import { Membership, Team, User } from '../../server/models';
import { hashPassword } from '../../server/services/accounts';
import type { Role } from '../../shared/schemas';

export const PASSWORD = 'correct-horse-battery';
let passwordHash: Promise<string> | null = null;
let counter = 0;

export async function makeUser(name = 'Person', extra: Partial<{ isAdmin: boolean }> = {}): Promise<User> {
  passwordHash ??= hashPassword(PASSWORD);
  counter += 1;
  return User.create({
    email: `${name.toLowerCase().replace(/\W+/g, '.')}.${counter}@example.org`,
    name,
    passwordHash: await passwordHash,
    emailVerifiedAt: new Date(),
    isAdmin: extra.isAdmin ?? false,
  });
}

export async function makeTeam(name: string, members: [User, Role][]): Promise<Team> {
  const team = await Team.create({ name });
  for (const [user, role] of members) await Membership.create({ teamId: team.id, userId: user.id, role });
  return team;
}
