import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoUsers, launchBrowser, newSession, screenshot, TABLET } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('sign-in page in demo mode', () => {
  it('lists each demo user with their role and fills the form in one click', async () => {
    const users = await demoUsers(baseUrl);
    expect(users.map((u) => u.role).sort()).toEqual(['admin', 'engineer', 'lead', 'viewer']);
    const { page, context } = await newSession(browser, baseUrl);
    await page.goto('/');
    await page.waitForURL('**/signin');
    const list = page.getByRole('region', { name: 'Demo accounts' });
    await list.getByText(users[0].email).waitFor();
    for (const u of users) expect(await list.getByText(u.email).count()).toBe(1);
    await screenshot(page, 'sign-in-1280');

    const lead = users.find((u) => u.role === 'lead')!;
    await list.getByRole('button', { name: `Fill in ${lead.name} (lead)` }).click();
    expect(await page.getByLabel('E-mail').inputValue()).toBe(lead.email);
    expect(await page.getByLabel('Password', { exact: true }).inputValue()).toBe(lead.password);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.waitForURL('**/w/*');
    await page.getByText(/Your role:\s*lead/).waitFor();
    await context.close();
  });

  it('a wrong password keeps you on the page with a message, and the tablet layout still shows the list', async () => {
    const users = await demoUsers(baseUrl);
    const { page, context } = await newSession(browser, baseUrl, TABLET);
    await page.goto('/signin');
    await page.getByLabel('E-mail').fill(users[0].email);
    await page.getByLabel('Password', { exact: true }).fill('not-the-password');
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('alert').first().waitFor();
    expect(new URL(page.url()).pathname).toBe('/signin');
    expect(await page.getByRole('region', { name: 'Demo accounts' }).isVisible()).toBe(true);
    await screenshot(page, 'sign-in-wrong-password-820');
    await context.close();
  });
});
