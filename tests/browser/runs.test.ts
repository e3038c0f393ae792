import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';

const baseUrl = inject('baseUrl');
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function openRunsAs(role: 'engineer' | 'viewer' | 'lead') {
  const user = await demoUser(baseUrl, role);
  const session = await newSession(browser, baseUrl);
  await signIn(session.page, user.email);
  const workspaceId = new URL(session.page.url()).pathname.split('/')[2];
  await session.page.goto(`/w/${workspaceId}/runs`);
  await session.page.getByRole('form', { name: 'Run a setup' }).waitFor();
  return { ...session, workspaceId };
}

describe('runs in the browser', () => {
  it('runs a demo setup and shows the dashboard', async () => {
    const { page, context } = await openRunsAs('engineer');
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await page.getByTestId('run-dashboard').waitFor({ timeout: 60_000 });
    await page.waitForTimeout(500);
    await screenshot(page, 'run-dashboard-1280');
    await page.getByTestId('figure-panels').screenshot({ path: 'test-results/run-figures-crop.png' });
    await page.getByRole('region', { name: 'Damper curve and where the run used it' }).screenshot({ path: 'test-results/run-damper-crop.png' });
    await context.close();
  });
});
