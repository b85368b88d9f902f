// A run from queued to stored through pg-boss (100,000 patches × 200 steps × 20 replicates, K = 5)
// with two worker threads, beside the bare kernel on the same work in this invocation: simulateRun
// on one thread and simulateRunParallel on two. Uses its own database on the local cluster.
import { randomBytes } from 'node:crypto';
import pg from 'pg';
import { connectDatabase } from '../../server/db';
import { migrateUp } from '../../server/migrate';
import { loadConfig } from '../../server/config';
import { createLogger } from '../../server/logger';
import { createMailer } from '../../server/mail/mailer';
import { CoverStateRow, Membership, Run, RunInput, Scenario, ScenarioPhaseRow, StartCover, StudyArea, Team, User } from '../../server/models';
import { startRunWorker } from '../../server/jobs/worker';
import { createRunQueue } from '../../server/jobs/run-queue';
import { loadJobSettings } from '../../server/jobs/settings';
import { ensureDatabase, ensureLocalCluster } from '../../server/scripts/postgres';
import { startRun } from '../../server/services/runs';
import { runFrame } from '../../server/services/runs-results';
import { float32s, kernelSpecOf, uint8s } from '../../server/services/runs-inputs';
import { simulateRun } from '../../shared/markov/run';
import { simulateRunParallel } from '../../server/engine/parallel';
import { DEFAULT_STATE_COLOURS } from '../../shared/schemas';
import { BENCH_ROWS, BENCH_STATES } from './kernelSetup';

const N = 100_000;
const LARGE_N = 250_000;
const LARGE_STEPS = 50;
const STEPS = 200;
const REPLICATES = 20;
const WORKERS = 2;

const line = (text: string): void => {
  process.stdout.write(`${text}\n`);
};
const seconds = (ms: number): string => `${(ms / 1000).toFixed(2)} s`;
const mb = (bytes: number): string => `${(bytes / 2 ** 20).toFixed(0)} MB`;

async function dropDatabase(adminUrl: string, name: string): Promise<void> {
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  await admin.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
  await admin.end();
}

/** The bench's owner and team. */
async function seedOwner(): Promise<{ user: User; team: Team }> {
  const user = await User.create({ email: 'bench@example.org', name: 'Bench', passwordHash: 'x', emailVerifiedAt: new Date(), isAdmin: false });
  const team = await Team.create({ name: 'Bench' });
  await Membership.create({ teamId: team.id, userId: user.id, role: 'owner' });
  return { user, team };
}

/** A study area of `patches` square patches (900 m² each, every 7th clipped), a start cover and a one-phase scenario. */
async function seedInputs({ user, team }: { user: User; team: Team }, patches: number): Promise<number> {
  const areas = new Float32Array(patches).map((_, i) => (i % 7 === 0 ? 450 : 900));
  const cells = new Int32Array(patches).map((_, i) => i);
  const side = Math.ceil(Math.sqrt(patches));
  const studyArea = await StudyArea.create({
    teamId: team.id,
    name: 'Bench area',
    sourceName: 'bench',
    sourceFormat: 'geojson',
    sourceSha256: '0',
    sourceBytes: Buffer.from('{}'),
    sourceSize: 2,
    boundary: { parts: [], format: 'geojson', sourceCrs: 'EPSG:4326', vertexCount: 0 } as unknown as StudyArea['boundary'],
    boundaryAreaM2: 0,
    cellSizeM: 30,
    minFraction: 0,
    gridSpec: { projection: 'bench', originX: 0, originY: 0, cellSize: 30, rows: side, cols: side },
    patchCount: patches,
    patchCells: Buffer.from(cells.buffer),
    patchAreas: Buffer.from(areas.buffer),
    totalAreaM2: areas.reduce((a, b) => a + b, 0),
    createdBy: user.id,
  });
  const codes = BENCH_STATES.map((_, i) => `S${i}`);
  await CoverStateRow.bulkCreate(BENCH_STATES.map((name, position) => ({ studyAreaId: studyArea.id, position, code: codes[position], name, colour: DEFAULT_STATE_COLOURS[position] })));
  await StartCover.create({ studyAreaId: studyArea.id, method: 'random', proportions: [0.2, 0.2, 0.2, 0.2, 0.2], seed: 'bench', states: Buffer.from(new Uint8Array(patches).map((_, i) => i % 5)), mapping: null, sourceName: null, sourceSha256: null });
  const scenario = await Scenario.create({ studyAreaId: studyArea.id, name: 'Bench chain', yearsPerStep: 1, startCover: { source: 'study-area' }, stateCodes: codes, createdBy: user.id, updatedBy: user.id });
  await ScenarioPhaseRow.create({ scenarioId: scenario.id, position: 0, fromStep: 0, toStep: null, matrix: BENCH_ROWS, surveyId: null });
  return scenario.id;
}

/** Waits until the run has ended; returns its final status. */
async function waitForRun(runId: number): Promise<string> {
  let status = (await Run.findByPk(runId))!.status;
  while (status !== 'succeeded' && status !== 'failed') {
    await new Promise((r) => setTimeout(r, 20));
    status = (await Run.findByPk(runId))!.status;
  }
  return status;
}

