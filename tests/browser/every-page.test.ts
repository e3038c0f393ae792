import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { apiSession, demoUser, launchBrowser, newSession, signIn } from './helpers/browser.ts';
import { detailPages } from './helpers/demo-pages.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Page errors and console errors from here on, with the path they happened on. */
function collectErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('pageerror', (error) => errors.push(`${new URL(page.url()).pathname}: page error: ${error.message}`));
  page.on('console', (message) => {
    if (message.type() === 'error') errors.push(`${new URL(page.url()).pathname}: console error: ${message.text()}`);
  });
  return errors;
}

/**
 * A page is done when its heading is there, no spinner turns (data has arrived) and every chart
 * region has its canvas. Not network idle: a page with a live run keeps working in the background.
 */
async function settle(page: Page): Promise<void> {
  await page.locator('main h1').first().waitFor();
  await page.locator('main [role="status"]').first().waitFor({ state: 'detached' });
  for (const chart of await page.locator('.rw-chart').all()) await chart.locator('canvas').waitFor();
}

it('every detail page of the demo data opens without a page error or console error', { timeout: 600_000 }, async () => {
  const engineer = await demoUser(baseUrl, 'engineer');
  const api = await apiSession(baseUrl, engineer.email);
  const paths = await detailPages(api);
  await api.dispose();
  // the seed has several of each; a short list means the lookup broke, not that all is well
  expect(paths.length).toBeGreaterThanOrEqual(20);

  const { page, context } = await newSession(browser, baseUrl);
  await signIn(page, engineer.email);
  const errors = collectErrors(page);
  for (const path of paths) {
    await page.goto(path);
    await settle(page);
  }
  expect(errors).toEqual([]);
  await context.close();
});

it('the add-a-road form draws its spectrum without an error', async () => {
  const engineer = await demoUser(baseUrl, 'engineer');
  const { page, context } = await newSession(browser, baseUrl);
  await signIn(page, engineer.email);
  const errors = collectErrors(page);
  const workspace = new URL(page.url()).pathname.split('/')[2];
  await page.goto(`/w/${workspace}/roads`);
  await page.getByRole('button', { name: 'Add a road' }).click();
  const psd = page.getByRole('figure', { name: 'Road displacement PSD against ISO 8608 classes' });
  await psd.locator('canvas').waitFor();
  await page.waitForLoadState('networkidle');
  expect(errors).toEqual([]);
  await context.close();
});
