// Teams: creation, invitations accepted by new and existing people, roles and the last-owner rule.
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { storedForms } from '../support/stored-token';
import { startTestApp, type TestApp } from '../support/test-app';
import { Membership } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

async function signedIn(email: string): Promise<Client> {
  const c = client(t.app);
  expect((await c.signIn(email, PASSWORD)).status).toBe(200);
  return c;
}
const tokenFrom = (link: string): string => new URL(link).searchParams.get('token') ?? '';

test('when someone creates a team, then they are its owner and see it in their list', async () => {
  const founder = await makeUser('Founder');
  const c = await signedIn(founder.email);
  const created = await c.post('/api/v1/teams', { name: 'Sagebrush Monitoring Group' });
  expect(created.status).toBe(201);
  expect(created.body.team).toMatchObject({ name: 'Sagebrush Monitoring Group', role: 'owner' });
  const list = await c.get('/api/v1/teams');
  expect(list.body.teams).toEqual([created.body.team]);
});

test('when an owner invites a new address, then only the link token\'s digest is stored, and the invitee signs up from the link and joins with the role', async () => {
  const owner = await makeUser('Owner');
  const team = await makeTeam('Wetland Crew', [[owner, 'owner']]);
  const c = await signedIn(owner.email);
  const invited = await c.post(`/api/v1/teams/${team.id}/invitations`, { email: 'New.Member@example.org', role: 'editor' });
  expect(invited.status).toBe(201);

  const mail = await t.mailTo('new.member@example.org', 'invited you to Wetland Crew');
  const token = tokenFrom(mail.links.find((l) => l.includes('/invitation?token='))!);
  expect(await storedForms(t.sequelize, 'invitations', token)).toEqual({ digestInTable: true, plainAnywhere: [] });

  const newcomer = client(t.app);
  const preview = await newcomer.get(`/api/v1/invitations/${token}`);
  expect(preview.body).toEqual({ teamName: 'Wetland Crew', email: 'new.member@example.org', role: 'editor', invitedBy: 'Owner', accountExists: false });

  // Signing up from the invitation link confirms the address: no separate verification needed.
  expect((await newcomer.post('/api/v1/auth/sign-up', { email: 'new.member@example.org', name: 'New Member', password: 'invited-pass-1', invitation: token })).status).toBe(201);
  expect((await newcomer.signIn('new.member@example.org', 'invited-pass-1')).status).toBe(200);
  const accepted = await newcomer.post(`/api/v1/invitations/${token}/accept`);
  expect(accepted.status).toBe(200);
  expect(accepted.body.team).toEqual({ id: team.id, name: 'Wetland Crew', role: 'editor' });

  // The link is single-use.
  expect((await newcomer.post(`/api/v1/invitations/${token}/accept`)).status).toBe(404);
  const detail = await c.get(`/api/v1/teams/${team.id}`);
  expect(detail.body.members.map((m: { name: string; role: string }) => [m.name, m.role])).toEqual([
    ['Owner', 'owner'],
    ['New Member', 'editor'],
  ]);
});

test('when someone else accepts an invitation meant for another address, then it is refused', async () => {
  const owner = await makeUser('Owner');
  const stranger = await makeUser('Stranger');
  const team = await makeTeam('Private', [[owner, 'owner']]);
  const c = await signedIn(owner.email);
  await c.post(`/api/v1/teams/${team.id}/invitations`, { email: 'intended@example.org', role: 'viewer' });
  const token = tokenFrom((await t.mailTo('intended@example.org', 'invited you')).links[0]);
  const res = await (await signedIn(stranger.email)).post(`/api/v1/invitations/${token}/accept`);
  expect(res.status).toBe(403);
  expect(res.body.error.message).toContain('intended@example.org');
});

