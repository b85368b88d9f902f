// Study areas through the real pages, on a phone and on a wide screen: the demo editor opens
// Cinder Flat, creates a study area from a boundary file with the live grid preview, and sets its
// start cover; the demo viewer can read but neither create nor delete.
import { signInAsDemo } from '../support/demo-sign-in';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { openBrowser, screenshot, viewports, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { demoPeople } from '../../server/seed/demo';
import { StartCover, StudyArea } from '../../server/models';
import { formatArea, formatCount } from '../../features/studyAreas/formatArea';

jest.setTimeout(180_000);

let server: LiveServer;
beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

const person = (role: 'owner' | 'editor' | 'viewer'): { email: string } => demoPeople.find((p) => p.role === role)!;
const boundaries = path.resolve(__dirname, '..', '..', 'server', 'seed', 'boundaries');
const heronBayFile = path.join(boundaries, 'heron-bay.geojson');
const cinderFlatFile = path.join(boundaries, 'cinder-flat.geojson');
const bowtieFile = path.resolve(__dirname, '..', 'fixtures', 'geo', 'broken', 'bowtie.geojson');

/** A cover map over Heron Bay: "Water" on the western third, "reed" on the middle third, nothing east. */
function writeCoverMap(): string {
  const marsh = JSON.parse(readFileSync(heronBayFile, 'utf8')) as { features: { geometry: { coordinates: number[][][][] } }[] };
  const points = marsh.features.flatMap((f) => f.geometry.coordinates.flat(2));
  const lons = points.map(([lon]) => lon);
  const lats = points.map(([, lat]) => lat);
  const [west, east, south, north] = [Math.min(...lons) - 0.01, Math.max(...lons) + 0.01, Math.min(...lats) - 0.01, Math.max(...lats) + 0.01];
  const third = (east - west) / 3;
  const box = (from: number, to: number, cover: string): object => ({
    type: 'Feature',
    properties: { cover },
    geometry: { type: 'Polygon', coordinates: [[[from, south], [to, south], [to, north], [from, north], [from, south]]] },
  });
  const file = path.join(mkdtempSync(path.join(tmpdir(), 'patchcast-cover-')), 'heron-cover.geojson');
  writeFileSync(file, JSON.stringify({ type: 'FeatureCollection', features: [box(west, west + third, 'Water'), box(west + third, west + 2 * third, 'reed')] }));
  return file;
}

/**
 * The page scrolls inside the app's own scroll view, so a full-page shot would show one screen:
 * grow the window to the content's height for the shot (same width, same layout), then restore.
 */
async function screenshotWhole(page: Page, name: string, viewport: ViewportName): Promise<void> {
  const overflow = await page.evaluate(() =>
    Math.max(0, ...Array.from(document.querySelectorAll('div'), (el) => el.scrollHeight - el.clientHeight)),
  );
  const { width, height } = viewports[viewport];
  await page.setViewportSize({ width, height: height + overflow });
  await page.waitForTimeout(300);
  await screenshot(page, name);
  await page.setViewportSize({ width, height });
}

/** Picks a file through the browser's file chooser, as a person would. */
async function chooseFile(page: Page, button: string, file: string): Promise<void> {
  const chooser = page.waitForEvent('filechooser');
  await page.getByRole('button', { name: button }).click();
  await (await chooser).setFiles(file);
}

/** The live estimate's figure, e.g. "about 3,512" → 3512. */
async function estimatedPatches(page: Page): Promise<number> {
  const text = await page.getByText(/^about [\d,]+$/).first().textContent();
  return Number((text ?? '').replace(/[^\d]/g, ''));
}

/** Waits for the live estimate to move away from `previous` (it re-renders as the cell size changes). */
async function estimateOtherThan(page: Page, previous: number): Promise<number> {
  for (let tries = 0; tries < 50; tries++) {
    const now = await estimatedPatches(page);
    if (now !== previous) return now;
    await page.waitForTimeout(100);
  }
  throw new Error(`the patch estimate stayed at ${previous}`);
}

describe.each<ViewportName>(['phone', 'wide'])('on a %s screen', (viewport) => {
  test('when the demo editor opens Cinder Flat, then its patch count and area show', async () => {
    const cinder = await StudyArea.findOne({ where: { name: 'Cinder Flat allotment' } });
    const { page, close } = await openBrowser(viewport);
    try {
      await signInAsDemo(page, server.url, person('editor').email);
      await page.getByRole('link', { name: 'Open Heron Bay marsh' }).waitFor();
      await page.getByRole('link', { name: 'New study area' }).waitFor();
      await screenshotWhole(page, `study-area-list-${viewport}`, viewport);

      await page.getByRole('link', { name: 'Open Cinder Flat allotment' }).click();
      await page.getByRole('heading', { name: 'Cinder Flat allotment' }).waitFor();
      await page.getByText(formatCount(cinder!.patchCount), { exact: true }).first().waitFor();
      await page.getByText(formatArea(cinder!.totalAreaM2, 'ha'), { exact: true }).first().waitFor();
      // The seeded start cover: four states with their patches.
      await page.getByRole('table', { name: 'Start cover per state' }).getByText('Shrub steppe').waitFor();
      await screenshotWhole(page, `study-area-detail-${viewport}`, viewport);
    } finally {
      await close();
    }
  });

  test('when the editor uploads a boundary and changes the cell size, then the estimate follows; created, it opens and takes a start cover', async () => {
    const name = `Heron Bay trial (${viewport})`;
    const { page, close } = await openBrowser(viewport);
    try {
      await signInAsDemo(page, server.url, person('editor').email);
      await page.getByRole('link', { name: 'New study area' }).click();
      await page.getByRole('heading', { name: 'New study area' }).waitFor();
      await page.getByLabel('Name', { exact: true }).fill(name);

      // A broken file: refused with the server's message saying what and where.
      await chooseFile(page, 'Choose a file', bowtieFile);
      await page.getByText('This file cannot be used').waitFor();
      await page.getByText(/crosses or touches itself \(edges 1 and 3\) at \[-116\.95, 43\.05\]/).waitFor();

      // Cinder Flat next (~3,500 ha): 10 m cells would be far past the patch cap.
      await chooseFile(page, 'Choose another file', cinderFlatFile);
      await page.getByText('Read from the file').waitFor();
      await page.getByLabel('Cell size (m)').fill('10');
      await page.getByText('Too many patches').waitFor();
      await page.getByText(/The smallest cell size that fits is [\d,]+ m\./).waitFor();
      await screenshotWhole(page, `study-area-create-refused-${viewport}`, viewport);
      await page.getByRole('button', { name: /^Use [\d,]+ m$/ }).click();
      await page.getByText('Too many patches').waitFor({ state: 'detached' });

      // Then the marsh, which is the one created.
      await chooseFile(page, 'Choose another file', heronBayFile);
      await page.getByText('heron-bay.geojson', { exact: false }).waitFor();
      await page.getByText('Reading the boundary…').waitFor({ state: 'detached' });
      await page.getByLabel('Cell size (m)').fill('100');
      await page.getByText('Too many patches').waitFor({ state: 'detached' });
      await page.getByRole('img', { name: 'Outline of the boundary with the patch grid' }).waitFor();
      await page.getByText(/^about [\d,]+$/).waitFor();

      const at100 = await estimatedPatches(page);
      await page.getByRole('radio', { name: '50 m', exact: true }).click();
      const at50 = await estimateOtherThan(page, at100);
      // Halving the cell size gives about four times as many patches.
      expect(at50 / at100).toBeGreaterThan(3.3);
      expect(at50 / at100).toBeLessThan(4.3);

      await page.getByLabel('Code of state 1').fill('W');
      await page.getByLabel('Name of state 1').fill('Water');
      await page.getByLabel('Code of state 2').fill('M');
      await page.getByLabel('Name of state 2').fill('Marsh');
      await screenshotWhole(page, `study-area-create-${viewport}`, viewport);

      await page.getByRole('button', { name: 'Create study area' }).click();
      await page.getByRole('heading', { name }).waitFor();
      const created = await StudyArea.findOne({ where: { name } });
      expect(created).not.toBeNull();
      expect(new URL(page.url()).pathname).toBe(`/study-areas/${created!.id}`);
      await page.getByText(formatCount(created!.patchCount), { exact: true }).first().waitFor();
      await page.getByText('No start cover yet. Set one below.').waitFor();

      await page.getByLabel('Water (%)').fill('30');
      await page.getByLabel('Marsh (%)').fill('70');
      await page.getByText('Sum: 100.0 %').waitFor();
      await page.getByRole('radio', { name: 'Exact counts' }).click();
      await page.getByLabel('Seed').fill('trial-seed');
      await page.getByRole('button', { name: 'Save start cover' }).click();
      await page.getByText(/^Set by exact counts, seed trial-seed/).waitFor();
      const cover = await StartCover.findByPk(created!.id);
      expect(cover?.proportions).toEqual([0.3, 0.7]);
      await page.getByRole('table', { name: 'Start cover per state' }).getByText('Water').waitFor();
      await screenshotWhole(page, `study-area-created-${viewport}`, viewport);

      // Then from a cover map: two polygons over the western two thirds, the east left bare.
      await page.getByRole('radio', { name: 'From a cover map' }).click();
      await chooseFile(page, 'Choose a file', writeCoverMap());
      await page.getByRole('radiogroup', { name: 'Attribute that names the cover' }).waitFor();
      // "Water" matches a state's name and is mapped already; "reed" is mapped by hand.
      expect(await page.getByRole('radiogroup', { name: 'Water (1 polygon) →' }).getByRole('radio', { name: 'Water' }).getAttribute('aria-checked')).toBe('true');
      await page.getByRole('radiogroup', { name: 'reed (1 polygon) →' }).getByRole('radio', { name: 'Marsh' }).click();
      await page.getByRole('button', { name: 'Save start cover from the map' }).click();
      // Without a fallback the server refuses, saying how many patches lie under no polygon.
      await page.getByText(/^[\d,]+ patch\(es\) lie under no mapped polygon/).waitFor();
      await page.getByRole('radiogroup', { name: /^Fallback state/ }).getByRole('radio', { name: 'Marsh' }).click();
      await page.getByRole('button', { name: 'Save start cover from the map' }).click();
      await page.getByText('Patches under no mapped polygon').waitFor();
      const mapped = await StartCover.findByPk(created!.id);
      expect(mapped?.method).toBe('cover-map');
      expect(mapped?.unmatchedCount).toBeGreaterThan(0);
      await page.getByText(`${formatCount(mapped!.unmatchedCount)} patches had no polygon`, { exact: false }).waitFor();
      await screenshotWhole(page, `study-area-cover-map-${viewport}`, viewport);
    } finally {
      await close();
    }
  });

  test('when the demo owner renames and deletes the study area the editor made, then it leaves the list', async () => {
    const name = `Heron Bay trial (${viewport})`;
    const { page, close } = await openBrowser(viewport);
    try {
      await signInAsDemo(page, server.url, person('owner').email);
      await page.getByRole('link', { name: `Open ${name}` }).click();
      await page.getByRole('heading', { name }).waitFor();
      await page.getByLabel('Study area name').fill(`${name} renamed`);
      await page.getByRole('button', { name: 'Save name and description' }).click();
      await page.getByRole('heading', { name: `${name} renamed` }).waitFor();
      await page.getByRole('button', { name: 'Delete study area' }).click();
      await page.getByRole('button', { name: 'Delete for good' }).click();
      await page.getByRole('link', { name: 'Open Cinder Flat allotment' }).waitFor();
      expect(await page.getByRole('link', { name: `Open ${name} renamed` }).count()).toBe(0);
      expect(await StudyArea.count({ where: { name: `${name} renamed` } })).toBe(0);
    } finally {
      await close();
    }
  });

  test('when the demo viewer signs in, then there is no way to create or delete a study area, and areas show in the chosen unit', async () => {
    const { page, close } = await openBrowser(viewport);
    try {
      await signInAsDemo(page, server.url, person('viewer').email);
      await page.getByRole('link', { name: 'Open Cinder Flat allotment' }).waitFor();
      expect(await page.getByText('New study area').count()).toBe(0);
      await page.getByRole('link', { name: 'Open Cinder Flat allotment' }).click();
      await page.getByRole('heading', { name: 'Cinder Flat allotment' }).waitFor();
      await page.getByRole('table', { name: 'Start cover per state' }).waitFor();
      expect(await page.getByText('Delete study area').count()).toBe(0);
      expect(await page.getByText('Save start cover').count()).toBe(0);

      // Areas follow the person's unit: acres (international, 4,046.8564224 m²) once chosen.
      const cinder = await StudyArea.findOne({ where: { name: 'Cinder Flat allotment' } });
      await page.getByRole('link', { name: 'Account' }).first().click();
      await page.getByRole('radio', { name: 'Acres' }).click();
      await page.getByRole('radio', { name: 'Acres', checked: true }).waitFor();
      await page.getByRole('link', { name: 'Study areas' }).first().click();
      await page.getByText(formatArea(cinder!.totalAreaM2, 'acres'), { exact: true }).first().waitFor();
    } finally {
      await close();
    }
  });
});
