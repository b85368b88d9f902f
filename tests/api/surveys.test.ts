// Surveys through the API: roles on every route, inspection for the mapping steps, estimates equal
// to the engine's and to a published interval, refusals that name what and where, "use this
// estimate", uncertainty from the counts, and a pair of dated cover maps.
import { bbox as turfBbox } from '@turf/turf';
import { EVERYONE, cinderFlatBoundary, startFixture, type Fixture, type Who } from '../support/study-area-fixture';
import { Survey, SurveyFile } from '../../server/models';
import { countTransitions, estimateMatrix, parseObservationsCsv } from '../../shared/markov';
import { readFileSync } from 'node:fs';
import path from 'node:path';

let f: Fixture;
let area: number;
const FOUR = ['Shrub steppe', 'Perennial grassland', 'Annual grassland', 'Bare soil'];
const demoCsv = readFileSync(path.resolve(__dirname, '../../server/seed/surveys/cinder-flat-plots.csv'));
const demoMapping = { shrub: 'S1', 'perennial grass': 'S2', 'annual grass': 'S3', bare: 'S4' };
const demoFields = { name: 'Plots', plotColumn: 'plot_id', timeColumn: 'year', stateColumn: 'cover_class', mapping: JSON.stringify(demoMapping) };
const url = (p: string): string => `/api/v1${p}`;

// A cover map of two rectangles split at the boundary's middle longitude, together covering it all.
const [west, south, east, north] = turfBbox(JSON.parse(cinderFlatBoundary.toString()));
const mid = (west + east) / 2;
const rect = (x0: number, x1: number, cover: string) => ({
  type: 'Feature',
  properties: { cover },
  geometry: { type: 'Polygon', coordinates: [[[x0, south - 0.01], [x1, south - 0.01], [x1, north + 0.01], [x0, north + 0.01], [x0, south - 0.01]]] },
});
const map = (westCover: string, eastCover: string): Buffer => Buffer.from(JSON.stringify({ type: 'FeatureCollection', features: [rect(west - 0.01, mid, westCover), rect(mid, east + 0.01, eastCover)] }));
const mapFields = { name: 'Maps 2010–2017', property: 'cover', earlierDate: '2010-06-01', laterDate: '2017-06-01', mapping: JSON.stringify({ sage: 'S1', grass: 'S2', bare: 'S4' }) };

function postSurvey(who: Who, areaId: number, csv: Buffer | string, fields: Record<string, string> = demoFields) {
  return f.upload(who, url(`/study-areas/${areaId}/surveys`), { file: [Buffer.from(csv), 'plots.csv'] }, fields);
}

beforeAll(async () => {
  f = await startFixture();
  area = await f.makeArea(FOUR);
});
afterAll(() => f.t.close());

