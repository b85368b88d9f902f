// Names are text everywhere: a team, study area and scenario named with markup show those exact
// characters on every screen that names them, and nothing in them runs or becomes an element.
// Screenshots on a phone (390 × 844) and a wide screen (1440 × 900).
import type { Page } from 'playwright-core';
import { signInAsDemo } from '../support/demo-sign-in';
import { openBrowser, screenshot, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_TEAM, demoPeople } from '../../server/seed/demo';
import { Scenario, StudyArea, Team } from '../../server/models';

jest.setTimeout(240_000);

const owner = demoPeople.find((p) => p.role === 'owner')!;
// Classic script-injection probes (common practice in web security testing): each would set a
// flag on window, open a dialog or add an <img src="x"> if a screen treated it as markup.
const TEAM_NAME = '<b>Wash</b> & "Co" <script>window.__ran=1</script>';
const AREA_NAME = '<img src=x onerror="window.__ran=2">Cinder';
const SCENARIO_NAME = '"><svg onload=alert(3)> Grazing';

let server: LiveServer;
let ids: { studyAreaId: number; scenarioId: number };

beforeAll(async () => {
  server = await startLiveServer();
  const team = (await Team.findOne({ where: { name: DEMO_TEAM } }))!;
  await team.update({ name: TEAM_NAME });
  const area = (await StudyArea.findOne({ where: { teamId: team.id, name: 'Cinder Flat allotment' } }))!;
  await area.update({ name: AREA_NAME });
  // Runs keep the names they were started with (frozen inputs); the scenario itself shows the new one.
  const scenario = (await Scenario.findOne({ where: { studyAreaId: area.id }, order: [['id', 'ASC']] }))!;
  await scenario.update({ name: SCENARIO_NAME });
  ids = { studyAreaId: area.id, scenarioId: scenario.id };
});
afterAll(() => server?.close());

/** Fails the test if anything in a name ran: a dialog, the window flag, or an injected element. */
async function expectNothingRan(page: Page, dialogs: string[]): Promise<void> {
  expect(dialogs).toEqual([]);
  expect(await page.evaluate(() => (window as unknown as { __ran?: number }).__ran)).toBeUndefined();
  expect(await page.locator('img[src="x"], svg[onload], script:not([src])').count()).toBe(0);
}

describe.each<ViewportName>(['phone', 'wide'])('on a %s screen', (viewport) => {
  test('when names hold markup, then the study-area list, scenario list, scenario and team pages show them as typed', async () => {
    const { page, close } = await openBrowser(viewport);
    const dialogs: string[] = [];
    page.on('dialog', (dialog) => {
      dialogs.push(dialog.message());
      void dialog.dismiss();
    });
    try {
      await signInAsDemo(page, server.url, owner.email);
      await page.getByText(AREA_NAME).first().waitFor();
      await screenshot(page, `markup-names-list-${viewport}`);
      await expectNothingRan(page, dialogs);

      await page.goto(`${server.url}/study-areas/${ids.studyAreaId}/scenarios`);
      await page.getByText(SCENARIO_NAME).first().waitFor();
      await expectNothingRan(page, dialogs);

      await page.goto(`${server.url}/study-areas/${ids.studyAreaId}/scenarios/${ids.scenarioId}`);
      await page.getByRole('heading', { name: SCENARIO_NAME }).waitFor();
      await screenshot(page, `markup-names-scenario-${viewport}`);
      await expectNothingRan(page, dialogs);

      await page.goto(`${server.url}/team`);
      await page.getByText(TEAM_NAME).first().waitFor();
      await screenshot(page, `markup-names-team-${viewport}`);
      await expectNothingRan(page, dialogs);
    } finally {
      await close();
    }
  });
});
