// The demo editor signs in through the real page and sees the study-area list, on a phone and
// on a wide screen.
import { openBrowser, screenshot, type ViewportName } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_PASSWORD, DEMO_TEAM, demoPeople } from '../../server/seed/demo';

jest.setTimeout(120_000);

let server: LiveServer;
beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

const editor = demoPeople.find((p) => p.role === 'editor')!;

describe.each<ViewportName>(['phone', 'wide'])('on a %s screen', (viewport) => {
  test('when the demo editor signs in, then the study-area list of the demo team shows', async () => {
    const { page, close } = await openBrowser(viewport);
    try {
      await page.goto(`${server.url}/`);
      // Not signed in: the app sends the visitor to the sign-in page.
      await page.getByLabel('E-mail').waitFor();
      expect(new URL(page.url()).pathname).toBe('/sign-in');
      await screenshot(page, `sign-in-${viewport}`);

      await page.getByLabel('E-mail').fill(editor.email);
      await page.getByLabel('Password').fill(DEMO_PASSWORD);
      await page.getByText('Sign in', { exact: true }).last().click();

      await page.getByRole('heading', { name: 'Study areas' }).waitFor();
      await page.getByText(DEMO_TEAM).first().waitFor();
      // The list itself: both invented demo study areas.
      await page.getByText('Cinder Flat allotment').first().waitFor();
      await page.getByText('Heron Bay marsh').first().waitFor();
      await screenshot(page, `study-areas-${viewport}`);
    } finally {
      await close();
    }
  });
});