test('when the demo file is uploaded, then the counts, matrix, intervals and tests equal the engine\'s on the same file, and the file is kept', async () => {
  const res = await postSurvey('editor', area, demoCsv);
  expect(res.status).toBe(201);
  const { survey } = res.body;
  const observations = parseObservationsCsv(demoCsv.toString(), { plot: 'plot_id', time: 'year', state: 'cover_class' }).map((o) => ({
    ...o,
    state: FOUR[Number(demoMapping[o.state as keyof typeof demoMapping].slice(1)) - 1],
  }));
  const engine = estimateMatrix(countTransitions(observations, { states: FOUR }));
  expect(survey.estimate).toMatchObject({
    states: FOUR,
    stateCodes: ['S1', 'S2', 'S3', 'S4'],
    counts: engine.counts,
    matrix: engine.matrix,
    lower: engine.lower,
    upper: engine.upper,
    simultaneous: engine.simultaneous,
    tests: engine.tests,
    pairsUsed: engine.pairsUsed,
    rowsWithoutData: [],
  });
  expect(survey.estimate.pairsSkipped.total).toBe(engine.pairsSkipped.length);
  expect(survey.reading).toMatchObject({ kind: 'plots', plots: 60, observations: observations.length, rowsLeftOut: 0 });
  // The invented data were drawn from a persistent matrix: the next state depends on the current one.
  expect(survey.estimate.readings[0]).toMatch(/^The next state depends on the current one \(p < 0\.001\)/);
  expect(survey.estimate.readings[1]).toMatch(/transition rates changed between periods \(p [=<] /);
  const [file] = survey.files;
  expect(file).toMatchObject({ role: 'table', fileName: 'plots.csv', sha256: require('node:crypto').createHash('sha256').update(demoCsv).digest('hex') });
  const download = await f.as.viewer.get(url(`/surveys/${survey.id}/files/table`));
  expect(Buffer.compare(download.body as Buffer, demoCsv)).toBe(0);
});

test('when a hand-countable table is uploaded, then the counts are the hand counts, no pair crosses plots, and the Wilson interval is the published one', async () => {
  const two = await f.makeArea(['Shrub steppe', 'Perennial grassland']);
  // Plot R1: 29 years of shrub, then grass in year 30 → 28 shrub→shrub and 1 shrub→grass.
  // Plot R2 starts the line after R1 ends with grass: a grass→shrub pair there would cross plots.
  const lines = ['site,year,class', ...Array.from({ length: 30 }, (_, y) => `R1,${y + 1},${y === 29 ? 'G' : 'S'}`), 'R2,1,S', 'R2,3,S'];
  const res = await postSurvey('editor', two, lines.join('\n'), { name: 'Hand count', plotColumn: 'site', timeColumn: 'year', stateColumn: 'class', mapping: JSON.stringify({ S: 'S1', G: 'S2' }) });
  expect(res.status).toBe(201);
  const e = res.body.survey.estimate;
  expect(e.counts).toEqual([[28, 1], [0, 0]]);
  expect(e.rowsWithoutData).toEqual(['Perennial grassland']);
  expect(e.matrix[1]).toEqual([null, null]);
  expect(e.pairsSkipped).toMatchObject({ total: 1, byReason: [{ reason: 'gap of 2 steps (pairs must be 1 step apart)', count: 1 }] });
  // Wilson score 95 % interval for 1/29: 0.0061–0.1718 (Newcombe 1998, Statistics in Medicine
  // 17:857–872, Table I; values from memory, rechecked by hand from Wilson's formula).
  expect(e.lower[0][1]).toBeCloseTo(0.0061, 4);
  expect(e.upper[0][1]).toBeCloseTo(0.1718, 4);
  expect(e.readings).toEqual(expect.arrayContaining([expect.stringMatching(/No transitions out of 'Perennial grassland' were observed/), expect.stringMatching(/1 pair\(s\) of successive records were not counted \(gap of 2 steps/)]));
});

test('when the file is inspected, then it lists the columns, sample rows, guessed columns and a suggested mapping', async () => {
  const csv = 'Plot,Year,Cover,notes\nA,2001,Shrub steppe,x\nA,2002,s2,\nB,2001,weeds,\n';
  const res = await f.upload('editor', url(`/study-areas/${area}/surveys/inspect`), { file: [Buffer.from(csv), 'x.csv'] });
  expect(res.status).toBe(200);
  expect(res.body).toMatchObject({ rowCount: 3, guessedColumns: { plot: 'Plot', time: 'Year', state: 'Cover' }, suggestedMapping: { 'Shrub steppe': 'S1', s2: 'S2', weeds: null } });
  expect(res.body.columns.map((c: { name: string }) => c.name)).toEqual(['Plot', 'Year', 'Cover', 'notes']);
  expect(res.body.sampleRows[0]).toEqual(['A', '2001', 'Shrub steppe', 'x']);
});

describe('refusals', () => {
  test.each([
    ['an unclosed quote', 'plot_id,year,cover_class\n"CF-1,2001,shrub\n', demoFields, /quoted field is never closed/],
    ['a column that is not in the file', demoCsv, { ...demoFields, stateColumn: 'state' }, /no column 'state' in the header \(plot_id, year, cover_class, observer\)/],
    ['a time that is not a number', 'plot_id,year,cover_class\nA,2001,shrub\nA,20x2,shrub\n', demoFields, /line 3, column 'year': '20x2' is not a number/],
    ['a label the mapping leaves out', 'plot_id,year,cover_class\nA,2001,shrub\nA,2002,burnt\n', demoFields, /label is not mapped: "burnt" \(first at line 3\)/],
    ['a mapping to an unknown state code', demoCsv, { ...demoFields, mapping: JSON.stringify({ ...demoMapping, bare: 'XX' }) }, /"bare" → "XX"/],
    ['a mapping that is not JSON', demoCsv, { ...demoFields, mapping: '{shrub: S1' }, /mapping must be JSON/],
    ['no plot column field', demoCsv, { ...demoFields, plotColumn: '' }, /plotColumn must not be empty/],
    ['an empty file', '', demoFields, /empty/],
  ])('when the upload has %s, then 400 says what and where, and nothing is saved', async (_what, csv, fields, message) => {
    const before = [await Survey.count(), await SurveyFile.count()];
    const res = await postSurvey('editor', area, csv as Buffer | string, fields);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(message);
    expect([await Survey.count(), await SurveyFile.count()]).toEqual(before);
  });

  test('when no file is attached, then 400 names the form field', async () => {
    const res = await f.upload('editor', url(`/study-areas/${area}/surveys`), {}, demoFields);
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/form field "file"/);
  });
});

describe('roles', () => {
  const read = { owner: 200, editor: 200, viewer: 200, outsider: 404, anonymous: 401 };
  const change = { owner: 200, editor: 200, viewer: 403, outsider: 404, anonymous: 401 };
  test.each(EVERYONE)('when %s calls every survey route, then the answer follows the role', async (who) => {
    const id = (await postSurvey('owner', area, demoCsv)).body.survey.id;
    const maps = { earlier: [map('sage', 'grass'), 'a.geojson'] as [Buffer, string], later: [map('sage', 'bare'), 'b.geojson'] as [Buffer, string] };
    const got = {
      list: (await f.as[who].get(url(`/study-areas/${area}/surveys`))).status,
      detail: (await f.as[who].get(url(`/surveys/${id}`))).status,
      file: (await f.as[who].get(url(`/surveys/${id}/files/table`))).status,
      inspect: (await f.upload(who, url(`/study-areas/${area}/surveys/inspect`), { file: [demoCsv, 'p.csv'] })).status,
      create: (await postSurvey(who, area, demoCsv)).status,
      mapInspect: (await f.upload(who, url(`/study-areas/${area}/surveys/map-pair/inspect`), maps)).status,
      mapCreate: (await f.upload(who, url(`/study-areas/${area}/surveys/map-pair`), maps, mapFields)).status,
      rename: (await f.as[who].patch(url(`/surveys/${id}`), { name: 'Renamed' })).status,
      remove: (await f.as[who].delete(url(`/surveys/${id}`))).status,
    };
    expect(got).toEqual({ list: read[who], detail: read[who], file: read[who], inspect: change[who], create: { ...change, owner: 201, editor: 201 }[who], mapInspect: change[who], mapCreate: { ...change, owner: 201, editor: 201 }[who], rename: change[who], remove: { ...change, owner: 204, editor: 204 }[who] });
  });
});

describe('use this estimate', () => {
  test('when an editor uses a full estimate, then the phase matrix is the MLE, the survey is linked, and uncertainty draws from its counts', async () => {
    const survey = (await postSurvey('editor', area, demoCsv)).body.survey;
    const identity = [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => (i === j ? 1 : 0)));
    const id = (await f.as.editor.post(url(`/study-areas/${area}/scenarios`), { name: 'From survey', phases: [{ fromStep: 0, toStep: null, matrix: identity }] })).body.scenario.id;
    const res = await f.as.editor.post(url(`/scenarios/${id}/phases/0/use-survey`), { surveyId: survey.id });
    expect(res.status).toBe(200);
    expect(res.body.scenario.phases[0]).toMatchObject({ matrix: survey.estimate.matrix, surveyId: survey.id, survey: { id: survey.id, name: 'Plots' } });

    const u = (await f.as.viewer.get(url(`/scenarios/${id}/uncertainty?draws=400&seed=demo`))).body;
    const again = (await f.as.viewer.get(url(`/scenarios/${id}/uncertainty?draws=400&seed=demo`))).body;
    expect(again).toEqual(u);
    const [phase] = u.phases;
    expect(phase).toMatchObject({ surveyId: survey.id, reason: null, matrixMatchesSurvey: true, drawsWithoutUniqueShares: 0 });
    const pi = (await f.as.viewer.get(url(`/scenarios/${id}/analysis`))).body.phases[0].chain.stationary;
    phase.longRun.forEach((r: { lower: number; median: number; upper: number }, j: number) => {
      expect(r.lower).toBeLessThan(r.median);
      expect(r.median).toBeLessThan(r.upper);
      // The MLE's long-run share lies inside the posterior's 5–95 % range.
      expect(pi[j]).toBeGreaterThan(r.lower);
      expect(pi[j]).toBeLessThan(r.upper);
    });

    // Deleting the survey keeps the matrix and drops the link.
    expect((await f.as.editor.delete(url(`/surveys/${survey.id}`))).status).toBe(204);
    const after = (await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario.phases[0];
    expect(after).toMatchObject({ matrix: survey.estimate.matrix, surveyId: null, survey: null });
  });

  test('when the estimate has rows without data, then it is refused with the rows to type in, and the phase is unchanged', async () => {
    const csv = 'plot_id,year,cover_class\nA,1,shrub\nA,2,bare\nB,1,shrub\nB,2,shrub\n';
    const survey = (await postSurvey('editor', area, csv)).body.survey;
    expect(survey.estimate.rowsWithoutData).toEqual(['Perennial grassland', 'Annual grassland', 'Bare soil']);
    const identity = [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => (i === j ? 1 : 0)));
    const id = (await f.as.editor.post(url(`/study-areas/${area}/scenarios`), { name: 'Partial', phases: [{ fromStep: 0, toStep: null, matrix: identity }] })).body.scenario.id;
    const res = await f.as.editor.post(url(`/scenarios/${id}/phases/0/use-survey`), { surveyId: survey.id });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/no observed transitions out of 'Perennial grassland', 'Annual grassland', 'Bare soil': type those rows/);
    expect((await f.as.viewer.get(url(`/scenarios/${id}`))).body.scenario.phases[0]).toMatchObject({ matrix: identity, surveyId: null });
    const missing = await f.as.editor.post(url(`/scenarios/${id}/phases/3/use-survey`), { surveyId: survey.id });
    expect(missing.body.error.message).toMatch(/has 1 phase\(s\), numbered from 0; there is no phase 3/);
  });
});

