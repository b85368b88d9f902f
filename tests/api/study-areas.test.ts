// Study areas through the API: upload, preview, create with its patch grid, roles, bad files.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { startTestApp, type TestApp } from '../support/test-app';
import { StudyArea, type Team } from '../../server/models';
import { area as turfArea } from '@turf/turf';

let t: TestApp;
let team: Team;
const as = {} as Record<'owner' | 'editor' | 'viewer' | 'outsider', Client>;

const cinderFlat = readFileSync(path.resolve(__dirname, '../../server/seed/boundaries/cinder-flat.geojson'));
const states = JSON.stringify([
  { code: 'SS', name: 'Shrub steppe', colour: '#E69F00' },
  { code: 'PG', name: 'Perennial grassland', colour: '#009E73' },
]);

beforeAll(async () => {
  t = await startTestApp();
  const people = { owner: await makeUser('Owner'), editor: await makeUser('Editor'), viewer: await makeUser('Viewer'), outsider: await makeUser('Outsider') };
  team = await makeTeam('Area Team', [[people.owner, 'owner'], [people.editor, 'editor'], [people.viewer, 'viewer']]);
  for (const [role, user] of Object.entries(people)) {
    as[role as keyof typeof as] = client(t.app);
    await as[role as keyof typeof as].signIn(user.email, PASSWORD);
  }
});
afterAll(() => t.close());

async function upload(c: Client, url: string, file: Buffer, fileName: string, fields: Record<string, string>) {
  const token = await c.refreshCsrf();
  let req = c.agent.post(url).set('x-csrf-token', token).attach('file', file, fileName);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
}

test('when an editor uploads a boundary, then it is kept with its SHA-256 and split into patches whose areas add up to the geodesic area', async () => {
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cinder-flat.geojson', { name: 'Cinder Flat', cellSize: '200', states });
  expect(res.status).toBe(201);
  const created = res.body.studyArea;
  expect(created.patchCount).toBeGreaterThan(500);
  // Reference: turf's geodesic area of the same file (RFC 7946 lon/lat); 0.5 % is our stated tolerance.
  const reference = turfArea(JSON.parse(cinderFlat.toString()));
  expect(Math.abs(created.totalAreaM2 - reference) / reference).toBeLessThan(0.005);

  const detail = (await as.viewer.get(`/api/v1/study-areas/${created.id}`)).body.studyArea;
  expect(detail.source.sha256).toBe(require('node:crypto').createHash('sha256').update(cinderFlat).digest('hex'));
  expect(detail.states.map((s: { code: string }) => s.code)).toEqual(['SS', 'PG']);
  const row = await StudyArea.scope('withGrid').findByPk(created.id);
  expect(row!.patchAreas.byteLength).toBe(created.patchCount * 4);

  const source = await as.viewer.get(`/api/v1/study-areas/${created.id}/source`);
  expect(source.headers['content-disposition']).toMatch(/attachment/);
  expect(Buffer.compare(source.body as Buffer, cinderFlat)).toBe(0);
});

test('when a viewer tries to create, rename or delete, then 403; an outsider gets 404; only owners delete', async () => {
  const res = await upload(as.owner, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'To delete', cellSize: '500', states });
  const id = res.body.studyArea.id;
  expect((await upload(as.viewer, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'X', cellSize: '500', states })).status).toBe(403);
  expect((await as.viewer.patch(`/api/v1/study-areas/${id}`, { name: 'Renamed' })).status).toBe(403);
  expect((await as.outsider.get(`/api/v1/study-areas/${id}`)).status).toBe(404);
  expect((await as.editor.patch(`/api/v1/study-areas/${id}`, { name: 'Renamed' })).body.studyArea.name).toBe('Renamed');
  expect((await as.editor.delete(`/api/v1/study-areas/${id}`)).status).toBe(403);
  expect((await as.owner.delete(`/api/v1/study-areas/${id}`)).status).toBe(204);
  expect((await as.viewer.get(`/api/v1/study-areas/${id}`)).status).toBe(404);
});

test('when the cell size gives more than 250,000 patches, then 400 names the smallest cell size that fits and nothing is saved', async () => {
  const before = await StudyArea.count();
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'Too fine', cellSize: '10', states });
  expect(res.status).toBe(400);
  expect(res.body.error.message).toMatch(/cell size/i);
  expect(await StudyArea.count()).toBe(before);
});

