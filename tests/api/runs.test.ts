// Runs through the API: roles on every route, validation and limits, a run from queued to
// succeeded through the embedded worker with results byte-identical to the in-process engine
// for 1 and 3 shards per replicate, the notification mail and notice, and the frames route.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { createLogger } from '../../server/logger';
import { Run, RunInput, RunResultRow, type Team, type User } from '../../server/models';
import { startRunWorker, type RunWorker } from '../../server/jobs/worker';
import { loadJobSettings } from '../../server/jobs/settings';
import { canonicalJson, float32s, kernelSpecOf, uint8s } from '../../server/services/runs-inputs';
import { quantile } from '../../server/services/runs-summary';
import { checkRunSize } from '../../server/services/runs';
import { simulateRun, type RunResult } from '../../shared/markov';
import type { Run as RunView } from '../../shared/schemas';

jest.setTimeout(60_000);

type Who = 'owner' | 'editor' | 'viewer' | 'outsider' | 'anonymous';
let t: TestApp;
let team: Team;
let people: Record<Exclude<Who, 'anonymous'>, User>;
const as = {} as Record<Who, Client>;
let studyAreaId: number;
let scenarioId: number;
let worker: RunWorker | null = null;

const cinderFlat = readFileSync(path.resolve(__dirname, '../../server/seed/boundaries/cinder-flat.geojson'));
const states = [
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'PG', name: 'Perennial grassland', colour: '#009E73' },
  { code: 'AG', name: 'Annual grassland', colour: '#56B4E9' },
];
const MATRIX = [
  [0.9, 0.07, 0.03],
  [0.05, 0.85, 0.1],
  [0.02, 0.18, 0.8],
];

function startWorker(concurrency: number): Promise<RunWorker> {
  const logger = createLogger(t.config);
  return startRunWorker({ config: t.config, logger, mailer: t.mailer }, { ...loadJobSettings(), concurrency, pollSeconds: 0.5 });
}

async function waitForRun(id: number, until: (run: RunView) => boolean): Promise<RunView> {
  for (let i = 0; i < 200; i++) {
    const run = (await as.viewer.get(`/api/v1/runs/${id}`)).body.run as RunView;
    if (until(run)) return run;
    await new Promise((r) => setTimeout(r, 100));
  }
  throw new Error(`run ${id} did not get there`);
}

/** The in-process engine on the run's own frozen inputs. */
async function reference(runId: number): Promise<RunResult> {
  const run = (await Run.findByPk(runId))!;
  const row = (await RunInput.findByPk(runId))!;
  const frozen = { spec: row.spec, areas: float32s(row.patchAreas), startStates: uint8s(row.startStates) };
  return simulateRun(kernelSpecOf(frozen, { steps: run.steps, replicates: run.replicates, seed: run.seed, shownReplicate: run.shownReplicate }));
}

const bytes = (a: ArrayBufferView): Buffer => Buffer.from(a.buffer, a.byteOffset, a.byteLength);

/** GET /runs/:id/frames/:step as raw bytes. */
async function frame(runId: number, step: number): Promise<Buffer> {
  const res = await as.viewer.get(`/api/v1/runs/${runId}/frames/${step}`).buffer(true).parse((response, done) => {
    const chunks: Buffer[] = [];
    response.on('data', (c: Buffer) => chunks.push(c));
    response.on('end', () => done(null, Buffer.concat(chunks)));
  });
  expect(res.status).toBe(200);
  return res.body as Buffer;
}

