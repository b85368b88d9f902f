// The demo seed: three people in the invented demo team, two invented study areas with start
// covers, and running it twice changes nothing.
import { startTestApp, type TestApp } from '../support/test-app';
import { client } from '../support/client';
import { DEMO_PASSWORD, demoPeople, seedDemo } from '../../server/seed/demo';
import { Membership, StudyArea, User } from '../../server/models';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.sequelize);
  await seedDemo(t.sequelize);
});
afterAll(() => t.close());

test('when the demo is seeded twice, then there is one of each account, membership and study area', async () => {
  expect(await User.count()).toBe(demoPeople.length);
  expect(await Membership.count()).toBe(demoPeople.length);
  expect(await StudyArea.count()).toBe(2);
});

test('when the demo owner opens the activity log, then it tells how the team came together, newest first, once however often the demo is seeded', async () => {
  const c = client(t.app);
  const owner = demoPeople.find((p) => p.role === 'owner')!;
  expect((await c.signIn(owner.email, DEMO_PASSWORD)).status).toBe(200);
  const [team] = (await c.get('/api/v1/teams')).body.teams;
  const events: { at: string; actor: string; action: string; summary: string }[] = (await c.get(`/api/v1/teams/${team.id}/audit`)).body.events;
  expect(events.map((e) => e.action)).toEqual(['study_area.deleted', 'invitation.cancelled', 'invitation.sent', 'invitation.accepted', 'invitation.sent', 'member.role_changed', 'invitation.accepted', 'invitation.sent']);
  expect(events[5]).toMatchObject({ actor: 'Rosa Delgado (demo owner)', summary: 'changed Tomas Whitfield (demo editor) from viewer to editor' });
  expect(events.map((e) => e.at)).toEqual(events.map((e) => e.at).sort().reverse());
});

test('when the demo editor signs in, then the team lists Cinder Flat (~3,500 ha) and Heron Bay (~900 ha) with start covers', async () => {
  const c = client(t.app);
  const editor = demoPeople.find((p) => p.role === 'editor')!;
  expect((await c.signIn(editor.email, DEMO_PASSWORD)).status).toBe(200);
  const [team] = (await c.get('/api/v1/teams')).body.teams;
  const areas = (await c.get(`/api/v1/teams/${team.id}/study-areas`)).body.studyAreas;
  const hectares = Object.fromEntries(areas.map((a: { name: string; totalAreaM2: number }) => [a.name, a.totalAreaM2 / 10_000]));
  // The brief's sizes are approximate ("~3,500 ha", "~900 ha"): within 15 %.
  expect(Math.abs(hectares['Cinder Flat allotment'] - 3500) / 3500).toBeLessThan(0.15);
  expect(Math.abs(hectares['Heron Bay marsh'] - 900) / 900).toBeLessThan(0.15);
  for (const area of areas) {
    const cover = (await c.get(`/api/v1/study-areas/${area.id}/start-cover`)).body.startCover;
    expect(cover.patches.reduce((a: number, b: number) => a + b, 0)).toBe(area.patchCount);
  }
});