test.each([
  ['a file that is not a boundary', Buffer.from('hello'), 'notes.txt', /file was refused: .*neither GeoJSON, KML nor a zipped shapefile/],
  ['an unclosed ring', Buffer.from(JSON.stringify({ type: 'Polygon', coordinates: [[[0, 0], [1, 0], [1, 1], [0, 1]]] })), 'open.geojson', /clos/i],
  ['a bow-tie polygon', Buffer.from(JSON.stringify({ type: 'Polygon', coordinates: [[[0, 0], [1, 1], [1, 0], [0, 1], [0, 0]]] })), 'bowtie.geojson', /intersect|cross/i],
])('when the upload is %s, then 400 says what is wrong', async (_what, file, name, message) => {
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas/preview`, file, name, {});
  expect(res.status).toBe(400);
  expect(res.body.error.message).toMatch(message);
});

test('when the states are not valid, then 400 names the state', async () => {
  const twice = JSON.stringify([
    { code: 'A', name: 'Same', colour: '#E69F00' },
    { code: 'B', name: 'same', colour: '#56B4E9' },
  ]);
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'Bad states', cellSize: '500', states: twice });
  expect(res.status).toBe(400);
  expect(res.body.error.message).toMatch(/used twice/);
});

test('when the file is larger than 25 MB, then 413 says so', async () => {
  const big = Buffer.alloc(26 * 1024 * 1024, 32);
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas/preview`, big, 'big.geojson', {});
  expect(res.status).toBe(413);
  expect(res.body.error.message).toMatch(/25 MB/);
});

test('when the preview is asked for, then it returns the outline and its area without saving', async () => {
  const before = await StudyArea.count();
  const res = await upload(as.editor, `/api/v1/teams/${team.id}/study-areas/preview`, cinderFlat, 'cf.geojson', {});
  expect(res.status).toBe(200);
  expect(res.body.parts.length).toBeGreaterThan(0);
  expect(res.body.areaM2).toBeGreaterThan(3e7);
  expect(await StudyArea.count()).toBe(before);
});

describe('start cover by proportions', () => {
  let id: number;
  beforeAll(async () => {
    id = (await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'Start cover', cellSize: '250', states })).body.studyArea.id;
  });

  test('when an editor sets exact proportions with a seed, then the patch counts are the rounded shares and the areas add up', async () => {
    const res = await as.editor.put(`/api/v1/study-areas/${id}/start-cover`, { method: 'exact', proportions: [0.7, 0.3], seed: 'demo-1' });
    expect(res.status).toBe(200);
    const cover = res.body.startCover;
    const total = cover.patches[0] + cover.patches[1];
    expect(Math.abs(cover.patches[0] - 0.7 * total)).toBeLessThan(1);
    const detail = (await as.viewer.get(`/api/v1/study-areas/${id}`)).body.studyArea;
    expect(total).toBe(detail.patchCount);
    expect(cover.areaM2[0] + cover.areaM2[1]).toBeCloseTo(detail.totalAreaM2, -1);
    expect((await as.viewer.get(`/api/v1/study-areas/${id}/start-cover`)).body.startCover).toEqual(cover);
  });

  test('when proportions do not sum to 1 or a viewer tries, then it is refused and the saved cover stays', async () => {
    const before = (await as.viewer.get(`/api/v1/study-areas/${id}/start-cover`)).body.startCover;
    const bad = await as.editor.put(`/api/v1/study-areas/${id}/start-cover`, { method: 'random', proportions: [0.5, 0.4] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.message).toMatch(/add up to 0\.9/);
    expect((await as.editor.put(`/api/v1/study-areas/${id}/start-cover`, { method: 'random', proportions: [0.5] })).status).toBe(400);
    expect((await as.viewer.put(`/api/v1/study-areas/${id}/start-cover`, { method: 'random', proportions: [0.5, 0.5] })).status).toBe(403);
    expect((await as.viewer.get(`/api/v1/study-areas/${id}/start-cover`)).body.startCover).toEqual(before);
  });
});

test('when the patch grid is fetched, then the decoded areas add up to the stored total', async () => {
  const id = (await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'Grid fetch', cellSize: '300', states })).body.studyArea.id;
  const res = await as.viewer.get(`/api/v1/study-areas/${id}/patches`);
  const bytes = Buffer.from(res.body.areas, 'base64');
  const areas = new Float32Array(new Uint8Array(bytes).buffer);
  expect(areas.length).toBe(res.body.patchCount);
  const detail = (await as.viewer.get(`/api/v1/study-areas/${id}`)).body.studyArea;
  expect(areas.reduce((a, b) => a + b, 0)).toBeCloseTo(detail.totalAreaM2, -2);
  expect((await as.outsider.get(`/api/v1/study-areas/${id}/patches`)).status).toBe(404);
});

