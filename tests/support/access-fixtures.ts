// What the access table (tests/api/access-table.test.ts) acts on: the study-area fixture's team and
// people, a study area with a start cover, a scenario, a survey, two finished runs, the owner's
// notice and an open invitation, plus fresh objects for the calls that delete, cancel or change.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { bbox } from '@turf/turf';
import { pino } from 'pino';
import { Op } from 'sequelize';
import type request from 'supertest';
import { client, type Client } from './client';
import { makeTeam, makeUser, PASSWORD } from './people';
import { cinderFlatBoundary, startFixture, uploadAs, type Fixture } from './study-area-fixture';
import { AccountToken, Invitation, Membership, Notice, Run, type Team, type User } from '../../server/models';
import type { TokenPurpose } from '../../server/models/account-token';
import { executeRunNow } from '../../server/jobs/execute-now';
import type { RunQueue } from '../../server/jobs/run-queue';
import { startRun } from '../../server/services/runs';
import { newLinkToken } from '../../server/services/tokens';
import { ACTIVE_RUN_STATUSES } from '../../shared/schemas';

export const api = (p: string): string => `/api/v1${p}`;

const FOUR = ['Shrub steppe', 'Perennial grassland', 'Annual grassland', 'Bare soil'];
export const scenarioBody = {
  name: 'Grazing',
  phases: [
    {
      fromStep: 0,
      toStep: null,
      matrix: [
        [0.9, 0.05, 0.04, 0.01],
        [0.03, 0.85, 0.09, 0.03],
        [0.01, 0.06, 0.83, 0.1],
        [0, 0.04, 0.26, 0.7],
      ],
      surveyId: null,
    },
  ],
};

/** The demo plots with their labels mapped onto the four states: a full estimate. */
export const plots = {
  file: { file: [readFileSync(path.resolve(__dirname, '../../server/seed/surveys/cinder-flat-plots.csv')), 'plots.csv'] as [Buffer, string] },
  fields: { name: 'Plots', plotColumn: 'plot_id', timeColumn: 'year', stateColumn: 'cover_class', mapping: JSON.stringify({ shrub: 'S1', 'perennial grass': 'S2', 'annual grass': 'S3', bare: 'S4' }) },
};

/** A cover map of one polygon over the whole boundary whose attribute `cover` is `value`. */
export function coverMap(value: string, name: string): [Buffer, string] {
  const [w, s, e, n] = bbox(JSON.parse(cinderFlatBoundary.toString())).map((v, i) => v + (i < 2 ? -0.01 : 0.01));
  const polygon = { type: 'Polygon', coordinates: [[[w, s], [e, s], [e, n], [w, n], [w, s]]] };
  return [Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [{ type: 'Feature', properties: { cover: value }, geometry: polygon }] })), name];
}
export const mapPair = {
  files: { earlier: coverMap('sage', 'earlier.geojson'), later: coverMap('grass', 'later.geojson') },
  fields: { name: 'Maps', property: 'cover', earlierDate: '2010-06-01', laterDate: '2017-06-01', mapping: JSON.stringify({ sage: 'S1', grass: 'S2' }) },
};

/** Runs made here are computed at once or left queued: nothing goes to the job queue. */
const noQueue: RunQueue = { sendAttempt: async () => {}, stop: async () => {} };

export type AccessFixtures = Fixture & {
  areaId: number;
  scenarioId: number;
  surveyId: number;
  runIds: [number, number];
  noticeId: number;
  invitationToken: string;
  /** Another team, whose invitations go to the outsider (who stays outside the main team). */
  neighbours: Team;
  fresh: {
    email(): string;
    member(): Promise<User>;
    invitation(team: Team, email: string): Promise<{ id: number; token: string }>;
    area(): Promise<number>;
    scenario(): Promise<number>;
    survey(): Promise<number>;
    run(status: 'queued' | 'cancelled'): Promise<number>;
    /** An e-mailed link token of a new person. */
    token(purpose: TokenPurpose): Promise<string>;
  };
  /** A second session of the same person (or another anonymous client), for calls that end or replace a session. */
  twin(c: Client): Promise<Client>;
  /**
   * A POST from an address of its own: the reset limiter allows 5 requests per address across
   * forgot, reset and resend, so without it the limiter, not the route, would answer.
   */
  postFromOwnAddress(c: Client, url: string, body: object): Promise<request.Response>;
  /** Cancels every active run, so the team's cap on active runs never decides an answer. */
  endActiveRuns(): Promise<void>;
};

