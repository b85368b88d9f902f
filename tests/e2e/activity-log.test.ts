// The team's activity log on the Team screen: the demo owner reads how the demo team came
// together; a viewer is not shown the log (owners only, like its API route).
import { openBrowser, screenshot, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { signInAsDemo } from '../support/demo-sign-in';
import { demoPeople } from '../../server/seed/demo';
import type { Role } from '../../shared/schemas';

jest.setTimeout(120_000);

let server: LiveServer;
beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

const person = (role: Role) => demoPeople.find((p) => p.role === role)!;

async function openTeamAs(role: Role, viewport: ViewportName) {
  const browser = await openBrowser(viewport);
  const { page } = browser;
  await signInAsDemo(page, server.url, person(role).email);
  await page.goto(`${server.url}/team`);
  await page.getByText('Members (3)').waitFor();
  return browser;
}

describe.each<ViewportName>(['phone', 'wide'])('on a %s screen', (viewport) => {
  test('when the demo owner opens the team, then the activity log lists its invitations and role change, newest first', async () => {
    const { page, close } = await openTeamAs('owner', viewport);
    try {
      const roleChange = page.getByText('Rosa Delgado (demo owner) changed Tomas Whitfield (demo editor) from viewer to editor');
      await roleChange.waitFor();
      const deletion = page.getByText('Rosa Delgado (demo owner) deleted the study area "Cinder Flat trial grid"');
      expect((await deletion.boundingBox())!.y).toBeLessThan((await roleChange.boundingBox())!.y);
      await roleChange.scrollIntoViewIfNeeded();
      await screenshot(page, `activity-log-${viewport}`);
    } finally {
      await close();
    }
  });
});

test('when the demo viewer opens the team, then there is no activity log', async () => {
  const { page, close } = await openTeamAs('viewer', 'phone');
  try {
    expect(await page.getByText('Activity log').count()).toBe(0);
  } finally {
    await close();
  }
});
