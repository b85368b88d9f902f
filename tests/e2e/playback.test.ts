// Watching a demo run and comparing two: play, scrub to the last step with the slider, open a
// patch in the inspector, then compare the two Cinder Flat runs through a shareable link.
// Screenshots on a phone (390 × 844) and a wide screen (1440 × 900).
import { signInAsDemo } from '../support/demo-sign-in';
import type { Page } from 'playwright-core';
import { openBrowser, screenshot, viewports, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_TEAM, demoPeople } from '../../server/seed/demo';

jest.setTimeout(240_000);

const viewer = demoPeople.find((p) => p.role === 'viewer')!;

let server: LiveServer;

beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

type RunRow = { id: number; status: string; steps: number; yearsPerStep: number; inputs: { scenarioName: string; totalAreaM2: number } };

/** Cinder Flat's id and its finished demo runs, read through the API with the page's session. */
async function cinderFlatRuns(page: Page): Promise<{ studyAreaId: number; runs: RunRow[] }> {
  const get = async <T>(path: string): Promise<T> => (await (await page.request.get(`${server.url}/api/v1${path}`)).json()) as T;
  const { teams } = await get<{ teams: { id: number; name: string }[] }>('/teams');
  const team = teams.find((t) => t.name === DEMO_TEAM)!;
  const { studyAreas } = await get<{ studyAreas: { id: number; name: string }[] }>(`/teams/${team.id}/study-areas`);
  const studyAreaId = studyAreas.find((a) => a.name === 'Cinder Flat allotment')!.id;
  const { runs } = await get<{ runs: RunRow[] }>(`/study-areas/${studyAreaId}/runs`);
  return { studyAreaId, runs: runs.filter((r) => r.status === 'succeeded').sort((a, b) => a.id - b.id) };
}

/** The app scrolls inside its own view: grow the window to the page's height for a whole-page shot. */
async function wholePageShot(page: Page, viewport: ViewportName, name: string, height: number): Promise<void> {
  await page.setViewportSize({ width: viewports[viewport].width, height });
  await page.waitForTimeout(300);
  await screenshot(page, name);
  await page.setViewportSize(viewports[viewport]);
}

const stepText = async (page: Page): Promise<string> => (await page.getByTestId('step-label').textContent()) ?? '';

/** Drags the step slider's thumb to its right end. */
async function scrubToEnd(page: Page): Promise<void> {
  const slider = page.getByRole('slider', { name: 'Step', exact: true });
  await slider.scrollIntoViewIfNeeded();
  const box = (await slider.boundingBox())!;
  await page.mouse.move(box.x + 12, box.y + box.height / 2);
  await page.mouse.down();
  await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2, { steps: 4 });
  await page.mouse.move(box.x + box.width + 20, box.y + box.height / 2, { steps: 4 });
  await page.mouse.up();
}

/** Taps the map a little off its centre, where the demo boundary has patches. */
async function tapPatch(page: Page): Promise<void> {
  const map = page.getByTestId('playback-map');
  await map.scrollIntoViewIfNeeded();
  const box = (await map.boundingBox())!;
  await page.mouse.click(box.x + box.width * 0.45, box.y + box.height * 0.5);
}

