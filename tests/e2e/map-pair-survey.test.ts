// A survey from two dated cover maps in the browser: the demo editor picks an earlier and a later
// invented map of Cinder Flat (west and east halves with a `veg` attribute), dates them, maps the
// values to cover states and sees the estimated matrix. Screenshots on a phone and a wide screen.
import { signInAsDemo } from '../support/demo-sign-in';
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { bbox as turfBbox } from '@turf/turf';
import type { Page } from 'playwright-core';
import { openBrowser, screenshot, viewports } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_TEAM, demoPeople } from '../../server/seed/demo';

jest.setTimeout(240_000);

const editor = demoPeople.find((p) => p.role === 'editor')!;
const boundary = JSON.parse(readFileSync(path.resolve(__dirname, '../../server/seed/boundaries/cinder-flat.geojson'), 'utf8'));

// Two rectangles split at the boundary's middle longitude, together covering all of it.
const [west, south, east, north] = turfBbox(boundary);
const mid = (west + east) / 2;
const rect = (x0: number, x1: number, veg: string) => ({
  type: 'Feature',
  properties: { veg },
  geometry: { type: 'Polygon', coordinates: [[[x0, south - 0.01], [x1, south - 0.01], [x1, north + 0.01], [x0, north + 0.01], [x0, south - 0.01]]] },
});
const coverMap = (westVeg: string, eastVeg: string): string =>
  JSON.stringify({ type: 'FeatureCollection', features: [rect(west - 0.01, mid, westVeg), rect(mid, east + 0.01, eastVeg)] });

let server: LiveServer;
let dir: string;
let earlierMap: string;
let laterMap: string;

beforeAll(async () => {
  server = await startLiveServer();
  dir = mkdtempSync(path.join(tmpdir(), 'patchcast-maps-'));
  earlierMap = path.join(dir, 'cinder-2012.geojson');
  laterMap = path.join(dir, 'cinder-2019.geojson');
  writeFileSync(earlierMap, coverMap('sagebrush', 'bunchgrass'));
  writeFileSync(laterMap, coverMap('sagebrush', 'cheatgrass'));
});
afterAll(() => {
  server?.close();
  rmSync(dir, { recursive: true, force: true });
});

/** The demo study area's id, read through the API with the page's session. */
async function cinderFlatId(page: Page): Promise<number> {
  const { teams } = (await (await page.request.get(`${server.url}/api/v1/teams`)).json()) as { teams: { id: number; name: string }[] };
  const team = teams.find((t) => t.name === DEMO_TEAM)!;
  const { studyAreas } = (await (await page.request.get(`${server.url}/api/v1/teams/${team.id}/study-areas`)).json()) as {
    studyAreas: { id: number; name: string }[];
  };
  return studyAreas.find((a) => a.name === 'Cinder Flat allotment')!.id;
}

async function chooseFile(page: Page, button: number, file: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: /^Choose (a|another) file$/ }).nth(button).click();
  await (await chooser).setFiles(file);
}

test('when the editor uploads two dated cover maps, then they map the attribute values and see the estimated matrix', async () => {
  const { page, close } = await openBrowser('wide');
  try {
    await signInAsDemo(page, server.url, editor.email);
    const studyAreaId = await cinderFlatId(page);
    await page.goto(`${server.url}/study-areas/${studyAreaId}/surveys/new`);
    await page.getByRole('radiogroup', { name: 'Kind of survey' }).getByRole('radio', { name: 'Two dated cover maps' }).click();
    await page.getByRole('heading', { name: 'Two dated cover maps' }).waitFor();

    await chooseFile(page, 0, earlierMap);
    await page.getByText(/cinder-2012\.geojson/).waitFor();
    await chooseFile(page, 1, laterMap);
    await page.getByLabel('Date of the earlier map').fill('2012-06-15');
    await page.getByLabel('Date of the later map').fill('2012-01-01');

    await page.getByRole('radiogroup', { name: 'Attribute that names the cover' }).getByRole('radio', { name: 'veg' }).waitFor();
    const labels: [string, string][] = [['sagebrush', 'SS · Shrub steppe'], ['bunchgrass', 'PG · Perennial grassland'], ['cheatgrass', 'AG · Annual grassland']];
    for (const [label, state] of labels) {
      await page.getByRole('radiogroup', { name: new RegExp(`^"${label}"`) }).getByRole('radio', { name: state, exact: true }).click();
    }
    await page.getByLabel('Survey name').fill('Cover maps 2012–2019 (invented)');

    // A later date before the earlier one: the server's message shows at the date.
    await page.getByRole('button', { name: 'Estimate the matrix' }).click();
    await page.getByText('The later map must be dated after the earlier one').first().waitFor();
    for (const size of ['wide', 'phone'] as const) {
      await page.setViewportSize(viewports[size]);
      await page.getByRole('heading', { name: 'Two dated cover maps' }).scrollIntoViewIfNeeded();
      await screenshot(page, `map-pair-maps-${size}`);
      await page.getByRole('heading', { name: 'States' }).scrollIntoViewIfNeeded();
      await screenshot(page, `map-pair-states-${size}`);
    }
    await page.setViewportSize(viewports.wide);
    await page.getByLabel('Date of the later map').fill('2019-06-15');
    await page.getByRole('button', { name: 'Estimate the matrix' }).click();

    await page.getByRole('heading', { name: 'Cover maps 2012–2019 (invented)' }).waitFor();
    expect(new URL(page.url()).pathname).toMatch(new RegExp(`^/study-areas/${studyAreaId}/surveys/\\d+$`));
    await page.getByText(/Cover maps of 2012-06-15 and 2019-06-15/).waitFor();
    await page.getByText('Estimated matrix').waitFor();
    await page.getByText(/The maps are 7 years apart/).waitFor();

    for (const size of ['wide', 'phone'] as const) {
      await page.setViewportSize(viewports[size]);
      await screenshot(page, `map-pair-survey-${size}`);
    }
  } finally {
    await close();
  }
});