beforeAll(async () => {
  t = await startTestApp();
  people = { owner: await makeUser('Owner'), editor: await makeUser('Editor'), viewer: await makeUser('Viewer'), outsider: await makeUser('Outsider') };
  team = await makeTeam('Run Team', [[people.owner, 'owner'], [people.editor, 'editor'], [people.viewer, 'viewer']]);
  for (const [role, user] of Object.entries(people)) {
    as[role as Who] = client(t.app);
    await as[role as Who].signIn(user.email, PASSWORD);
  }
  as.anonymous = client(t.app);
  // 50 m cells: about 14,000 patches, four 4,096-patch blocks, so a replicate can be split in three.
  const token = await as.editor.refreshCsrf();
  const created = await as.editor.agent
    .post(`/api/v1/teams/${team.id}/study-areas`)
    .set('x-csrf-token', token)
    .attach('file', cinderFlat, 'cinder-flat.geojson')
    .field('name', 'Run area')
    .field('cellSize', '50')
    .field('states', JSON.stringify(states));
  studyAreaId = created.body.studyArea.id;
  expect(created.body.studyArea.patchCount).toBeGreaterThan(3 * 4096);
  expect((await as.editor.put(`/api/v1/study-areas/${studyAreaId}/start-cover`, { method: 'exact', proportions: [0.5, 0.3, 0.2], seed: 'start' })).status).toBe(200);
  const scenario = await as.editor.post(`/api/v1/study-areas/${studyAreaId}/scenarios`, { name: 'Grazing as is', yearsPerStep: 2, phases: [{ fromStep: 0, toStep: null, matrix: MATRIX }] });
  expect(scenario.status).toBe(201);
  scenarioId = scenario.body.scenario.id;
});

afterAll(async () => {
  await worker?.stop();
  await t.close();
});

const start = (who: Who, body: object = { steps: 20, replicates: 3 }) => as[who].post(`/api/v1/scenarios/${scenarioId}/runs`, body);

describe('building blocks', () => {
  test('when quantiles of 1, 2, 3, 4 are taken, then they follow Hyndman & Fan type 7 (as R quantile(type = 7): 1.15, 2.5, 3.85)', () => {
    expect([0.05, 0.5, 0.95].map((p) => quantile([1, 2, 3, 4], p))).toEqual([1.15, 2.5, expect.closeTo(3.85, 12)]);
    expect(quantile([7], 0.95)).toBe(7);
  });

  test('when the same inputs are written with keys in another order, then their canonical JSON (and so the fingerprint) is the same', () => {
    expect(canonicalJson({ b: [1, { d: 2, c: 'x' }], a: null })).toBe(canonicalJson({ a: null, b: [1, { c: 'x', d: 2 }] }));
    expect(canonicalJson({ b: [1, { d: 2, c: 'x' }], a: null })).toBe('{"a":null,"b":[1,{"c":"x","d":2}]}');
  });
});

describe('validation', () => {
  test.each([
    [{ steps: 0, replicates: 1 }, /steps must be at least 1/],
    [{ steps: 1001, replicates: 1 }, /steps must be at most 1,000/],
    [{ steps: 10, replicates: 501 }, /replicates must be at most 500/],
    [{ steps: 10.5, replicates: 1 }, /steps must be a whole number/],
    [{ steps: 10, replicates: 2, yearsPerStep: 0 }, /yearsPerStep must be more than 0/],
    [{ steps: 1000, replicates: 500 }, /patch-steps, more than the 5,000,000,000 allowed: use at most \d+ replicates at 1,000 steps/],
  ])('when the body is %j, then 400 says %s and nothing is saved', async (body, message) => {
    const res = await start('editor', body);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(message);
    expect(await Run.count()).toBe(0);
  });

  test('when the shown replicate would need more than 256 MB of maps, then the message names the steps that fit', () => {
    expect(() => checkRunSize(300_000, 1000, 1)).toThrow(/would take 286 MB .* use at most 893 steps, or a coarser cell size/);
  });
});

