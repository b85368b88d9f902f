// Patch GeoJSON downloads: valid RFC 7946, readable by GDAL, and a start cover that survives a
// round trip through its own export.
import { execFileSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import * as GJV from 'geojson-validation';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { StartCover, type Team } from '../../server/models';

let t: TestApp;
let team: Team;
let editor: Client;
let outsider: Client;
let studyAreaId: number;
let patchCount: number;
const work = mkdtempSync(path.join(tmpdir(), 'patchcast-exports-'));

const boundary = readFileSync(path.resolve(__dirname, '../../server/seed/boundaries/heron-bay.geojson'));
const states = JSON.stringify([
  { code: 'OW', name: 'Open water', colour: '#56B4E9' },
  { code: 'LM', name: 'Low marsh', colour: '#009E73' },
  { code: 'HM', name: 'High marsh', colour: '#E69F00' },
]);

async function upload(c: Client, url: string, file: Buffer, fileName: string, fields: Record<string, string>) {
  const token = await c.refreshCsrf();
  let req = c.agent.post(url).set('x-csrf-token', token).attach('file', file, fileName);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
}

beforeAll(async () => {
  t = await startTestApp();
  const [e, o] = [await makeUser('Editor'), await makeUser('Outsider')];
  team = await makeTeam('Export Team', [[e, 'editor']]);
  editor = client(t.app);
  outsider = client(t.app);
  await editor.signIn(e.email, PASSWORD);
  await outsider.signIn(o.email, PASSWORD);
  const created = await upload(editor, `/api/v1/teams/${team.id}/study-areas`, boundary, 'heron-bay.geojson', { name: 'Heron Bay test', cellSize: '200', states });
  studyAreaId = created.body.studyArea.id;
  patchCount = created.body.studyArea.patchCount;
  await editor.put(`/api/v1/study-areas/${studyAreaId}/start-cover`, { method: 'random', proportions: [0.3, 0.4, 0.3], seed: 'export-test' });
});
afterAll(() => t.close());

const download = async (c: Client, url: string) => c.agent.get(url).buffer(true).parse((res, done) => {
  const chunks: Buffer[] = [];
  res.on('data', (d: Buffer) => chunks.push(d));
  res.on('end', () => done(null, Buffer.concat(chunks)));
});

test('when the start cover is downloaded, then it is a valid RFC 7946 FeatureCollection with one feature per patch', async () => {
  const res = await download(editor, `/api/v1/study-areas/${studyAreaId}/start-cover.geojson`);
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/application\/geo\+json/);
  expect(res.headers['content-disposition']).toMatch(/heron-bay-test-start-cover-step-0\.geojson/);
  const collection = JSON.parse((res.body as Buffer).toString());
  // Reference validator: geojson-validation (npm), which follows the GeoJSON specification.
  expect(GJV.valid(collection)).toBe(true);
  expect(collection.features).toHaveLength(patchCount);
  expect(collection.features[0].properties).toMatchObject({ patch: 0, step: 0, year: 0 });
  expect(['OW', 'LM', 'HM']).toContain(collection.features[0].properties.stateCode);
  writeFileSync(path.join(work, 'start.geojson'), res.body as Buffer);
});

test('when GDAL reads the download, then it sees the feature count, polygons, WGS 84 and the attributes', () => {
  // Reference reader: GDAL's ogrinfo from Debian's gdal-bin.
  const summary = execFileSync('ogrinfo', ['-ro', '-so', '-al', path.join(work, 'start.geojson')]).toString();
  expect(summary).toContain(`Feature Count: ${patchCount}`);
  expect(summary).toMatch(/Geometry: (Multi )?Polygon|Geometry: Unknown/);
  expect(summary).toMatch(/WGS 84/);
  expect(summary).toMatch(/stateCode: String/);
  expect(summary).toMatch(/areaM2: Real/);
  const one = execFileSync('ogrinfo', ['-ro', '-al', '-where', 'patch = 3', path.join(work, 'start.geojson')]).toString();
  expect(one).toMatch(/patch \(Integer\) = 3/);
});

test('when the download is uploaded again as a cover map, then the start cover is the same patch by patch', async () => {
  const before = new Uint8Array((await StartCover.findByPk(studyAreaId))!.states);
  const file = readFileSync(path.join(work, 'start.geojson'));
  const res = await upload(editor, `/api/v1/study-areas/${studyAreaId}/start-cover/map`, file, 'start.geojson', {
    property: 'stateCode',
    mapping: JSON.stringify({ OW: 'OW', LM: 'LM', HM: 'HM' }),
  });
  expect(res.status).toBe(200);
  expect(res.body.startCover.unmatchedCount).toBe(0);
  const after = new Uint8Array((await StartCover.findByPk(studyAreaId))!.states);
  expect(Buffer.compare(Buffer.from(after), Buffer.from(before))).toBe(0);
});

test('when an outsider asks for a download, then 404', async () => {
  expect((await outsider.get(`/api/v1/study-areas/${studyAreaId}/start-cover.geojson`)).status).toBe(404);
  expect((await outsider.get(`/api/v1/study-areas/${studyAreaId}/patches.geojson`)).status).toBe(404);
});