describe('start cover from a cover map', () => {
  let id: number;
  // An invented two-polygon cover map: west and east halves of the boundary's bounding box.
  const coords = JSON.parse(cinderFlat.toString()).features[0].geometry.coordinates.flat(1) as [number, number][];
  const lons = coords.map((c) => c[0]);
  const lats = coords.map((c) => c[1]);
  const [w, e, s, n] = [Math.min(...lons) - 0.01, Math.max(...lons) + 0.01, Math.min(...lats) - 0.01, Math.max(...lats) + 0.01];
  const mid = (w + e) / 2;
  const box = (x0: number, x1: number, y1: number) => [[[x0, s], [x1, s], [x1, y1], [x0, y1], [x0, s]]];
  const coverMap = (northOfEast: number) =>
    Buffer.from(
      JSON.stringify({
        type: 'FeatureCollection',
        features: [
          { type: 'Feature', properties: { veg: 'sage' }, geometry: { type: 'Polygon', coordinates: box(w, mid, n) } },
          { type: 'Feature', properties: { veg: 'grass' }, geometry: { type: 'Polygon', coordinates: box(mid, e, northOfEast) } },
        ],
      }),
    );

  beforeAll(async () => {
    id = (await upload(as.editor, `/api/v1/teams/${team.id}/study-areas`, cinderFlat, 'cf.geojson', { name: 'Mapped', cellSize: '250', states })).body.studyArea.id;
  });

  test('when the map is inspected, then its attribute and values are listed', async () => {
    const res = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map/inspect`, coverMap(n), 'map.geojson', {});
    expect(res.status).toBe(200);
    expect(res.body.featureCount).toBe(2);
    expect(res.body.properties).toEqual([{ name: 'veg', values: [{ value: 'grass', count: 1 }, { value: 'sage', count: 1 }] }]);
  });

  test('when the map covers every patch, then both states get patches and none is flagged', async () => {
    const res = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map`, coverMap(n), 'map.geojson', { property: 'veg', mapping: JSON.stringify({ sage: 'SS', grass: 'PG' }) });
    expect(res.status).toBe(200);
    const cover = res.body.startCover;
    expect(cover.method).toBe('cover-map');
    expect(cover.unmatchedCount).toBe(0);
    expect(cover.patches[0]).toBeGreaterThan(0);
    expect(cover.patches[1]).toBeGreaterThan(0);
  });

  test('when some patches lie under no polygon, then it asks for a fallback, keeps the saved cover, and flags them once one is given', async () => {
    const before = (await as.viewer.get(`/api/v1/study-areas/${id}/start-cover`)).body.startCover;
    const partial = coverMap((s + n) / 2);
    const refused = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map`, partial, 'map.geojson', { property: 'veg', mapping: JSON.stringify({ sage: 'SS', grass: 'PG' }) });
    expect(refused.status).toBe(400);
    expect(refused.body.error.message).toMatch(/lie under no mapped polygon: choose a fallback/);
    expect((await as.viewer.get(`/api/v1/study-areas/${id}/start-cover`)).body.startCover).toEqual(before);

    const saved = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map`, partial, 'map.geojson', { property: 'veg', mapping: JSON.stringify({ sage: 'SS', grass: 'PG' }), fallback: 'SS' });
    expect(saved.status).toBe(200);
    expect(saved.body.startCover.unmatchedCount).toBe(refused.body.error.details.unmatchedCount);
  });

  test('when the mapping names an unknown state or attribute, then 400 says which', async () => {
    const unknownState = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map`, coverMap(n), 'map.geojson', { property: 'veg', mapping: JSON.stringify({ sage: 'XX' }) });
    expect(unknownState.status).toBe(400);
    expect(unknownState.body.error.message).toMatch(/"XX", which is not a cover state/);
    const unknownProperty = await upload(as.editor, `/api/v1/study-areas/${id}/start-cover/map`, coverMap(n), 'map.geojson', { property: 'landcover', mapping: '{}' });
    expect(unknownProperty.status).toBe(400);
    expect(unknownProperty.body.error.message).toMatch(/attribute "landcover"/);
    expect((await upload(as.viewer, `/api/v1/study-areas/${id}/start-cover/map/inspect`, coverMap(n), 'map.geojson', {})).status).toBe(403);
  });
});