/** The map of a step as the frames route reads it (one chunk from the database, inflated, sliced): the slowest of the given steps, ms. */
async function slowestFrameMs(runId: number, steps: readonly number[]): Promise<number> {
  const stored = (await Run.findByPk(runId))!;
  let slowest = 0;
  for (const step of steps) {
    const t = performance.now();
    await runFrame({ run: stored, role: 'viewer' }, step);
    slowest = Math.max(slowest, performance.now() - t);
  }
  return slowest;
}

export async function bench(): Promise<void> {
  const cluster = process.env.DATABASE_URL ? null : ensureLocalCluster();
  const name = `patchcast_bench_${randomBytes(4).toString('hex')}`;
  const adminUrl = process.env.DATABASE_URL ?? cluster!.adminUrl('postgres');
  const databaseUrl = Object.assign(new URL(adminUrl), { pathname: `/${name}` }).toString();
  await ensureDatabase(databaseUrl);
  // Nothing listens on port 9: the run's notification mail stays queued, and the database goes at the end.
  const config = { ...loadConfig({ NODE_ENV: 'test' }), databaseUrl, smtpUrl: 'smtp://127.0.0.1:9' };
  const logger = createLogger(config);
  const sequelize = connectDatabase(databaseUrl);
  try {
    await migrateUp(sequelize);
    const owner = await seedOwner();
    const { user } = owner;
    const scenarioId = await seedInputs(owner, N);
    const largeScenarioId = await seedInputs(owner, LARGE_N);
    const mailer = createMailer(config, sequelize, logger);
    const worker = await startRunWorker({ config, mailer, logger }, { ...loadJobSettings(), concurrency: WORKERS });
    const queue = createRunQueue(databaseUrl, logger);
    // Warm-up: pg-boss schema, worker threads, the kernel's first compilation.
    const warm = await startRun({ sequelize }, queue, user, scenarioId, { steps: 5, replicates: 2 });
    while ((await Run.findByPk(warm.id))!.status !== 'succeeded') await new Promise((r) => setTimeout(r, 20));

    const rssBefore = process.memoryUsage().rss;
    const started = performance.now();
    const run = await startRun({ sequelize }, queue, user, scenarioId, { steps: STEPS, replicates: REPLICATES, seed: 'bench' });
    const status = await waitForRun(run.id);
    const endToEnd = performance.now() - started;
    const peakRss = process.resourceUsage().maxRSS * 1024;
    // A 250,000-patch run (the largest study area), for the map read only.
    const large = await startRun({ sequelize }, queue, user, largeScenarioId, { steps: LARGE_STEPS, replicates: 1, seed: 'bench-large' });
    await waitForRun(large.id);
    await queue.stop();
    await worker.stop();
    await mailer.stop();

    const stored = (await Run.findByPk(run.id))!;
    const slowestFrame = await slowestFrameMs(run.id, [0, 57, 131, 199, 200]);
    const slowestLargeFrame = await slowestFrameMs(large.id, [0, 17, 33, 49, 50]);
    const row = (await RunInput.findByPk(run.id))!;
    const spec = kernelSpecOf({ spec: row.spec, areas: float32s(row.patchAreas), startStates: uint8s(row.startStates) }, { steps: STEPS, replicates: REPLICATES, seed: 'bench', shownReplicate: 0 });
    let t0 = performance.now();
    simulateRun(spec);
    const kernelOne = performance.now() - t0;
    t0 = performance.now();
    await simulateRunParallel(spec, WORKERS);
    const kernelTwo = performance.now() - t0;

    line(`run pipeline: ${N.toLocaleString('en-US')} patches × ${STEPS} steps × ${REPLICATES} replicates, K = 5, ${stored.shardCount} shards, ${WORKERS} worker threads (${status})`);
    line(`  queued → stored (pg-boss, shards, merge, summary, maps)  ${seconds(endToEnd)}  (target ≤ 30 s)`);
    line(`  bare kernel, simulateRun on one thread                  ${seconds(kernelOne)}`);
    line(`  bare kernel, simulateRunParallel on ${WORKERS} threads            ${seconds(kernelTwo)}`);
    line(`  end-to-end / kernel on ${WORKERS} threads ${(endToEnd / kernelTwo).toFixed(2)} (target ≤ 1.5), / kernel on one thread ${(endToEnd / kernelOne).toFixed(2)}`);
    line(`  map of one step (frames route's read), slowest of 5 steps  ${slowestFrame.toFixed(0)} ms for ${N.toLocaleString('en-US')} patches, ${slowestLargeFrame.toFixed(0)} ms for ${LARGE_N.toLocaleString('en-US')} (target ≤ 300 ms at 250,000)`);
    line(`  peak RSS of this process during the run ${mb(peakRss)} (${mb(rssBefore)} before it; the shown replicate's maps are ${mb((STEPS + 1) * N)})`);
  } finally {
    await sequelize.close();
    await dropDatabase(adminUrl, name);
    cluster?.stop();
  }
}
