// Debian's Chromium driven by playwright-core, started with the flags this machine needs
// (no sandbox as root, no background networking on a closed network). Every session gets a fresh
// profile (--user-data-dir), so no cookies carry over between tests.
import { mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

export const viewports = {
  phone: { width: 390, height: 844 },
  wide: { width: 1440, height: 900 },
} as const;
export type ViewportName = keyof typeof viewports;

export const screenshotDir = path.resolve(__dirname, '..', 'output', 'screenshots');

export type BrowserSession = { context: BrowserContext; page: Page; close(): Promise<void> };

export async function openBrowser(viewport: ViewportName): Promise<BrowserSession> {
  const profile = mkdtempSync(path.join(tmpdir(), 'patchcast-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: '/usr/bin/chromium',
    headless: true,
    viewport: viewports[viewport],
    args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
  mkdirSync(screenshotDir, { recursive: true });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close();
      rmSync(profile, { recursive: true, force: true });
    },
  };
}

export async function screenshot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.join(screenshotDir, `${name}.png`), fullPage: true });
}