describe('a pair of dated cover maps', () => {
  test('when the west stays sage and the east goes from grass to bare, then every patch is counted once on its side', async () => {
    const files = { earlier: [map('sage', 'grass'), 'earlier.geojson'] as [Buffer, string], later: [map('sage', 'bare'), 'later.geojson'] as [Buffer, string] };
    const res = await f.upload('editor', url(`/study-areas/${area}/surveys/map-pair`), files, mapFields);
    expect(res.status).toBe(201);
    const { survey } = res.body;
    const patchCount = (await f.as.viewer.get(url(`/study-areas/${area}`))).body.studyArea.patchCount;
    const c = survey.estimate.counts;
    expect(c[0][0] + c[1][3]).toBe(patchCount);
    expect(c[0][0]).toBeGreaterThan(0);
    expect(c[1][3]).toBeGreaterThan(0);
    expect(survey.estimate.rowsWithoutData).toEqual(['Annual grassland', 'Bare soil']);
    expect(survey.reading).toMatchObject({ kind: 'map-pair', unmatched: { earlier: 0, later: 0 } });
    expect(survey.files.map((x: { role: string }) => x.role).sort()).toEqual(['earlier', 'later']);
    expect(survey.estimate.readings).toEqual(expect.arrayContaining([expect.stringMatching(/The maps are 7 years apart/)]));
  });

  test('when a map value is not mapped or a map is missing, then 400 says which', async () => {
    const files = { earlier: [map('sage', 'scrub'), 'earlier.geojson'] as [Buffer, string], later: [map('sage', 'bare'), 'later.geojson'] as [Buffer, string] };
    const unmapped = await f.upload('editor', url(`/study-areas/${area}/surveys/map-pair`), files, mapFields);
    expect(unmapped.status).toBe(400);
    expect(unmapped.body.error.message).toMatch(/"scrub" \(first at polygon 2 of the earlier map\)/);
    const one = await f.upload('editor', url(`/study-areas/${area}/surveys/map-pair`), { earlier: files.earlier }, mapFields);
    expect(one.status).toBe(400);
    expect(one.body.error.message).toMatch(/form field "later"/);
    const dates = await f.upload('editor', url(`/study-areas/${area}/surveys/map-pair`), files, { ...mapFields, laterDate: '2001-01-01' });
    expect(dates.body.error.message).toMatch(/the later map must be dated after the earlier one/);
  });
});
