// The role matrix: owner, editor, viewer, outsider and anonymous against every team route.
// Expected answers follow the glossary's roles (owner: members and deletion; editor and viewer
// read the team); outsiders get 404 so a team's existence is not revealed; no session gets 401.
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { Invitation, type Team, type User } from '../../server/models';
import { newLinkToken } from '../../server/services/tokens';

type Caller = 'owner' | 'editor' | 'viewer' | 'outsider' | 'anonymous';
type Call = { name: string; send(c: Client, team: Team): Promise<{ status: number }>; expected: Record<Caller, number> };

let t: TestApp;
let team: Team;
let owner: User;
const clients = {} as Record<Caller, Client>;

beforeAll(async () => {
  t = await startTestApp();
  owner = await makeUser('Owner');
  const editor = await makeUser('Editor');
  const viewer = await makeUser('Viewer');
  const outsider = await makeUser('Outsider');
  team = await makeTeam('Matrix Team', [[owner, 'owner'], [editor, 'editor'], [viewer, 'viewer']]);
  for (const [caller, user] of [['owner', owner], ['editor', editor], ['viewer', viewer], ['outsider', outsider]] as const) {
    clients[caller] = client(t.app);
    expect((await clients[caller].signIn(user.email, PASSWORD)).status).toBe(200);
  }
  clients.anonymous = client(t.app);
});
afterAll(() => t.close());

/** A fresh member to act on, so destructive calls never depend on each other. */
async function freshMember(): Promise<User> {
  const user = await makeUser('Target');
  await team.sequelize.models.Membership.create({ teamId: team.id, userId: user.id, role: 'viewer' });
  return user;
}

async function freshInvitation(): Promise<Invitation> {
  return Invitation.create({ teamId: team.id, email: `invitee.${Date.now()}.${Math.random()}@example.org`, role: 'viewer', tokenHash: newLinkToken().tokenHash, invitedBy: owner.id, expiresAt: new Date(Date.now() + 3_600_000) });
}

const readers = { owner: 200, editor: 200, viewer: 200, outsider: 404, anonymous: 401 };
const ownersOnly = (ok: number): Record<Caller, number> => ({ owner: ok, editor: 403, viewer: 403, outsider: 404, anonymous: 401 });

const calls: Call[] = [
  { name: 'GET /teams/:teamId', send: (c, tm) => c.get(`/api/v1/teams/${tm.id}`), expected: readers },
  { name: 'GET /teams/:teamId/audit', send: (c, tm) => c.get(`/api/v1/teams/${tm.id}/audit`), expected: ownersOnly(200) },
  { name: 'PATCH /teams/:teamId', send: (c, tm) => c.patch(`/api/v1/teams/${tm.id}`, { name: 'Matrix Team' }), expected: ownersOnly(200) },
  {
    name: 'POST /teams/:teamId/invitations',
    send: (c, tm) => c.post(`/api/v1/teams/${tm.id}/invitations`, { email: `x${Math.random()}@example.org`, role: 'viewer' }),
    expected: ownersOnly(201),
  },
  {
    name: 'DELETE /teams/:teamId/invitations/:invitationId',
    send: async (c, tm) => c.delete(`/api/v1/teams/${tm.id}/invitations/${(await freshInvitation()).id}`),
    expected: ownersOnly(204),
  },
  {
    name: 'PATCH /teams/:teamId/members/:userId (role)',
    send: async (c, tm) => c.patch(`/api/v1/teams/${tm.id}/members/${(await freshMember()).id}`, { role: 'editor' }),
    expected: ownersOnly(200),
  },
  {
    name: 'DELETE /teams/:teamId/members/:userId (another member)',
    send: async (c, tm) => c.delete(`/api/v1/teams/${tm.id}/members/${(await freshMember()).id}`),
    expected: ownersOnly(204),
  },
  { name: 'GET /teams', send: (c) => c.get('/api/v1/teams'), expected: { owner: 200, editor: 200, viewer: 200, outsider: 200, anonymous: 401 } },
  { name: 'POST /teams', send: (c) => c.post('/api/v1/teams', { name: 'Another' }), expected: { owner: 201, editor: 201, viewer: 201, outsider: 201, anonymous: 401 } },
];

const callers: Caller[] = ['owner', 'editor', 'viewer', 'outsider', 'anonymous'];

describe.each(calls)('$name', (call) => {
  test.each(callers)('as %s', async (caller) => {
    const res = await call.send(clients[caller], team);
    expect(res.status).toBe(call.expected[caller]);
  });
});

test('when a team does not exist, then members and outsiders alike get 404', async () => {
  expect((await clients.owner.get('/api/v1/teams/999999')).status).toBe(404);
});
