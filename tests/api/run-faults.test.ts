// Faults: a worker process killed with SIGKILL while it holds a shard. pg-boss expires the
// shard's job and another worker takes it again; the run completes with results byte-identical
// to the in-process engine, and no shard is stored twice or half. Also: the web side going away
// mid-run leaves the run going.
import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { recordReliability } from '../support/reliability-log';
import { startTestApp, type TestApp } from '../support/test-app';
import { createApp } from '../../server/app';
import { createLogger } from '../../server/logger';
import { Run, RunFrame, RunInput, RunResultRow } from '../../server/models';
import { float32s, kernelSpecOf, uint8s } from '../../server/services/runs-inputs';
import { simulateRun } from '../../shared/markov';
import type { Run as RunView } from '../../shared/schemas';

jest.setTimeout(90_000);

const repoRoot = path.resolve(__dirname, '../..');
/** Job settings of this file: short shard expiry, fast maintenance, slow shards (each holds its job 1.5 s), 3 shards per replicate. */
const jobEnv = {
  PATCHCAST_SHARD_EXPIRY_SECONDS: '3',
  PATCHCAST_JOB_MAINTENANCE_SECONDS: '1',
  PATCHCAST_JOB_POLL_SECONDS: '0.5',
  PATCHCAST_TEST_SHARD_DELAY_MS: '1500',
  PATCHCAST_SHARD_PATCH_STEPS: '100000',
};
const savedEnv = Object.fromEntries(Object.keys(jobEnv).map((k) => [k, process.env[k]]));

let t: TestApp;
let editor: Client;
let scenarioId: number;
const children: ChildProcess[] = [];

/** `npm run worker` against the test database; resolves once it has started. */
function startWorkerProcess(): Promise<ChildProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/worker.ts'], {
    cwd: repoRoot,
    env: { ...process.env, ...jobEnv, NODE_ENV: 'development', DATABASE_URL: t.config.databaseUrl, SMTP_URL: t.config.smtpUrl, APP_URL: t.config.appUrl },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  children.push(child);
  return new Promise((resolve, reject) => {
    child.stdout!.on('data', (chunk: Buffer) => {
      if (chunk.toString().includes('run worker started')) resolve(child);
    });
    child.on('exit', (code) => reject(new Error(`worker exited with ${code}`)));
  });
}

const query = async <T>(sql: string, bind: unknown[] = []): Promise<T[]> => (await t.sequelize.query(sql, { bind, type: 'SELECT' })) as T[];

async function waitFor<T>(what: string, probe: () => Promise<T | null>, timeoutMs = 60_000): Promise<T> {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    const found = await probe();
    if (found !== null) return found;
    await new Promise((r) => setTimeout(r, 50));
  }
  throw new Error(`timed out waiting for ${what}`);
}

/** What differs between the stored results of a run and the in-process engine's; empty when byte-identical. */
async function differencesFromEngine(runId: number): Promise<string[]> {
  const run = (await Run.findByPk(runId))!;
  const row = (await RunInput.findByPk(runId))!;
  const frozen = { spec: row.spec, areas: float32s(row.patchAreas), startStates: uint8s(row.startStates) };
  const expected = simulateRun(kernelSpecOf(frozen, { steps: run.steps, replicates: run.replicates, seed: run.seed, shownReplicate: run.shownReplicate }));
  const stored = await RunResultRow.findByPk(runId);
  if (!stored) return ['no stored results'];
  const differences: string[] = [];
  if (Buffer.compare(stored.area, Buffer.from(expected.areaTotals.buffer)) !== 0) differences.push('area totals');
  if (Buffer.compare(stored.counts, Buffer.from(expected.counts.buffer)) !== 0) differences.push('patch counts');
  const chunks = await RunFrame.count({ where: { runId } });
  if (chunks !== Math.ceil((run.steps + 1) / 16)) differences.push(`${chunks} frame chunks`);
  const n = frozen.spec.patchCount;
  for (const step of [0, 9, run.steps]) {
    const res = await editor.get(`/api/v1/runs/${runId}/frames/${step}`).buffer(true).parse((response, done) => {
      const chunks: Buffer[] = [];
      response.on('data', (c: Buffer) => chunks.push(c));
      response.on('end', () => done(null, Buffer.concat(chunks)));
    });
    if (Buffer.compare(res.body as Buffer, Buffer.from(expected.history!.subarray(step * n, (step + 1) * n))) !== 0) differences.push(`map of step ${step}`);
  }
  return differences;
}

