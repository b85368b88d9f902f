// What the bad-input corpus sends its requests against: a team with one owner, a study area on
// the invented Cinder Flat boundary, a scenario and a survey. And a snapshot of everything the
// requests could have written, to prove afterwards that none of them saved anything.
import type request from 'supertest';
import { client, type Client } from '../support/client';
import { makeTeam, makeUser, PASSWORD } from '../support/people';
import { cinderFlatBoundary } from '../support/study-area-fixture';
import type { TestApp } from '../support/test-app';

export type Files = Record<string, [Buffer, string]>;

export type CorpusFixtures = {
  teamId: number;
  studyAreaId: number;
  scenarioId: number;
  surveyId: number;
  /** Text fields that, with a good boundary, create a study area (two states S1, S2). */
  areaFields: Record<string, string>;
  /** Text fields that, with a good table, create a plot survey (labels shrub → S1, grass → S2). */
  surveyFields: Record<string, string>;
  /** A 2×2 row-stochastic matrix that fits the study area. */
  matrix: number[][];
  /** Multipart POST as the owner: files by form field, then text fields. */
  upload(url: string, files: Files, fields?: Record<string, string>): Promise<request.Response>;
  /** A request as the owner with this exact body and content type. */
  raw(method: 'post' | 'put', url: string, contentType: string, body: string | Buffer): Promise<request.Response>;
};

export const SURVEY_CSV = 'plot_id,year,cover_class\nP1,2001,shrub\nP1,2002,grass\nP2,2001,grass\nP2,2002,grass\n';

export async function makeCorpusFixtures(t: TestApp): Promise<{ owner: Client; fixtures: CorpusFixtures }> {
  const person = await makeUser('Corpus Owner');
  const team = await makeTeam('Corpus Team', [[person, 'owner']]);
  const owner = client(t.app);
  await owner.signIn(person.email, PASSWORD);

  const upload: CorpusFixtures['upload'] = async (url, files, fields = {}) => {
    let req = owner.agent.post(url).set('x-csrf-token', await owner.refreshCsrf());
    for (const [field, [bytes, name]] of Object.entries(files)) req = req.attach(field, bytes, name);
    for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
    return req;
  };
  const raw: CorpusFixtures['raw'] = async (method, url, contentType, body) =>
    owner.agent[method](url).set('x-csrf-token', await owner.refreshCsrf()).set('content-type', contentType).send(body);

  const states = [
    { code: 'S1', name: 'Shrub steppe', colour: '#E69F00' },
    { code: 'S2', name: 'Grassland', colour: '#009E73' },
  ];
  const areaFields = { name: 'Corpus area', cellSize: '500', states: JSON.stringify(states) };
  const surveyFields = { name: 'Corpus survey', plotColumn: 'plot_id', timeColumn: 'year', stateColumn: 'cover_class', mapping: JSON.stringify({ shrub: 'S1', grass: 'S2' }) };
  const matrix = [
    [0.9, 0.1],
    [0.2, 0.8],
  ];

  const created = async (res: request.Response, key: string): Promise<number> => {
    if (res.status !== 201) throw new Error(`corpus fixture ${key} not created: ${res.status} ${JSON.stringify(res.body)}`);
    return res.body[key].id;
  };
  const studyAreaId = await created(await upload(`/api/v1/teams/${team.id}/study-areas`, { file: [cinderFlatBoundary, 'cinder-flat.geojson'] }, areaFields), 'studyArea');
  const scenarioId = await created(
    await owner.post(`/api/v1/study-areas/${studyAreaId}/scenarios`, { name: 'Corpus scenario', phases: [{ fromStep: 0, toStep: null, matrix }] }),
    'scenario',
  );
  const surveyId = await created(await upload(`/api/v1/study-areas/${studyAreaId}/surveys`, { file: [Buffer.from(SURVEY_CSV), 'plots.csv'] }, surveyFields), 'survey');
  return { owner, fixtures: { teamId: team.id, studyAreaId, scenarioId, surveyId, areaFields, surveyFields, matrix, upload, raw } };
}

export type Snapshot = { rows: Record<string, number>; objects: Record<string, unknown> };

/** Row counts of every model's table, and the fixtures as the API shows them. */
export async function takeSnapshot(t: TestApp, owner: Client, f: CorpusFixtures): Promise<Snapshot> {
  const rows: Record<string, number> = {};
  for (const [name, model] of Object.entries(t.sequelize.models)) rows[name] = await model.count();
  const objects: Record<string, unknown> = {};
  const reads: Record<string, string> = {
    team: `/teams/${f.teamId}`,
    studyAreas: `/teams/${f.teamId}/study-areas`,
    studyArea: `/study-areas/${f.studyAreaId}`,
    patches: `/study-areas/${f.studyAreaId}/patches`,
    startCover: `/study-areas/${f.studyAreaId}/start-cover`,
    scenarios: `/study-areas/${f.studyAreaId}/scenarios`,
    scenario: `/scenarios/${f.scenarioId}`,
    surveys: `/study-areas/${f.studyAreaId}/surveys`,
    survey: `/surveys/${f.surveyId}`,
    runs: `/study-areas/${f.studyAreaId}/runs`,
  };
  for (const [name, path] of Object.entries(reads)) {
    const res = await owner.get(`/api/v1${path}`);
    objects[name] = { status: res.status, body: res.body };
  }
  return { rows, objects };
}

/** What differs between two snapshots, one line per table or object. */
export function snapshotChanges(before: Snapshot, after: Snapshot): string[] {
  const changes: string[] = [];
  for (const [table, count] of Object.entries(before.rows)) {
    if (after.rows[table] !== count) changes.push(`${table}: ${count} rows before the corpus, ${after.rows[table]} after`);
  }
  for (const [name, value] of Object.entries(before.objects)) {
    if (JSON.stringify(after.objects[name]) !== JSON.stringify(value)) changes.push(`the fixture's ${name} changed`);
  }
  return changes;
}
