// Downloads of the demo's finished runs: the patch states of a step as RFC 7946 GeoJSON that GDAL
// reads back with the stored frame's values, the patch history, area-share and comparison tables,
// a phase's matrix and a survey's estimate as CSV; roles, file names and clear 4xx answers.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import * as GJV from 'geojson-validation';
import { client, type Client } from '../support/client';
import { makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { DEMO_PASSWORD, demoPeople, seedDemo } from '../../server/seed/demo';
import { parseCsv, parseMatrixCsv } from '../../shared/markov';
import { StartCover } from '../../server/models';
import type { Run } from '../../shared/schemas';

jest.setTimeout(120_000);

let t: TestApp;
let viewer: Client;
let editor: Client;
let outsider: Client;
let anonymous: Client;
let run: Run;
let otherRun: Run;
let heronRun: Run;
let studyAreaId: number;
let totalAreaM2: number;
let surveyId: number;
const work = mkdtempSync(path.join(tmpdir(), 'patchcast-downloads-'));
const api = (p: string): string => `/api/v1${p}`;

const demoClient = async (role: 'viewer' | 'editor'): Promise<Client> => {
  const c = client(t.app);
  await c.signIn(demoPeople.find((p) => p.role === role)!.email, DEMO_PASSWORD);
  return c;
};

const download = (c: Client, url: string) =>
  c.agent.get(api(url)).buffer(true).parse((res, done) => {
    const chunks: Buffer[] = [];
    res.on('data', (d: Buffer) => chunks.push(d));
    res.on('end', () => done(null, Buffer.concat(chunks)));
  });

const text = async (c: Client, url: string): Promise<string> => {
  const res = await download(c, url);
  expect(res.status).toBe(200);
  return (res.body as Buffer).toString();
};

const table = (csv: string): string[][] => parseCsv(csv).map((r) => r.cells);

const frame = async (step: number): Promise<Uint8Array> => new Uint8Array((await download(viewer, `/runs/${run.id}/frames/${step}`)).body as Buffer);

beforeAll(async () => {
  t = await startTestApp();
  await seedDemo(t.sequelize);
  viewer = await demoClient('viewer');
  editor = await demoClient('editor');
  const stranger = await makeUser('Stranger');
  outsider = client(t.app);
  await outsider.signIn(stranger.email, PASSWORD);
  anonymous = client(t.app);
  const [team] = (await viewer.get(api('/teams'))).body.teams;
  const areas: { id: number; name: string; totalAreaM2: number }[] = (await viewer.get(api(`/teams/${team.id}/study-areas`))).body.studyAreas;
  const cinder = areas.find((a) => a.name === 'Cinder Flat allotment')!;
  studyAreaId = cinder.id;
  totalAreaM2 = cinder.totalAreaM2;
  const runs: Run[] = (await viewer.get(api(`/study-areas/${studyAreaId}/runs`))).body.runs;
  [run, otherRun] = runs.filter((r) => r.status === 'succeeded').sort((a, b) => a.id - b.id);
  const heron = areas.find((a) => a.name === 'Heron Bay marsh')!;
  heronRun = (await viewer.get(api(`/study-areas/${heron.id}/runs`))).body.runs[0];
  surveyId = (await viewer.get(api(`/study-areas/${studyAreaId}/surveys`))).body.surveys[0].id;
});
afterAll(() => t.close());

describe('patch states at a step', () => {
  const step = 7;

  test('when a viewer downloads a step, then it is a valid FeatureCollection named after the study area, scenario, run and step', async () => {
    const res = await download(viewer, `/runs/${run.id}/steps/${step}/patches.geojson`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/application\/geo\+json/);
    expect(res.headers['content-disposition']).toContain(`cinder-flat-allotment-current-grazing-run-${run.id}-step-${step}.geojson`);
    const collection = JSON.parse((res.body as Buffer).toString());
    // Reference validator: geojson-validation (npm), which follows the GeoJSON specification.
    expect(GJV.valid(collection)).toBe(true);
    expect(collection.features).toHaveLength(run.inputs.patchCount);
    expect(collection.features[0].properties).toMatchObject({ patch: 0, step, year: step * run.yearsPerStep });
    writeFileSync(path.join(work, 'step.geojson'), res.body as Buffer);
  });

  test('when GDAL reads the step, then it sees every patch as a polygon in WGS 84 with the stored frame as its states', async () => {
    // Reference reader: GDAL's ogrinfo from Debian's gdal-bin.
    const file = path.join(work, 'step.geojson');
    const summary = execFileSync('ogrinfo', ['-ro', '-so', '-al', file]).toString();
    expect(summary).toContain(`Feature Count: ${run.inputs.patchCount}`);
    expect(summary).toMatch(/Geometry: (Multi )?Polygon|Geometry: Unknown/);
    expect(summary).toMatch(/WGS 84/);
    expect(summary).toMatch(/stateCode: String/);
    expect(summary).toMatch(/stateName: String/);
    expect(summary).toMatch(/row: Integer/);
    const attributes = execFileSync('ogr2ogr', ['-f', 'CSV', '/vsistdout/', file, '-select', 'patch,stateCode'], { maxBuffer: 64 * 2 ** 20 }).toString();
    const [header, ...rows] = table(attributes);
    expect(header).toEqual(['patch', 'stateCode']);
    const codes = run.inputs.states.map((s) => s.code);
    const expected = Array.from(await frame(step), (s, i) => [String(i), codes[s]]);
    expect(rows).toEqual(expected);
  });

  test('when the step is past the run or the run is not finished, then a clear 4xx', async () => {
    const past = await viewer.get(api(`/runs/${run.id}/steps/${run.steps + 1}/patches.geojson`));
    expect(past.status).toBe(400);
    expect(past.body.error.message).toMatch(/between 0 and 50/);
    expect((await viewer.get(api(`/runs/${run.id}/steps/-1/patches.geojson`))).status).toBe(400);
    const queued = await editor.post(api(`/scenarios/${run.scenarioId}/runs`), { steps: 3, replicates: 1 });
    expect(queued.status).toBe(201);
    for (const url of [`/runs/${queued.body.run.id}/steps/0/patches.geojson`, `/runs/${queued.body.run.id}/history.csv`, `/runs/${queued.body.run.id}/area-shares.csv`]) {
      const res = await viewer.get(api(url));
      expect(res.status).toBe(409);
      expect(res.body.error.message).toMatch(/has no results/);
    }
  });
});

test('when the patch history is downloaded, then it has one row per patch and step, equal to the stored frames', async () => {
  const [header, ...rows] = table(await text(viewer, `/runs/${run.id}/history.csv`));
  expect(header).toEqual(['patch', 'step', 'year', 'state']);
  const patches = run.inputs.patchCount;
  expect(rows).toHaveLength(patches * (run.steps + 1));
  const codes = run.inputs.states.map((s) => s.code);
  for (const step of [0, 1, 16, 33, run.steps]) {
    const states = await frame(step);
    const slice = rows.slice(step * patches, (step + 1) * patches);
    expect(slice).toEqual(Array.from(states, (s, i) => [String(i), String(step), String(step * run.yearsPerStep), codes[s]]));
  }
});

describe('area shares', () => {
  test('when downloaded in hectares, then the mean areas over states add up to the study area every step', async () => {
    const [header, ...rows] = table(await text(viewer, `/runs/${run.id}/area-shares.csv?unit=ha`));
    expect(header).toEqual(['step', 'year', 'state', 'state_name', 'mean_area_ha', 'median_area_ha', 'p5_area_ha', 'p95_area_ha', 'mean_share', 'median_share', 'p5_share', 'p95_share', 'expected_share', 'long_run_share']);
    const k = run.inputs.states.length;
    expect(rows).toHaveLength((run.steps + 1) * k);
    for (let step = 0; step <= run.steps; step++) {
      const atStep = rows.slice(step * k, (step + 1) * k);
      expect(atStep.every((r) => r[0] === String(step))).toBe(true);
      const meanHa = atStep.reduce((sum, r) => sum + Number(r[4]), 0);
      expect(Math.abs(meanHa * 10_000 - totalAreaM2) / totalAreaM2).toBeLessThan(1e-6);
      const longRun = atStep.reduce((sum, r) => sum + Number(r[13]), 0);
      expect(longRun).toBeCloseTo(1, 9);
    }
  });

  test('when downloaded in acres, then areas are hectares × 2.4710538', async () => {
    const ha = table(await text(viewer, `/runs/${run.id}/area-shares.csv`));
    const acres = table(await text(viewer, `/runs/${run.id}/area-shares.csv?unit=acres`));
    expect(acres[0][4]).toBe('mean_area_acres');
    expect(Number(acres[5][5])).toBeCloseTo(Number(ha[5][5]) * 2.4710538, 3);
    const bad = await viewer.get(api(`/runs/${run.id}/area-shares.csv?unit=km2`));
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/unit: .*"ha".*"acres"/);
  });

  test('when two runs are compared, then each has its rows in the order asked', async () => {
    const res = await download(viewer, `/study-areas/${studyAreaId}/compare.csv?runs=${otherRun.id},${run.id}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-disposition']).toContain(`cinder-flat-allotment-compare-runs-${otherRun.id}-${run.id}-ha.csv`);
    const [header, ...rows] = table((res.body as Buffer).toString());
    expect(header).toEqual(['run', 'scenario', 'step', 'year', 'state', 'median_area_ha', 'p5_area_ha', 'p95_area_ha', 'median_share']);
    const k = run.inputs.states.length;
    expect(rows).toHaveLength((otherRun.steps + 1 + run.steps + 1) * k);
    expect(rows[0].slice(0, 2)).toEqual([String(otherRun.id), otherRun.inputs.scenarioName]);
    expect(rows[rows.length - 1].slice(0, 2)).toEqual([String(run.id), run.inputs.scenarioName]);
  });

  test('when the runs list is wrong, then a 400 saying what is wrong', async () => {
    const ask = (runs: string) => viewer.get(api(`/study-areas/${studyAreaId}/compare.csv?runs=${runs}`));
    expect((await ask(`${run.id}`)).body.error.message).toMatch(/2 to 4/);
    expect((await ask(`${run.id},${run.id}`)).body.error.message).toMatch(/repeat/);
    expect((await ask('3,x')).body.error.message).toMatch(/separated by commas/);
    expect((await viewer.get(api(`/study-areas/${studyAreaId}/compare.csv`))).status).toBe(400);
    const res = await ask(`${run.id},${heronRun.id}`);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/another study area/);
  });
});

test('when a phase matrix is downloaded, then parseMatrixCsv reads back the saved matrix by state code', async () => {
  const scenario = (await viewer.get(api(`/scenarios/${otherRun.scenarioId}`))).body.scenario;
  expect(scenario.phases.length).toBe(2);
  for (const [index, phase] of scenario.phases.entries()) {
    const res = await download(viewer, `/scenarios/${scenario.id}/phases/${index}/matrix.csv`);
    expect(res.headers['content-type']).toMatch(/text\/csv/);
    expect(res.headers['content-disposition']).toContain(`-phase-${index}-matrix.csv`);
    const parsed = parseMatrixCsv((res.body as Buffer).toString());
    expect(parsed.states).toEqual(scenario.stateCodes);
    expect(parsed.rows).toEqual(phase.matrix);
  }
  const missing = await viewer.get(api(`/scenarios/${scenario.id}/phases/2/matrix.csv`));
  expect(missing.status).toBe(400);
  expect(missing.body.error.message).toMatch(/has 2 phases/);
});

test('when a survey estimate is downloaded, then it has one line per cell with its count, p and both intervals, then the tests', async () => {
  const estimate = (await viewer.get(api(`/surveys/${surveyId}`))).body.survey.estimate;
  const rows = table(await text(viewer, `/surveys/${surveyId}/estimate.csv`));
  const k = estimate.stateCodes.length;
  expect(rows[0]).toEqual(['from', 'to', 'count', 'p', 'lower', 'upper', 'simLower', 'simUpper']);
  const cell = rows[1 + 1 * k + 2];
  expect(cell.slice(0, 3)).toEqual([estimate.stateCodes[1], estimate.stateCodes[2], String(estimate.counts[1][2])]);
  expect(Number(cell[3])).toBe(estimate.matrix[1][2]);
  expect(Number(cell[6])).toBe(estimate.simultaneous.lower[1][2]);
  expect(rows[1 + k * k]).toEqual(['test', 'statistic', 'dof', 'pValue']);
  expect(rows[2 + k * k][0]).toBe('independence');
  expect(Number(rows[2 + k * k][1])).toBe(estimate.tests.independence.statistic);
  expect(rows[3 + k * k][0]).toBe('homogeneity');
});

describe('who may download', () => {
  const urls = (): string[] => [
    `/runs/${run.id}/steps/0/patches.geojson`,
    `/runs/${run.id}/history.csv`,
    `/runs/${run.id}/area-shares.csv`,
    `/study-areas/${studyAreaId}/compare.csv?runs=${run.id},${otherRun.id}`,
    `/scenarios/${run.scenarioId}/phases/0/matrix.csv`,
    `/surveys/${surveyId}/estimate.csv`,
  ];

  test('when a viewer asks, then 200 with a file name; an outsider 404; anonymous 401', async () => {
    for (const url of urls()) {
      const ok = await download(viewer, url);
      expect([url, ok.status]).toEqual([url, 200]);
      expect(ok.headers['content-disposition']).toMatch(/^attachment; filename="?cinder-flat-allotment-[a-z0-9-]+\.(csv|geojson)"?$/);
      expect([url, (await outsider.get(api(url))).status]).toEqual([url, 404]);
      expect([url, (await anonymous.get(api(url))).status]).toEqual([url, 401]);
    }
  });
});

test('when a step is uploaded again as a cover map, then the start cover equals that step patch by patch', async () => {
  const step = 12;
  const file = (await download(viewer, `/runs/${run.id}/steps/${step}/patches.geojson`)).body as Buffer;
  const codes = run.inputs.states.map((s) => s.code);
  const token = await editor.refreshCsrf();
  const res = await editor.agent
    .post(api(`/study-areas/${studyAreaId}/start-cover/map`))
    .set('x-csrf-token', token)
    .attach('file', file, 'step.geojson')
    .field('property', 'stateCode')
    .field('mapping', JSON.stringify(Object.fromEntries(codes.map((c) => [c, c]))));
  expect(res.status).toBe(200);
  expect(res.body.startCover.unmatchedCount).toBe(0);
  const cover = await StartCover.findByPk(studyAreaId);
  expect(Buffer.compare(Buffer.from(new Uint8Array(cover!.states)), Buffer.from(await frame(step)))).toBe(0);
});
