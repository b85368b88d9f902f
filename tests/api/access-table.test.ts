// Access control of every API route for every kind of caller, checked against the server's own
// route table: a route without an entry here (or an entry without a route) fails the first test.
// The usual answers: readers get 200, changes need an owner or editor (viewer 403), an outsider
// gets 404 so that nothing of a team is revealed, and no session gets 401. Entries that answer
// otherwise say why.
import { routeTable } from '../../server/http/route-table';
import type { Client } from '../support/client';
import { makeUser, PASSWORD } from '../support/people';
import { EVERYONE, cinderFlatBoundary, uploadAs, type Who } from '../support/study-area-fixture';
import { api, coverMap, mapPair, plots, scenarioBody, startAccessFixtures, type AccessFixtures } from '../support/access-fixtures';

type Expected = Record<Who, number>;
type Entry = { send(c: Client, fx: AccessFixtures): PromiseLike<{ status: number }>; expect: Expected };

const readers: Expected = { owner: 200, editor: 200, viewer: 200, outsider: 404, anonymous: 401 };
const editors = (ok: number): Expected => ({ owner: ok, editor: ok, viewer: 403, outsider: 404, anonymous: 401 });
const owners = (ok: number): Expected => ({ ...editors(ok), editor: 403 });
const signedIn = (ok: number): Expected => ({ owner: ok, editor: ok, viewer: ok, outsider: ok, anonymous: 401 });
const everyone = (ok: number): Expected => ({ ...signedIn(ok), anonymous: ok });

const boundary = { file: [cinderFlatBoundary, 'cinder-flat.geojson'] as [Buffer, string] };
const areaFields = { name: 'New area', cellSize: '500', states: JSON.stringify([{ code: 'S1', name: 'Shrub', colour: '#E69F00' }, { code: 'S2', name: 'Grass', colour: '#009E73' }]) };
const startMap = { file: coverMap('sage', 'start.geojson') };