test('when the last owner tries to leave or be demoted, then it is refused until another owner exists', async () => {
  const owner = await makeUser('Only Owner');
  const editor = await makeUser('Editor');
  const team = await makeTeam('One Owner', [[owner, 'owner'], [editor, 'editor']]);
  const c = await signedIn(owner.email);

  const demote = await c.patch(`/api/v1/teams/${team.id}/members/${owner.id}`, { role: 'editor' });
  expect(demote.status).toBe(409);
  expect(demote.body.error.code).toBe('last_owner');
  expect((await c.delete(`/api/v1/teams/${team.id}/members/${owner.id}`)).status).toBe(409);

  expect((await c.patch(`/api/v1/teams/${team.id}/members/${editor.id}`, { role: 'owner' })).status).toBe(200);
  expect((await c.delete(`/api/v1/teams/${team.id}/members/${owner.id}`)).status).toBe(204);
  expect(await Membership.count({ where: { teamId: team.id } })).toBe(1);
});

test('when a member changes their own run notifications, then it is allowed without being owner', async () => {
  const owner = await makeUser('Owner');
  const viewer = await makeUser('Viewer');
  const team = await makeTeam('Notify', [[owner, 'owner'], [viewer, 'viewer']]);
  const v = await signedIn(viewer.email);
  const res = await v.patch(`/api/v1/teams/${team.id}/members/${viewer.id}`, { notifyRuns: true });
  expect(res.status).toBe(200);
  expect(res.body.member).toMatchObject({ notifyRuns: true, role: 'viewer' });
  expect((await v.patch(`/api/v1/teams/${team.id}/members/${owner.id}`, { notifyRuns: false })).status).toBe(403);
});

test('when a site admin disables an account, then its sessions end and it cannot sign in', async () => {
  const admin = await makeUser('Admin', { isAdmin: true });
  const person = await makeUser('Soon Disabled');
  const p = await signedIn(person.email);
  const a = await signedIn(admin.email);
  // Read once first, so the session and the user are what this process last saw of them.
  expect((await p.get('/api/v1/auth/me')).status).toBe(200);
  const list = await a.get('/api/v1/admin/users');
  expect(list.body.users.map((u: { email: string }) => u.email)).toContain(person.email);
  expect((await a.patch(`/api/v1/admin/users/${person.id}`, { disabled: true })).body.user.disabled).toBe(true);
  expect((await p.get('/api/v1/auth/me')).status).toBe(401);
  const again = await client(t.app).signIn(person.email, PASSWORD);
  expect(again.status).toBe(403);
  expect(again.body.error.code).toBe('account_disabled');
  expect((await p.get('/api/v1/admin/users')).status).toBe(401);
  expect((await (await signedIn((await makeUser('Not Admin')).email)).get('/api/v1/admin/users')).status).toBe(403);
});

test('when members are invited, promoted and removed, then the owner reads each event in the audit log, newest first', async () => {
  const owner = await makeUser('Audit Owner');
  const editor = await makeUser('Audit Editor');
  const team = await makeTeam('Audited', [[owner, 'owner'], [editor, 'editor']]);
  const c = await signedIn(owner.email);
  await c.post(`/api/v1/teams/${team.id}/invitations`, { email: 'audit.invitee@example.org', role: 'viewer' });
  await c.patch(`/api/v1/teams/${team.id}/members/${editor.id}`, { role: 'viewer' });
  await c.delete(`/api/v1/teams/${team.id}/members/${editor.id}`);
  await c.patch(`/api/v1/teams/${team.id}`, { name: 'Audited Team' });
  const log = await c.get(`/api/v1/teams/${team.id}/audit`);
  expect(log.status).toBe(200);
  expect(log.body.events.map((e: { action: string; summary: string; actor: string }) => [e.action, e.summary, e.actor])).toEqual([
    ['team.renamed', 'renamed the team from "Audited" to "Audited Team"', 'Audit Owner'],
    ['member.removed', 'removed Audit Editor (viewer)', 'Audit Owner'],
    ['member.role_changed', 'changed Audit Editor from editor to viewer', 'Audit Owner'],
    ['invitation.sent', 'invited audit.invitee@example.org as viewer', 'Audit Owner'],
  ]);
});