beforeAll(async () => {
  Object.assign(process.env, jobEnv);
  t = await startTestApp();
  const person = await makeUser('Editor');
  const team = await makeTeam('Fault Team', [[person, 'editor']]);
  editor = client(t.app);
  await editor.signIn(person.email, PASSWORD);
  const token = await editor.refreshCsrf();
  const created = await editor.agent
    .post(`/api/v1/teams/${team.id}/study-areas`)
    .set('x-csrf-token', token)
    .attach('file', readFileSync(path.join(repoRoot, 'server/seed/boundaries/cinder-flat.geojson')), 'cinder-flat.geojson')
    .field('name', 'Fault area')
    .field('cellSize', '50')
    .field('states', JSON.stringify([{ code: 'A', name: 'Shrub', colour: '#E69F00' }, { code: 'B', name: 'Grass', colour: '#009E73' }]));
  const studyAreaId = created.body.studyArea.id;
  await editor.put(`/api/v1/study-areas/${studyAreaId}/start-cover`, { method: 'random', proportions: [0.6, 0.4], seed: 'faults' });
  const scenario = await editor.post(`/api/v1/study-areas/${studyAreaId}/scenarios`, { name: 'Two states', phases: [{ fromStep: 0, toStep: null, matrix: [[0.8, 0.2], [0.3, 0.7]] }] });
  scenarioId = scenario.body.scenario.id;
});

afterAll(async () => {
  const running = children.filter((child) => child.exitCode === null && child.signalCode === null);
  await Promise.all(running.map((child) => new Promise((r) => child.on('exit', r).kill('SIGTERM'))));
  await t.close();
  for (const [k, v] of Object.entries(savedEnv)) {
    if (v === undefined) delete process.env[k];
    else process.env[k] = v;
  }
});

test('when a worker is killed with SIGKILL while it holds a shard, then the shard is taken again and the run completes with identical results and no duplicate rows', async () => {
  const doomed = await startWorkerProcess();
  const run = (await editor.post(`/api/v1/scenarios/${scenarioId}/runs`, { steps: 20, replicates: 2, seed: 'kill-me' })).body.run as RunView;
  expect(run.progress.shardCount).toBe(6);

  const held = await waitFor('an active shard job', async () => {
    const rows = await query<{ id: string; shard: number }>(`SELECT id, (data->>'shardIndex')::int AS shard FROM pgboss.job WHERE name = 'run-shard' AND state = 'active' AND (data->>'runId')::int = $1`, [run.id]);
    return rows[0] ?? null;
  });
  doomed.kill('SIGKILL');
  await new Promise((r) => doomed.on('exit', r));
  // Killed during its shard's work: nothing of that shard was stored.
  expect(await query(`SELECT 1 FROM run_shards WHERE run_id = $1 AND shard_index = $2`, [run.id, held.shard])).toHaveLength(0);

  await Promise.all([startWorkerProcess(), startWorkerProcess()]);
  const done = await waitFor('the run to succeed', async () => {
    const r = (await editor.get(`/api/v1/runs/${run.id}`)).body.run as RunView;
    return r.status === 'succeeded' || r.status === 'failed' ? r : null;
  });
  const [retried] = await query<{ retry_count: number; state: string }>(`SELECT retry_count, state FROM pgboss.job WHERE id = $1`, [held.id]);
  const differences = await differencesFromEngine(run.id);
  const resultRows = await RunResultRow.count({ where: { runId: run.id } });
  const leftoverShards = await query('SELECT 1 FROM run_shards WHERE run_id = $1', [run.id]);
  recordReliability({
    kind: 'fault',
    name: 'worker killed (SIGKILL) mid-shard',
    injected: 1,
    survived: done.status === 'succeeded',
    nothingLost: differences.length === 0 && resultRows === 1 && leftoverShards.length === 0,
    detail: `shard job retried ${retried.retry_count}×; results ${differences.length === 0 ? 'byte-identical to the engine' : `differ: ${differences.join(', ')}`}`,
  });
  expect(done).toMatchObject({ status: 'succeeded', progress: { shardsDone: 6, shardCount: 6, percent: 100 } });
  expect(retried).toMatchObject({ state: 'completed' });
  expect(retried.retry_count).toBeGreaterThanOrEqual(1);
  expect(differences).toEqual([]);
  expect(resultRows).toBe(1);
  expect(leftoverShards).toHaveLength(0);
});

test('when the web side that started a run shuts down mid-run, then the workers finish it', async () => {
  const logger = createLogger(t.config);
  const web = createApp({ config: t.config, sequelize: t.sequelize, mailer: t.mailer, logger });
  const other = client(web.app);
  const [person] = await query<{ email: string }>(`SELECT u.email FROM users u JOIN memberships m ON m.user_id = u.id WHERE m.role = 'editor'`);
  await other.signIn(person.email, PASSWORD);
  const run = (await other.post(`/api/v1/scenarios/${scenarioId}/runs`, { steps: 20, replicates: 1, seed: 'restart' })).body.run as RunView;
  await web.close();
  const done = await waitFor('the run to succeed', async () => {
    const r = (await editor.get(`/api/v1/runs/${run.id}`)).body.run as RunView;
    return r.status === 'succeeded' ? r : null;
  });
  expect(done.progress.percent).toBe(100);
  expect(await differencesFromEngine(run.id)).toEqual([]);
});
