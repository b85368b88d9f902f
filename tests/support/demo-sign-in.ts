// Signs a demo person in through the real sign-in page and waits for the study-area list.
import type { Page } from 'playwright-core';
import { DEMO_PASSWORD } from '../../server/seed/demo';

export async function signInAsDemo(page: Page, baseUrl: string, email: string): Promise<void> {
  await page.goto(`${baseUrl}/sign-in`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByText('Sign in', { exact: true }).last().click();
  await page.getByRole('heading', { name: 'Study areas' }).waitFor();
}