describe('roles and lifecycle while no worker runs', () => {
  let ownerRun: RunView;

  test('when each role starts a run, then owner and editor get 201 with the seed, viewer 403, outsider 404, anonymous 401', async () => {
    const owner = await start('owner', { steps: 20, replicates: 3, seed: 'chosen-seed' });
    expect(owner.status).toBe(201);
    ownerRun = owner.body.run;
    expect(ownerRun).toMatchObject({ status: 'queued', seed: 'chosen-seed', yearsPerStep: 2, steps: 20, replicates: 3, progress: { percent: 0 } });
    expect(ownerRun.fingerprint).toMatch(/^[0-9a-f]{64}$/);
    expect(ownerRun.caution).toMatch(/not predictions/);
    const editor = await start('editor');
    expect(editor.status).toBe(201);
    expect(editor.body.run.seed).toMatch(/^[0-9a-f]{16}$/);
    expect((await start('viewer')).status).toBe(403);
    expect((await start('outsider')).status).toBe(404);
    expect((await start('anonymous')).status).toBe(401);
  });

  test('when the same inputs and seed are started again, then the fingerprint is the same; another seed changes it', async () => {
    const again = (await start('owner', { steps: 20, replicates: 3, seed: 'chosen-seed' })).body.run as RunView;
    expect(again.fingerprint).toBe(ownerRun.fingerprint);
    await as.owner.post(`/api/v1/runs/${again.id}/cancel`);
    const other = (await start('owner', { steps: 20, replicates: 3, seed: 'other' })).body.run as RunView;
    expect(other.fingerprint).not.toBe(ownerRun.fingerprint);
    await as.owner.post(`/api/v1/runs/${other.id}/cancel`);
  });

  test('when the team has 3 active runs, then a fourth gets 429 with a message', async () => {
    expect((await start('editor')).status).toBe(201);
    const fourth = await start('editor');
    expect(fourth.status).toBe(429);
    expect(fourth.body.error.message).toMatch(/already has 3 runs queued or running .* cancel one/);
  });

  test('when runs are read, then members see them and the list, an outsider gets 404 and anonymous 401', async () => {
    for (const who of ['owner', 'editor', 'viewer'] as const) {
      expect((await as[who].get(`/api/v1/runs/${ownerRun.id}`)).status).toBe(200);
      const list = await as[who].get(`/api/v1/study-areas/${studyAreaId}/runs`);
      expect(list.body.runs.length).toBe(5);
      expect(list.body.runs[0]).toMatchObject({ createdBy: expect.any(String), inputs: { scenarioName: 'Grazing as is', patchCount: expect.any(Number) } });
    }
    expect((await as.outsider.get(`/api/v1/runs/${ownerRun.id}`)).status).toBe(404);
    expect((await as.outsider.get(`/api/v1/study-areas/${studyAreaId}/runs`)).status).toBe(404);
    expect((await as.anonymous.get(`/api/v1/runs/${ownerRun.id}`)).status).toBe(401);
    expect((await as.viewer.get(`/api/v1/runs/999999`)).status).toBe(404);
  });

  test('when runs are cancelled, then viewer 403, outsider 404, anonymous 401, editor and owner 200; cancelling again is 409', async () => {
    expect((await as.viewer.post(`/api/v1/runs/${ownerRun.id}/cancel`)).status).toBe(403);
    expect((await as.outsider.post(`/api/v1/runs/${ownerRun.id}/cancel`)).status).toBe(404);
    expect((await as.anonymous.post(`/api/v1/runs/${ownerRun.id}/cancel`)).status).toBe(401);
    const cancelled = await as.editor.post(`/api/v1/runs/${ownerRun.id}/cancel`);
    expect(cancelled.body.run.status).toBe('cancelled');
    const again = await as.owner.post(`/api/v1/runs/${ownerRun.id}/cancel`);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already ended \(cancelled\)/);
    for (const run of (await as.owner.get(`/api/v1/study-areas/${studyAreaId}/runs`)).body.runs as RunView[]) {
      if (run.status === 'queued') expect((await as.owner.post(`/api/v1/runs/${run.id}/cancel`)).status).toBe(200);
    }
  });

  test('when results of an unfinished run are asked for, then 409 says why', async () => {
    const res = await as.viewer.get(`/api/v1/runs/${ownerRun.id}/summary`);
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/no results: it was cancelled/);
  });

  test('when a cancelled run is retried, then viewer 403, outsider 404, anonymous 401; the owner gets the same inputs queued again as attempt 2', async () => {
    expect((await as.viewer.post(`/api/v1/runs/${ownerRun.id}/retry`)).status).toBe(403);
    expect((await as.outsider.post(`/api/v1/runs/${ownerRun.id}/retry`)).status).toBe(404);
    expect((await as.anonymous.post(`/api/v1/runs/${ownerRun.id}/retry`)).status).toBe(401);
    const retried = await as.owner.post(`/api/v1/runs/${ownerRun.id}/retry`);
    expect(retried.status).toBe(200);
    expect(retried.body.run).toMatchObject({ status: 'queued', attempt: 2, fingerprint: ownerRun.fingerprint, seed: 'chosen-seed' });
    expect((await as.owner.post(`/api/v1/runs/${ownerRun.id}/retry`)).status).toBe(409);
  });

  describe('through the embedded worker', () => {
    let broken: RunView;
    beforeAll(async () => {
      // A run whose frozen start cover lost a patch: the kernel refuses it.
      broken = (await start('editor', { steps: 5, replicates: 1 })).body.run;
      const inputs = (await RunInput.findByPk(broken.id))!;
      await inputs.update({ startStates: inputs.startStates.subarray(1) });
      worker = await startWorker(1);
    });

    test('when a shard cannot be simulated, then the run fails with the reason and the starter is told', async () => {
      const failed = await waitForRun(broken.id, (r) => r.status === 'failed');
      expect(failed.error).toMatch(/Shard 1 of 1 could not be simulated: .*start states for \d+ patches/);
      expect(failed.finishedAt).not.toBeNull();
      const mail = await t.mailTo(people.editor.email, `Run ${broken.id} of "Grazing as is" failed`);
      expect(mail.text).toMatch(/failed: Shard 1 of 1/);
    });

    test('when the worker takes the queued run, then it succeeds with area totals, counts and maps byte-identical to simulateRun', async () => {
      const done = await waitForRun(ownerRun.id, (r) => r.status === 'succeeded');
      expect(done.progress).toMatchObject({ percent: 100, shardsDone: 3, shardCount: 3, secondsLeft: null });
      const expected = await reference(ownerRun.id);
      const stored = (await RunResultRow.findByPk(ownerRun.id))!;
      expect(Buffer.compare(stored.area, bytes(expected.areaTotals))).toBe(0);
      expect(Buffer.compare(stored.counts, bytes(expected.counts))).toBe(0);
      const n = done.inputs.patchCount;
      for (const step of [0, 1, 15, 16, 20]) {
        const res = await as.viewer.get(`/api/v1/runs/${ownerRun.id}/frames/${step}`);
        expect(res.headers['content-type']).toBe('application/octet-stream');
        expect(Buffer.compare(await frame(ownerRun.id, step), bytes(expected.history!.subarray(step * n, (step + 1) * n)))).toBe(0);
      }
    });

    test('when the run has finished, then the starter gets an e-mail with a link and an in-app notice', async () => {
      const mail = await t.mailTo(people.owner.email, `Run ${ownerRun.id} of "Grazing as is" finished`);
      expect(mail.text).toContain(`http://patchcast.test/study-areas/${studyAreaId}/runs/${ownerRun.id}`);
      const notices = (await as.owner.get('/api/v1/notices')).body;
      expect(notices.unread).toBe(1);
      expect(notices.notices[0]).toMatchObject({ runId: ownerRun.id, link: `/study-areas/${studyAreaId}/runs/${ownerRun.id}`, readAt: null });
      const read = await as.owner.post(`/api/v1/notices/${notices.notices[0].id}/read`);
      expect(read.body.notice.readAt).not.toBeNull();
      expect((await as.viewer.post(`/api/v1/notices/${notices.notices[0].id}/read`)).status).toBe(404);
      expect((await as.anonymous.get('/api/v1/notices')).status).toBe(401);
    });

    test('when the summary is read, then members get mean, median, 5 % and 95 % per step and state beside the expected path; outsiders 404', async () => {
      const res = await as.viewer.get(`/api/v1/runs/${ownerRun.id}/summary`);
      expect(res.status).toBe(200);
      const summary = res.body;
      expect(summary.share).toHaveLength(21);
      expect(summary.expectedShare[0].reduce((a: number, b: number) => a + b, 0)).toBeCloseTo(1, 12);
      const meanShares = summary.share[20].map((q: { mean: number }) => q.mean);
      expect(meanShares.reduce((a: number, b: number) => a + b, 0)).toBeCloseTo(1, 12);
      for (const q of summary.area[20]) expect([q.p5 <= q.median, q.median <= q.p95]).toEqual([true, true]);
      // Three replicates of ~14,000 patches: the mean share is close to the expected path.
      summary.share[20].forEach((q: { mean: number }, j: number) => expect(Math.abs(q.mean - summary.expectedShare[20][j])).toBeLessThan(0.02));
      expect(summary.method).toMatch(/Hyndman & Fan 1996, type 7/);
      expect((await as.outsider.get(`/api/v1/runs/${ownerRun.id}/summary`)).status).toBe(404);
      expect((await as.outsider.get(`/api/v1/runs/${ownerRun.id}/frames/0`)).status).toBe(404);
      expect((await as.anonymous.get(`/api/v1/runs/${ownerRun.id}/frames/0`)).status).toBe(401);
      const late = await as.viewer.get(`/api/v1/runs/${ownerRun.id}/frames/21`);
      expect(late.status).toBe(400);
      expect(late.body.error.message).toMatch(/between 0 and 20/);
    });

    test('when a browser offers gzip, then the summary comes gzipped and unpacks to the same JSON as the plain answer', async () => {
      const url = `/api/v1/runs/${ownerRun.id}/summary`;
      const raw = (accept: string) => as.viewer.agent.get(url).set('accept-encoding', accept).buffer(true).parse((response, done) => {
        const chunks: Buffer[] = [];
        response.on('data', (c: Buffer) => chunks.push(c));
        response.on('end', () => done(null, Buffer.concat(chunks)));
      });
      const plain = await raw('identity');
      const packed = await raw('gzip, deflate, br');
      expect(plain.headers['content-encoding']).toBeUndefined();
      expect(packed.headers['content-encoding']).toBe('gzip');
      expect(packed.headers.vary).toMatch(/accept-encoding/i);
      expect(packed.headers.etag).not.toBe(plain.headers.etag);
      // superagent unpacks gzip (RFC 1952) with Node's zlib before the body reaches the test.
      expect((packed.body as Buffer).equals(plain.body as Buffer)).toBe(true);
      expect(Number(packed.headers['content-length'])).toBeLessThan(Number(plain.headers['content-length']) / 2);
    });

    test('when a member who has just read a run is removed from the team, then their next read is refused', async () => {
      const leaver = await makeUser('Leaver');
      await team.sequelize.models.Membership.create({ teamId: team.id, userId: leaver.id, role: 'viewer' });
      const c = client(t.app);
      await c.signIn(leaver.email, PASSWORD);
      expect((await c.get(`/api/v1/runs/${ownerRun.id}/frames/0`)).status).toBe(200);
      expect((await as.owner.delete(`/api/v1/teams/${team.id}/members/${leaver.id}`)).status).toBe(204);
      expect((await c.get(`/api/v1/runs/${ownerRun.id}/frames/0`)).status).toBe(404);
      expect((await c.get(`/api/v1/runs/${ownerRun.id}/summary`)).status).toBe(404);
    });

    test('when a run is split into 3 shards per replicate over 3 worker threads, then its results are the same bytes as the 1-shard run and simulateRun', async () => {
      await worker!.stop();
      process.env.PATCHCAST_SHARD_PATCH_STEPS = '100000';
      try {
        worker = await startWorker(3);
        const split = (await start('editor', { steps: 20, replicates: 3, seed: 'chosen-seed' })).body.run as RunView;
        expect(split.fingerprint).toBe(ownerRun.fingerprint);
        const done = await waitForRun(split.id, (r) => r.status === 'succeeded');
        expect(done.progress.shardCount).toBe(9);
        const [one, three] = [(await RunResultRow.findByPk(ownerRun.id))!, (await RunResultRow.findByPk(split.id))!];
        expect(Buffer.compare(three.area, one.area)).toBe(0);
        expect(Buffer.compare(three.counts, one.counts)).toBe(0);
        expect(Buffer.compare(three.area, bytes((await reference(split.id)).areaTotals))).toBe(0);
        expect(Buffer.compare(await frame(split.id, 17), await frame(ownerRun.id, 17))).toBe(0);
        const mail = await t.mailTo(people.editor.email, `Run ${split.id} of`);
        expect(mail.subject).toMatch(/finished/);
      } finally {
        delete process.env.PATCHCAST_SHARD_PATCH_STEPS;
      }
    });
  });
});