/** The id of the one object a 201 answer carries ({ scenario: … } or { survey: … }). */
function created(res: request.Response, what: string): number {
  if (res.status !== 201) throw new Error(`${what} not created: ${JSON.stringify(res.body)}`);
  return Object.values(res.body as Record<string, { id: number }>)[0].id;
}

export async function startAccessFixtures(): Promise<AccessFixtures> {
  const f = await startFixture();
  const { t, team, people, as } = f;
  const owner = as.owner;
  let counter = 0;
  const email = (): string => `fresh.${++counter}@example.org`;

  const areaId = await f.makeArea(FOUR);
  await owner.put(api(`/study-areas/${areaId}/start-cover`), { method: 'exact', proportions: [0.4, 0.3, 0.2, 0.1], seed: 'access' });
  const scenario = async (): Promise<number> => created(await owner.post(api(`/study-areas/${areaId}/scenarios`), scenarioBody), 'scenario');
  const survey = async (): Promise<number> => created(await uploadAs(owner, api(`/study-areas/${areaId}/surveys`), plots.file, plots.fields), 'survey');
  const scenarioId = await scenario();
  const run = async (status: 'queued' | 'cancelled'): Promise<number> => {
    const { id } = await startRun({ sequelize: t.sequelize }, noQueue, people.owner, scenarioId, { steps: 3, replicates: 2 });
    if (status === 'cancelled') await Run.update({ status, finishedAt: new Date() }, { where: { id } });
    return id;
  };
  const quiet = { config: t.config, logger: pino({ level: 'silent' }), mailer: { send: async (): Promise<void> => {} } };
  const finished = async (): Promise<number> => {
    const id = await run('queued');
    await executeRunNow(t.sequelize, quiet, id);
    return id;
  };
  const runIds: [number, number] = [await finished(), await finished()];
  // The owner started the runs, so the owner was told of their end.
  const notice = await Notice.findOne({ where: { userId: people.owner.id } });
  if (!notice) throw new Error('the owner got no notice of the finished runs');

  const invitation = async (to: Team, address: string): Promise<{ id: number; token: string }> => {
    const { token, tokenHash } = newLinkToken();
    const { id } = await Invitation.create({ teamId: to.id, email: address, role: 'viewer', tokenHash, invitedBy: people.owner.id, expiresAt: new Date(Date.now() + 3_600_000) });
    return { id, token };
  };
  const sessionsOf = new Map<Client, User>((['owner', 'editor', 'viewer', 'outsider'] as const).map((who) => [as[who], people[who]]));
  let address = 0;

  return {
    ...f,
    areaId,
    scenarioId,
    surveyId: await survey(),
    runIds,
    noticeId: notice.id,
    invitationToken: (await invitation(team, email())).token,
    neighbours: await makeTeam('Neighbours', [[await makeUser('Neighbour'), 'owner']]),
    fresh: {
      email,
      async member() {
        const user = await makeUser('Target');
        await Membership.create({ teamId: team.id, userId: user.id, role: 'viewer' });
        return user;
      },
      invitation,
      area: () => f.makeArea(FOUR),
      scenario,
      survey,
      run,
      async token(purpose) {
        const user = await makeUser('Token holder');
        const { token, tokenHash } = newLinkToken();
        await AccountToken.create({ userId: user.id, purpose, tokenHash, expiresAt: new Date(Date.now() + 3_600_000) });
        return token;
      },
    },
    async twin(c) {
      const twin = client(t.app);
      const person = sessionsOf.get(c);
      if (person) await twin.signIn(person.email, PASSWORD);
      return twin;
    },
    async postFromOwnAddress(c, url, body) {
      // TEST-NET-2 addresses; the app trusts X-Forwarded-For from loopback.
      return c.agent.post(url).set('x-csrf-token', await c.refreshCsrf()).set('x-forwarded-for', `198.51.100.${++address}`).send(body);
    },
    async endActiveRuns() {
      await Run.update({ status: 'cancelled', finishedAt: new Date() }, { where: { status: { [Op.in]: [...ACTIVE_RUN_STATUSES] } } });
    },
  };
}
