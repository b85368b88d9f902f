// A team with one person per role (plus a signed-out client) and a helper that makes study areas
// on the invented Cinder Flat boundary, for API tests of what lives inside a study area.
import { readFileSync } from 'node:fs';
import path from 'node:path';
import type request from 'supertest';
import { client, type Client } from './client';
import { makeTeam, makeUser, PASSWORD } from './people';
import { startTestApp, type TestApp } from './test-app';
import type { Team, User } from '../../server/models';
import { DEFAULT_STATE_COLOURS } from '../../shared/schemas';

export type Who = 'owner' | 'editor' | 'viewer' | 'outsider' | 'anonymous';
export const EVERYONE: readonly Who[] = ['owner', 'editor', 'viewer', 'outsider', 'anonymous'];

export type Fixture = {
  t: TestApp;
  team: Team;
  people: Record<Exclude<Who, 'anonymous'>, User>;
  as: Record<Who, Client>;
  /** A new study area of the team with these state names (codes S1, S2, …); returns its id. */
  makeArea(stateNames: string[], cellSize?: number): Promise<number>;
  /** Multipart POST with files and text fields. */
  upload(who: Who, url: string, files: Record<string, [Buffer, string]>, fields?: Record<string, string>): Promise<request.Response>;
};

export const cinderFlatBoundary = readFileSync(path.resolve(__dirname, '../../server/seed/boundaries/cinder-flat.geojson'));

/** Multipart POST with files and text fields, as this client. */
export async function uploadAs(c: Client, url: string, files: Record<string, [Buffer, string]>, fields: Record<string, string> = {}): Promise<request.Response> {
  const token = await c.refreshCsrf();
  let req = c.agent.post(url).set('x-csrf-token', token);
  for (const [field, [bytes, name]] of Object.entries(files)) req = req.attach(field, bytes, name);
  for (const [k, v] of Object.entries(fields)) req = req.field(k, v);
  return req;
}

export async function startFixture(): Promise<Fixture> {
  const t = await startTestApp();
  const people = { owner: await makeUser('Owner'), editor: await makeUser('Editor'), viewer: await makeUser('Viewer'), outsider: await makeUser('Outsider') };
  const team = await makeTeam('Scenario Team', [[people.owner, 'owner'], [people.editor, 'editor'], [people.viewer, 'viewer']]);
  const as = { anonymous: client(t.app) } as Record<Who, Client>;
  for (const [role, user] of Object.entries(people)) {
    as[role as Who] = client(t.app);
    await as[role as Who].signIn(user.email, PASSWORD);
  }
  const upload: Fixture['upload'] = (who, url, files, fields) => uploadAs(as[who], url, files, fields);
  const makeArea: Fixture['makeArea'] = async (stateNames, cellSize = 500) => {
    const states = stateNames.map((name, i) => ({ code: `S${i + 1}`, name, colour: DEFAULT_STATE_COLOURS[i % DEFAULT_STATE_COLOURS.length] }));
    const res = await upload('owner', `/api/v1/teams/${team.id}/study-areas`, { file: [cinderFlatBoundary, 'cinder-flat.geojson'] }, { name: stateNames.join('/'), cellSize: String(cellSize), states: JSON.stringify(states) });
    if (res.status !== 201) throw new Error(`study area not created: ${JSON.stringify(res.body)}`);
    return res.body.studyArea.id;
  };
  return { t, team, people, as, makeArea, upload };
}