async function watch(viewport: ViewportName): Promise<void> {
  const { page, close } = await openBrowser(viewport);
  try {
    await signInAsDemo(page, server.url, viewer.email);
    const { studyAreaId, runs } = await cinderFlatRuns(page);
    expect(runs.length).toBeGreaterThanOrEqual(2);
    const run = runs[0];
    await page.goto(`${server.url}/study-areas/${studyAreaId}/watch/${run.id}`);
    await page.getByRole('heading', { name: `Watch run ${run.id}: ${run.inputs.scenarioName}` }).waitFor();
    await page.getByText(/ha · \d+\.\d %/).first().waitFor();
    expect(await stepText(page)).toBe('Step 0 · Year 0');
    // The legend's areas add up to the study area (each is rounded for display).
    const legend = await page.getByRole('list', { name: 'Legend' }).innerText();
    const hectares = [...legend.matchAll(/([\d,.]+) ha/g)].map((m) => Number(m[1].replace(/,/g, '')));
    expect(hectares).toHaveLength(4);
    expect(Math.abs(hectares.reduce((sum, ha) => sum + ha, 0) - run.inputs.totalAreaM2 / 10_000)).toBeLessThan(2);

    // Play for a moment, then pause: the step moved on.
    await page.getByRole('button', { name: 'Play' }).click();
    await page.waitForFunction(() => !document.querySelector('[data-testid="step-label"]')?.textContent?.startsWith('Step 0 '));
    await page.getByRole('button', { name: 'Pause' }).click();
    expect(await stepText(page)).not.toBe('Step 0 · Year 0');

    await scrubToEnd(page);
    await page.getByText(`Step ${run.steps} · Year ${run.steps * run.yearsPerStep}`).waitFor();
    if (viewport === 'wide') {
      await page.keyboard.press('ArrowLeft');
      await page.getByText(`Step ${run.steps - 1} · Year`, { exact: false }).waitFor();
      await page.keyboard.press('ArrowRight');
      await page.getByText(`Step ${run.steps} · Year`, { exact: false }).waitFor();
    }

    if (viewport === 'wide') {
      // The wheel zooms the map in; "Whole area" shows all of it again.
      const map = (await page.getByTestId('playback-map').boundingBox())!;
      await page.mouse.move(map.x + map.width / 2, map.y + map.height / 2);
      await page.mouse.wheel(0, -300);
      await page.getByRole('button', { name: 'Zoom out', disabled: false }).waitFor();
      await page.getByRole('button', { name: 'Whole area' }).click();
    }
    await tapPatch(page);
    await page.getByRole('region', { name: /^Patch \d+$/ }).waitFor();
    await page.getByText(/Cell centre -?\d+\.\d+° N/).waitFor();
    await page.waitForFunction(() => !document.body.innerText.includes('steps still loading'));
    await wholePageShot(page, viewport, `playback-${viewport}`, viewport === 'phone' ? 2300 : 1000);
  } finally {
    await close();
  }
}

async function compare(viewport: ViewportName): Promise<void> {
  const { page, close } = await openBrowser(viewport);
  try {
    await signInAsDemo(page, server.url, viewer.email);
    const { studyAreaId, runs } = await cinderFlatRuns(page);
    const [a, b] = runs;
    await page.goto(`${server.url}/study-areas/${studyAreaId}/compare?runs=${a.id}`);
    await page.getByRole('heading', { name: 'Compare runs' }).waitFor();
    await page.getByText('Pick at least two runs to compare.').waitFor();
    await page.getByRole('checkbox', { name: `Run ${b.id} · ${b.inputs.scenarioName}` }).click();
    await page.waitForURL((url) => url.searchParams.get('runs') === `${a.id},${b.id}`);
    await page.getByRole('table', { name: 'Comparison at the chosen step' }).waitFor();
    await page.getByText(`Step ${a.steps} · Year`, { exact: false }).first().waitFor();
    expect(await page.getByRole('cell', { name: '(reference)' }).count()).toBe(4);
    // A teammate opening the same address sees the same comparison.
    const { page: other, close: closeOther } = await openBrowser(viewport);
    try {
      await signInAsDemo(other, server.url, viewer.email);
      await other.goto(page.url());
      await other.getByRole('table', { name: 'Comparison at the chosen step' }).waitFor();
      expect(await other.getByRole('checkbox', { checked: true }).count()).toBe(2);
    } finally {
      await closeOther();
    }
    await page.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server.url });
    await page.getByRole('button', { name: 'Copy link' }).click();
    await page.getByText('Link copied', { exact: false }).waitFor();
    expect(await page.evaluate(() => navigator.clipboard.readText())).toBe(`${server.url}/study-areas/${studyAreaId}/compare?runs=${a.id},${b.id}`);
    await wholePageShot(page, viewport, `compare-${viewport}`, viewport === 'phone' ? 3000 : 1900);
  } finally {
    await close();
  }
}

test('on a wide screen, when the viewer plays, scrubs to the last step and taps a patch, then the map, chart and inspector follow', () => watch('wide'));
test('on a phone, when the viewer plays, scrubs to the last step and taps a patch, then the map, chart and inspector follow', () => watch('phone'));
test('when two runs are picked for comparison, then the address holds them and a teammate opens the same comparison', () => compare('wide'));
test('on a phone, the comparison reads in one column', () => compare('phone'));