const table: Record<string, Entry> = {
  // Every caller: load balancers and the sign-in page have no session.
  'GET /health': { send: (c) => c.get(api('/health')), expect: everyone(200) },
  'GET /auth/csrf': { send: (c) => c.get(api('/auth/csrf')), expect: everyone(200) },
  'GET /auth/me': { send: (c) => c.get(api('/auth/me')), expect: signedIn(200) },
  // The account routes act on the address or token in the body, not on the session: every caller alike.
  'POST /auth/sign-up': { send: (c, fx) => fx.postFromOwnAddress(c, api('/auth/sign-up'), { email: fx.fresh.email(), name: 'Newcomer', password: PASSWORD }), expect: everyone(201) },
  'POST /auth/verify': { send: async (c, fx) => c.post(api('/auth/verify'), { token: await fx.fresh.token('verify') }), expect: everyone(200) },
  'POST /auth/verify/resend': { send: (c, fx) => fx.postFromOwnAddress(c, api('/auth/verify/resend'), { email: fx.people.viewer.email }), expect: everyone(202) },
  // A second session of the caller signs in as someone new (or signs out), so the caller's own session lives on.
  'POST /auth/sign-in': { send: async (c, fx) => (await fx.twin(c)).post(api('/auth/sign-in'), { email: (await makeUser('Returning')).email, password: PASSWORD }), expect: everyone(200) },
  'POST /auth/sign-out': { send: async (c, fx) => (await fx.twin(c)).post(api('/auth/sign-out')), expect: everyone(204) },
  'POST /auth/forgot': { send: (c, fx) => fx.postFromOwnAddress(c, api('/auth/forgot'), { email: fx.people.viewer.email }), expect: everyone(202) },
  'POST /auth/reset': { send: async (c, fx) => fx.postFromOwnAddress(c, api('/auth/reset'), { token: await fx.fresh.token('reset'), password: PASSWORD }), expect: everyone(200) },

  // Public: the invitation page shows who invited whom before the addressee signs in or up.
  'GET /invitations/:token': { send: (c, fx) => c.get(api(`/invitations/${fx.invitationToken}`)), expect: everyone(200) },
  // Sent to the outsider (for another team): only the addressee may accept; team roles play no part.
  'POST /invitations/:token/accept': {
    send: async (c, fx) => c.post(api(`/invitations/${(await fx.fresh.invitation(fx.neighbours, fx.people.outsider.email)).token}/accept`)),
    expect: { owner: 403, editor: 403, viewer: 403, outsider: 200, anonymous: 401 },
  },

  // One's own account, teams and notices, and the development outbox: any signed-in person.
  'PATCH /account': { send: (c) => c.patch(api('/account'), { areaUnit: 'ha' }), expect: signedIn(200) },
  'POST /account/password': { send: (c) => c.post(api('/account/password'), { currentPassword: PASSWORD, newPassword: PASSWORD }), expect: signedIn(200) },
  'GET /teams': { send: (c) => c.get(api('/teams')), expect: signedIn(200) },
  'POST /teams': { send: (c) => c.post(api('/teams'), { name: 'Another team' }), expect: signedIn(201) },
  'GET /notices': { send: (c) => c.get(api('/notices')), expect: signedIn(200) },
  // The owner's notice: a notice is its addressee's only, and to anyone else it does not exist.
  'POST /notices/:noticeId/read': { send: (c, fx) => c.post(api(`/notices/${fx.noticeId}/read`)), expect: { owner: 200, editor: 404, viewer: 404, outsider: 404, anonymous: 401 } },
  'GET /dev/outbox': { send: (c) => c.get(api('/dev/outbox')), expect: signedIn(200) },

  // Site administration: none of the callers is a site admin, whatever their team role.
  'GET /admin/users': { send: (c) => c.get(api('/admin/users')), expect: { ...signedIn(403), anonymous: 401 } },
  'PATCH /admin/users/:userId': { send: (c, fx) => c.patch(api(`/admin/users/${fx.people.outsider.id}`), { disabled: false }), expect: { ...signedIn(403), anonymous: 401 } },

  // The team itself: its owners manage it, members read it.
  'GET /teams/:teamId': { send: (c, fx) => c.get(api(`/teams/${fx.team.id}`)), expect: readers },
  'PATCH /teams/:teamId': { send: (c, fx) => c.patch(api(`/teams/${fx.team.id}`), { name: fx.team.name }), expect: owners(200) },
  'GET /teams/:teamId/audit': { send: (c, fx) => c.get(api(`/teams/${fx.team.id}/audit`)), expect: owners(200) },
  'POST /teams/:teamId/invitations': { send: (c, fx) => c.post(api(`/teams/${fx.team.id}/invitations`), { email: fx.fresh.email(), role: 'viewer' }), expect: owners(201) },
  'DELETE /teams/:teamId/invitations/:invitationId': {
    send: async (c, fx) => c.delete(api(`/teams/${fx.team.id}/invitations/${(await fx.fresh.invitation(fx.team, fx.fresh.email())).id}`)),
    expect: owners(204),
  },
  'PATCH /teams/:teamId/members/:userId': { send: async (c, fx) => c.patch(api(`/teams/${fx.team.id}/members/${(await fx.fresh.member()).id}`), { role: 'editor' }), expect: owners(200) },
  'DELETE /teams/:teamId/members/:userId': { send: async (c, fx) => c.delete(api(`/teams/${fx.team.id}/members/${(await fx.fresh.member()).id}`)), expect: owners(204) },

  'GET /teams/:teamId/study-areas': { send: (c, fx) => c.get(api(`/teams/${fx.team.id}/study-areas`)), expect: readers },
  'POST /teams/:teamId/study-areas/preview': { send: (c, fx) => uploadAs(c, api(`/teams/${fx.team.id}/study-areas/preview`), boundary), expect: editors(200) },
  'POST /teams/:teamId/study-areas': { send: (c, fx) => uploadAs(c, api(`/teams/${fx.team.id}/study-areas`), boundary, areaFields), expect: editors(201) },
  'GET /study-areas/:studyAreaId': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}`)), expect: readers },
  'PATCH /study-areas/:studyAreaId': { send: (c, fx) => c.patch(api(`/study-areas/${fx.areaId}`), { description: 'Unchanged' }), expect: editors(200) },
  // Deleting a study area takes its scenarios, surveys and runs with it: owners only.
  'DELETE /study-areas/:studyAreaId': { send: async (c, fx) => c.delete(api(`/study-areas/${await fx.fresh.area()}`)), expect: owners(204) },
  'PUT /study-areas/:studyAreaId/states': {
    send: async (c, fx) => c.put(api(`/study-areas/${fx.areaId}/states`), { states: (await fx.as.owner.get(api(`/study-areas/${fx.areaId}`))).body.studyArea.states }),
    expect: editors(200),
  },
  'GET /study-areas/:studyAreaId/patches.geojson': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/patches.geojson`)), expect: readers },
  'GET /study-areas/:studyAreaId/start-cover.geojson': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/start-cover.geojson`)), expect: readers },
  'GET /study-areas/:studyAreaId/patches': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/patches`)), expect: readers },
  'GET /study-areas/:studyAreaId/start-cover': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/start-cover`)), expect: readers },
  'PUT /study-areas/:studyAreaId/start-cover': {
    send: (c, fx) => c.put(api(`/study-areas/${fx.areaId}/start-cover`), { method: 'exact', proportions: [0.4, 0.3, 0.2, 0.1], seed: 'access' }),
    expect: editors(200),
  },
  'POST /study-areas/:studyAreaId/start-cover/map/inspect': { send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/start-cover/map/inspect`), startMap), expect: editors(200) },
  'POST /study-areas/:studyAreaId/start-cover/map': {
    send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/start-cover/map`), startMap, { property: 'cover', mapping: JSON.stringify({ sage: 'S1' }) }),
    expect: editors(200),
  },
  'GET /study-areas/:studyAreaId/source': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/source`)), expect: readers },

  'GET /study-areas/:studyAreaId/scenarios': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/scenarios`)), expect: readers },
  'POST /study-areas/:studyAreaId/scenarios': { send: (c, fx) => c.post(api(`/study-areas/${fx.areaId}/scenarios`), scenarioBody), expect: editors(201) },
  'GET /scenarios/:scenarioId': { send: (c, fx) => c.get(api(`/scenarios/${fx.scenarioId}`)), expect: readers },
  'PUT /scenarios/:scenarioId': { send: (c, fx) => c.put(api(`/scenarios/${fx.scenarioId}`), scenarioBody), expect: editors(200) },
  'POST /scenarios/:scenarioId/duplicate': { send: (c, fx) => c.post(api(`/scenarios/${fx.scenarioId}/duplicate`), {}), expect: editors(201) },
  'DELETE /scenarios/:scenarioId': { send: async (c, fx) => c.delete(api(`/scenarios/${await fx.fresh.scenario()}`)), expect: editors(204) },
  'POST /scenarios/:scenarioId/phases/:index/use-survey': { send: (c, fx) => c.post(api(`/scenarios/${fx.scenarioId}/phases/0/use-survey`), { surveyId: fx.surveyId }), expect: editors(200) },
  'GET /scenarios/:scenarioId/analysis': { send: (c, fx) => c.get(api(`/scenarios/${fx.scenarioId}/analysis`)), expect: readers },
  'GET /scenarios/:scenarioId/uncertainty': { send: (c, fx) => c.get(api(`/scenarios/${fx.scenarioId}/uncertainty?draws=100`)), expect: readers },

  'GET /study-areas/:studyAreaId/surveys': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/surveys`)), expect: readers },
  'POST /study-areas/:studyAreaId/surveys/inspect': { send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/surveys/inspect`), plots.file), expect: editors(200) },
  'POST /study-areas/:studyAreaId/surveys': { send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/surveys`), plots.file, plots.fields), expect: editors(201) },
  'POST /study-areas/:studyAreaId/surveys/map-pair/inspect': { send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/surveys/map-pair/inspect`), mapPair.files), expect: editors(200) },
  'POST /study-areas/:studyAreaId/surveys/map-pair': { send: (c, fx) => uploadAs(c, api(`/study-areas/${fx.areaId}/surveys/map-pair`), mapPair.files, mapPair.fields), expect: editors(201) },
  'GET /surveys/:surveyId': { send: (c, fx) => c.get(api(`/surveys/${fx.surveyId}`)), expect: readers },
  'PATCH /surveys/:surveyId': { send: (c, fx) => c.patch(api(`/surveys/${fx.surveyId}`), { notes: 'Unchanged' }), expect: editors(200) },
  'DELETE /surveys/:surveyId': { send: async (c, fx) => c.delete(api(`/surveys/${await fx.fresh.survey()}`)), expect: editors(204) },
  'GET /surveys/:surveyId/files/:role': { send: (c, fx) => c.get(api(`/surveys/${fx.surveyId}/files/table`)), expect: readers },

  'POST /scenarios/:scenarioId/runs': { send: (c, fx) => c.post(api(`/scenarios/${fx.scenarioId}/runs`), { steps: 2, replicates: 1 }), expect: editors(201) },
  'GET /study-areas/:studyAreaId/runs': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/runs`)), expect: readers },
  'GET /runs/:runId': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}`)), expect: readers },
  'POST /runs/:runId/cancel': { send: async (c, fx) => c.post(api(`/runs/${await fx.fresh.run('queued')}/cancel`)), expect: editors(200) },
  'POST /runs/:runId/retry': { send: async (c, fx) => c.post(api(`/runs/${await fx.fresh.run('cancelled')}/retry`)), expect: editors(200) },
  'GET /runs/:runId/summary': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}/summary`)), expect: readers },
  'GET /runs/:runId/frames/:step': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}/frames/1`)), expect: readers },

  'GET /runs/:runId/steps/:step/patches.geojson': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}/steps/1/patches.geojson`)), expect: readers },
  'GET /runs/:runId/history.csv': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}/history.csv`)), expect: readers },
  'GET /runs/:runId/area-shares.csv': { send: (c, fx) => c.get(api(`/runs/${fx.runIds[0]}/area-shares.csv`)), expect: readers },
  'GET /study-areas/:studyAreaId/compare.csv': { send: (c, fx) => c.get(api(`/study-areas/${fx.areaId}/compare.csv?runs=${fx.runIds.join(',')}`)), expect: readers },
  'GET /scenarios/:scenarioId/phases/:index/matrix.csv': { send: (c, fx) => c.get(api(`/scenarios/${fx.scenarioId}/phases/0/matrix.csv`)), expect: readers },
  'GET /surveys/:surveyId/estimate.csv': { send: (c, fx) => c.get(api(`/surveys/${fx.surveyId}/estimate.csv`)), expect: readers },
};

let fx: AccessFixtures;

beforeAll(async () => {
  fx = await startAccessFixtures();
});
afterEach(() => fx.endActiveRuns());
afterAll(() => fx.t.close());

test('when the route table and the access table are compared, then every route has exactly one entry and every entry a route', () => {
  const routes = routeTable(fx.t.mounts).map((r) => `${r.method} ${r.path}`);
  const entries = Object.keys(table);
  expect({ missing: routes.filter((r) => !entries.includes(r)), stale: entries.filter((e) => !routes.includes(e)), repeated: routes.filter((r, i) => routes.indexOf(r) !== i) }).toEqual({
    missing: [],
    stale: [],
    repeated: [],
  });
});

describe.each(Object.entries(table))('%s', (_route, entry) => {
  test.each(EVERYONE)('as %s', async (who) => {
    const res = await entry.send(fx.as[who], fx);
    expect(res.status).toBe(entry.expect[who]);
  });
});

test('when a team does not exist, then a member gets the same 404 an outsider gets for a real team', async () => {
  const missing = await fx.as.owner.get(api('/teams/999999'));
  const hidden = await fx.as.outsider.get(api(`/teams/${fx.team.id}`));
  expect([missing.status, missing.body]).toEqual([404, hidden.body]);
});
