import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('unknown addresses', () => {
  it('an unknown page shows the app’s own 404 page, signed out or in', async () => {
    const { page, context } = await newSession(browser, baseUrl);
    const response = await page.goto('/no/such/page');
    expect(response?.headers()['content-type']).toMatch(/text\/html/);
    await page.getByRole('heading', { name: 'Nothing at this address' }).waitFor();
    await screenshot(page, 'not-found-1280');

    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    await page.goto('/w/not-a-workspace-of-yours/team');
    await page.getByRole('heading', { name: 'Nothing at this address' }).waitFor();
    // inside the signed-in frame the rail is still there
    expect(await page.getByRole('button', { name: 'Sign out' }).count()).toBe(1);
    await context.close();
  });

  it('an unknown /api address answers JSON 404 with the shared error shape', async () => {
    const response = await fetch(`${baseUrl}/api/no-such-thing`);
    expect(response.status).toBe(404);
    expect(response.headers.get('content-type')).toMatch(/application\/json/);
    const body = await response.json();
    expect(body.error.code).toBe('not_found');
    expect(typeof body.error.message).toBe('string');
  });
});
