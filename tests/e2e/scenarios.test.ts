// Scenarios in the browser: the demo editor builds one by typing, by pasting a block copied from
// a spreadsheet and from an uploaded plot survey; the demo viewer reads it and cannot change it.
// Screenshots of the editor and its analysis panel on a phone and on a wide screen.
import { signInAsDemo } from '../support/demo-sign-in';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { openBrowser, screenshot, viewports } from '../support/browser';
import { startLiveServer, type LiveServer } from '../support/live-server';
import { DEMO_TEAM, demoPeople } from '../../server/seed/demo';

jest.setTimeout(240_000);

const SURVEY_CSV = path.resolve(__dirname, '..', 'fixtures', 'surveys', 'plots-own-headers.csv');
const editor = demoPeople.find((p) => p.role === 'editor')!;
const viewer = demoPeople.find((p) => p.role === 'viewer')!;

let server: LiveServer;
let studyAreaId: number;
let scenarioPath: string;

beforeAll(async () => {
  server = await startLiveServer();
});
afterAll(() => server?.close());

/** The demo study area's id, read through the API with the page's session. */
async function cinderFlatId(page: Page): Promise<number> {
  const { teams } = (await (await page.request.get(`${server.url}/api/v1/teams`)).json()) as { teams: { id: number; name: string }[] };
  const team = teams.find((t) => t.name === DEMO_TEAM)!;
  const { studyAreas } = (await (await page.request.get(`${server.url}/api/v1/teams/${team.id}/study-areas`)).json()) as {
    studyAreas: { id: number; name: string }[];
  };
  return studyAreas.find((a) => a.name === 'Cinder Flat allotment')!.id;
}

/** What a spreadsheet puts on the clipboard, delivered as a real paste event to one entry. */
async function paste(cell: Locator, text: string): Promise<void> {
  await cell.evaluate((node, block) => {
    const data = new DataTransfer();
    data.setData('text/plain', block);
    node.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
  }, text);
}

const phase = (page: Page, n: number): Locator => page.getByRole('group', { name: `Phase ${n}` });
const entry = (scope: Locator, from: string, to: string): Locator => scope.getByLabel(`From ${from} to ${to}`, { exact: true });

const TYPED: [string, string[]][] = [
  ['Shrub steppe', ['0.9', '0.05', '0.03', '0.02']],
  ['Perennial grassland', ['0.04', '0.86', '0.08', '0.02']],
  ['Annual grassland', ['0.01', '0.09', '0.82', '0.08']],
  ['Bare soil', ['0', '0.1', '0.3', '0.6']],
];
const NAMES = TYPED.map(([name]) => name);

test('when the editor types a matrix, then bad entries are marked and the scenario is created with its analysis', async () => {
  const { page, close } = await openBrowser('wide');
  try {
    await signInAsDemo(page, server.url, editor.email);
    studyAreaId = await cinderFlatId(page);
    await page.goto(`${server.url}/study-areas/${studyAreaId}/scenarios/new`);
    await page.getByRole('heading', { name: 'New scenario' }).waitFor();
    await page.getByLabel('Name', { exact: true }).fill('Grazing as now (typed)');
    await page.getByLabel('Years per step', { exact: true }).fill('2');

    const first = phase(page, 1);
    await entry(first, 'Shrub steppe', 'Shrub steppe').fill('1.2');
    await page.getByText('SS → SS: More than 1: probabilities are 0 to 1').waitFor();
    for (const [from, values] of TYPED) {
      for (const [j, value] of values.entries()) await entry(first, from, NAMES[j]).fill(value);
    }
    await page.getByText('Live: computed in your browser', { exact: false }).waitFor();
    expect(await page.getByText(/things? to fix/).count()).toBe(0);

    await page.getByRole('button', { name: 'Create scenario' }).click();
    await page.getByRole('heading', { name: 'Grazing as now (typed)' }).waitFor();
    scenarioPath = new URL(page.url()).pathname;
    expect(scenarioPath).toMatch(new RegExp(`^/study-areas/${studyAreaId}/scenarios/\\d+$`));
    await page.getByText('For the saved scenario, computed on the server.').waitFor();
    await page.getByText('Every state can reach every other', { exact: false }).first().waitFor();
    await page.getByText('Read with care').waitFor();
  } finally {
    await close();
  }
});

