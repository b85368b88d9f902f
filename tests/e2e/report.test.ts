// The printable run report for the demo viewer: reached from the run page's Downloads section,
// it shows the inputs, shares, chart and three maps, and printed it drops the navigation.
// Screenshots on a phone (390 × 844) and a wide screen (1440 × 900), on screen and as printed.
import { signInAsDemo } from '../support/demo-sign-in';
import type { Page } from 'playwright-core';
import { openBrowser, screenshot, viewports, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_TEAM, demoPeople } from '../../server/seed/demo';
import { RUN_CAUTION } from '../../shared/schemas';

jest.setTimeout(240_000);

const viewer = demoPeople.find((p) => p.role === 'viewer')!;

let server: LiveServer;
beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

/** Cinder Flat's id and its first finished demo run, read through the API with the page's session. */
async function firstCinderRun(page: Page): Promise<{ studyAreaId: number; runId: number; steps: number }> {
  const get = async <T>(path: string): Promise<T> => (await (await page.request.get(`${server.url}/api/v1${path}`)).json()) as T;
  const { teams } = await get<{ teams: { id: number; name: string }[] }>('/teams');
  const team = teams.find((t) => t.name === DEMO_TEAM)!;
  const { studyAreas } = await get<{ studyAreas: { id: number; name: string }[] }>(`/teams/${team.id}/study-areas`);
  const studyAreaId = studyAreas.find((a) => a.name === 'Cinder Flat allotment')!.id;
  const { runs } = await get<{ runs: { id: number; status: string; steps: number }[] }>(`/study-areas/${studyAreaId}/runs`);
  const run = runs.filter((r) => r.status === 'succeeded').sort((a, b) => a.id - b.id)[0];
  return { studyAreaId, runId: run.id, steps: run.steps };
}

/** The app scrolls inside its own view: grow the window to the page's height for a whole-page shot. */
async function wholePageShot(page: Page, viewport: ViewportName, name: string): Promise<void> {
  const height = await page.evaluate(() => Math.max(...Array.from(document.querySelectorAll('div'), (d) => d.scrollHeight)));
  await page.setViewportSize({ width: viewports[viewport].width, height: Math.min(height + 40, 8000) });
  await page.waitForTimeout(300);
  await screenshot(page, name);
  await page.setViewportSize(viewports[viewport]);
}

describe.each<ViewportName>(['phone', 'wide'])('on a %s screen', (viewport) => {
  test('when the demo viewer opens the report from the run page, then inputs, shares, chart and maps show, and print hides the navigation', async () => {
    const { page, close } = await openBrowser(viewport);
    try {
      await signInAsDemo(page, server.url, viewer.email);
      const { studyAreaId, runId, steps } = await firstCinderRun(page);
      await page.goto(`${server.url}/study-areas/${studyAreaId}/runs/${runId}`);
      await page.getByRole('heading', { name: 'Downloads' }).waitFor();
      await page.getByText('Patch history, every step (CSV)').waitFor();
      await wholePageShot(page, viewport, `run-downloads-${viewport}`);
      await page.getByText('Printable run report').click();

      await page.getByRole('heading', { name: 'Run report: Current grazing' }).waitFor();
      await page.getByText(RUN_CAUTION).waitFor();
      await page.getByText('Fingerprint', { exact: true }).waitFor();
      await page.getByRole('table', { name: /Phase 1/ }).waitFor();
      await page.getByRole('img', { name: /Median area share/ }).waitFor();
      for (const step of [0, steps / 2, steps]) await page.getByRole('img', { name: new RegExp(`Map of the patches by cover state, Step ${step},`) }).waitFor();
      await page.getByText('Print', { exact: true }).waitFor();
      await wholePageShot(page, viewport, `report-${viewport}`);

      await page.emulateMedia({ media: 'print' });
      const hidden = await page.evaluate(() =>
        ['shell-nav-rail', 'shell-tab-bar', 'shell-top-bar', 'report-controls'].map((id) => {
          const el = document.getElementById(id);
          return el === null || getComputedStyle(el).display === 'none';
        }),
      );
      expect(hidden).toEqual([true, true, true, true]);
      await screenshot(page, `report-${viewport}-print`);
      await page.emulateMedia({ media: 'screen' });
    } finally {
      await close();
    }
  });
});
