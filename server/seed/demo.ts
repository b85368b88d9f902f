// The invented demo: the "Juniper Wash Restoration Cooperative", its owner, editor and viewer,
// their activity log, and two invented study areas. Idempotent: running it again changes nothing that exists.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { Membership, StudyArea, Team, User } from '../models';
import { hashPassword } from '../services/accounts';
import { createStudyArea, studyAreaAccess } from '../services/study-areas';
import { setStartCoverByProportions } from '../services/start-cover';
import { teamAccess } from '../services/teams';
import { seedDemoScenarios } from './demo-scenarios';
import { seedDemoRuns } from './demo-runs';
import { seedDemoActivity } from './demo-activity';
import { DEFAULT_STATE_COLOURS, type CoverState, type Role } from '../../shared/schemas';

export const DEMO_PASSWORD = 'juniper-wash-demo';
export const DEMO_TEAM = 'Juniper Wash Restoration Cooperative';

export const demoPeople: { email: string; name: string; role: Role; isAdmin: boolean }[] = [
  { email: 'owner@juniper-wash.example', name: 'Rosa Delgado (demo owner)', role: 'owner', isAdmin: true },
  { email: 'editor@juniper-wash.example', name: 'Tomas Whitfield (demo editor)', role: 'editor', isAdmin: false },
  { email: 'viewer@juniper-wash.example', name: 'Amara Okafor (demo viewer)', role: 'viewer', isAdmin: false },
];

type DemoArea = { file: string; name: string; description: string; cellSize: number; states: [string, string][]; proportions: number[] };

const states = (list: [string, string][]): CoverState[] => list.map(([code, name], i) => ({ code, name, colour: DEFAULT_STATE_COLOURS[i] }));

export const demoAreas: DemoArea[] = [
  {
    file: 'cinder-flat.geojson',
    name: 'Cinder Flat allotment',
    description: 'Invented demo allotment in semi-arid shrub steppe, with one excluded inholding. Not a real place.',
    cellSize: 100,
    states: [['SS', 'Shrub steppe'], ['PG', 'Perennial grassland'], ['AG', 'Annual grassland'], ['BS', 'Bare soil']],
    proportions: [0.45, 0.25, 0.22, 0.08],
  },
  {
    file: 'heron-bay.geojson',
    name: 'Heron Bay marsh',
    description: 'Invented demo coastal marsh. Not a real place.',
    cellSize: 50,
    states: [['OW', 'Open water'], ['LM', 'Low marsh'], ['HM', 'High marsh'], ['UE', 'Upland edge']],
    proportions: [0.2, 0.35, 0.3, 0.15],
  },
];

async function seedStudyArea(sequelize: Sequelize, team: Team, owner: User, area: DemoArea): Promise<void> {
  if (await StudyArea.findOne({ where: { teamId: team.id, name: area.name } })) return;
  const bytes = readFileSync(path.join(__dirname, 'boundaries', area.file));
  const access = await teamAccess(team.id, owner);
  const created = await createStudyArea({ sequelize }, access, owner, { originalname: area.file, buffer: bytes }, {
    name: area.name,
    description: area.description,
    cellSize: area.cellSize,
    minFraction: 0,
    states: JSON.stringify(states(area.states)),
  });
  await setStartCoverByProportions(await studyAreaAccess(created.id, owner), { method: 'exact', proportions: area.proportions, seed: `demo-${area.file}` });
}

export async function seedDemo(sequelize: Sequelize): Promise<void> {
  const [team] = await Team.findOrCreate({ where: { name: DEMO_TEAM }, defaults: { name: DEMO_TEAM } });
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const users: User[] = [];
  for (const person of demoPeople) {
    const [user] = await User.findOrCreate({
      where: { email: person.email },
      defaults: { email: person.email, name: person.name, passwordHash, emailVerifiedAt: new Date(), isAdmin: person.isAdmin },
    });
    users.push(user);
    await Membership.findOrCreate({
      where: { teamId: team.id, userId: user.id },
      defaults: { teamId: team.id, userId: user.id, role: person.role, notifyRuns: person.role !== 'viewer' },
    });
  }
  await seedDemoActivity(team, users);
  for (const area of demoAreas) await seedStudyArea(sequelize, team, users[0], area);
  await seedDemoScenarios(sequelize);
  await seedDemoRuns(sequelize);
}