test('when the editor pastes a block into a second phase, then a bad row is refused by the server and saved once normalised', async () => {
  const { page, close } = await openBrowser('wide');
  try {
    await signInAsDemo(page, server.url, editor.email);
    await page.goto(`${server.url}${scenarioPath}`);
    await page.getByRole('heading', { name: 'Grazing as now (typed)' }).waitFor();
    await page.getByRole('button', { name: 'Add phase' }).click();
    await page.getByLabel('Phase 1 ends at step').fill('3');

    const second = phase(page, 2);
    // Copied with its labels from a spreadsheet; the Bare soil row sums to 0.9.
    const block = ['\tSS\tPG\tAG\tBS', 'SS\t0.8\t0.1\t0.06\t0.04', 'PG\t0.02\t0.9\t0.06\t0.02', 'AG\t0\t0.2\t0.7\t0.1', 'BS\t0\t0.2\t0.3\t0.4', ''].join('\n');
    await paste(entry(second, 'Shrub steppe', 'Shrub steppe'), block);
    await page.getByText('Pasted 16 entries.').waitFor();
    expect(await entry(second, 'Annual grassland', 'Perennial grassland').inputValue()).toBe('0.2');

    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await second.getByText(/phase 2: .*sums to 0\.9/i).first().waitFor();

    await second.getByRole('button', { name: 'Normalise rows' }).click();
    // Shown to 4 decimals while not edited; the full value is kept and appears on focus.
    const normalised = entry(second, 'Bare soil', 'Bare soil');
    expect(await normalised.inputValue()).toBe('0.4444…');
    await normalised.focus();
    expect(await normalised.inputValue()).toBe(String(0.4 / 0.9));
    await normalised.blur();
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await page.getByText('Phase 2, from step 3 on').waitFor();
    await page.getByText('For the saved scenario, computed on the server.').waitFor();
  } finally {
    await close();
  }
});

test('when the editor uploads a plot survey with other names, then it maps columns and labels and uses the estimate in a phase', async () => {
  const { page, close } = await openBrowser('wide');
  try {
    await signInAsDemo(page, server.url, editor.email);
    await page.goto(`${server.url}/study-areas/${studyAreaId}/surveys/new`);
    const chooser = page.waitForEvent('filechooser');
    await page.getByRole('button', { name: 'Choose a CSV file' }).click();
    await (await chooser).setFiles(SURVEY_CSV);

    const pick = async (group: string, option: string): Promise<void> => {
      await page.getByRole('radiogroup', { name: group, exact: true }).getByRole('radio', { name: option, exact: true }).click();
    };
    await page.getByRole('radiogroup', { name: 'Plot column' }).waitFor();
    await pick('Plot column', 'plot_code');
    await pick('Time column', 'visit_yr');
    await pick('State column', 'veg');
    const labels: [string, string][] = [['sagebrush', 'SS · Shrub steppe'], ['bunchgrass', 'PG · Perennial grassland'], ['cheatgrass', 'AG · Annual grassland'], ['bare', 'BS · Bare soil']];
    for (const [label, state] of labels) {
      await page.getByRole('radiogroup', { name: new RegExp(`^"${label}"`) }).getByRole('radio', { name: state, exact: true }).click();
    }
    await page.getByRole('radiogroup', { name: /^"not visited"/ }).getByRole('radio', { name: 'Leave out' }).click();
    await page.getByLabel('Survey name').fill('Juniper plots 2015–2020 (invented)');
    await page.getByRole('button', { name: 'Estimate the matrix' }).click();

    await page.getByRole('heading', { name: 'Juniper plots 2015–2020 (invented)' }).waitFor();
    await page.getByText('Estimated matrix').waitFor();
    await page.getByText(/Successive states independent/).waitFor();
    await screenshot(page, 'survey-estimate-wide');

    await page.getByRole('radiogroup', { name: 'Scenario' }).getByRole('radio', { name: 'Grazing as now (typed)' }).click();
    await page.getByRole('radiogroup', { name: 'Phase' }).getByRole('radio', { name: /Phase 2/ }).click();
    await page.getByRole('button', { name: 'Use this estimate' }).click();
    await page.getByRole('heading', { name: 'Grazing as now (typed)' }).waitFor();
    await phase(page, 2).getByText('Estimated from the survey').waitFor();
    await page.getByText(/Estimation uncertainty \(5 %–95 % range\)/).waitFor();
    await page.getByText('5–95 % range').first().waitFor();

    for (const size of ['wide', 'phone'] as const) {
      await page.setViewportSize(viewports[size]);
      await screenshot(page, `scenario-top-${size}`);
      await phase(page, 2).scrollIntoViewIfNeeded();
      await screenshot(page, `scenario-matrix-${size}`);
      await page.getByRole('heading', { name: 'Expected path' }).scrollIntoViewIfNeeded();
      await screenshot(page, `scenario-analysis-${size}`);
      await page.getByText('5–95 % range').first().scrollIntoViewIfNeeded();
      await screenshot(page, `scenario-ranges-${size}`);
    }
  } finally {
    await close();
  }
});

test('when the viewer opens the scenario, then they read it and cannot change it', async () => {
  const { page, close } = await openBrowser('phone');
  try {
    await signInAsDemo(page, server.url, viewer.email);
    await page.goto(`${server.url}/study-areas/${studyAreaId}/scenarios`);
    await page.getByRole('link', { name: 'Grazing as now (typed)' }).waitFor();
    expect(await page.getByText('New scenario').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Delete' }).count()).toBe(0);

    await page.goto(`${server.url}${scenarioPath}`);
    await page.getByText('Read only').waitFor();
    const cell = entry(phase(page, 1), 'Shrub steppe', 'Shrub steppe');
    expect(await cell.inputValue()).toBe('0.9');
    expect(await cell.isEditable()).toBe(false);
    expect(await page.getByRole('button', { name: 'Save', exact: true }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Normalise rows' }).count()).toBe(0);
    await page.getByRole('button', { name: 'Export CSV' }).first().waitFor();
    await screenshot(page, 'scenario-viewer-phone');
  } finally {
    await close();
  }
});
