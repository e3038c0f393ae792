import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshEmail, launchBrowser, newSession, screenshot } from './helpers/browser.ts';
import { signUpAndConfirm } from './helpers/sign-up.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('API tokens on the account page', () => {
  it('makes a token shown once that a script can use, and revoking it stops it at once', async () => {
    const here = await newSession(browser, baseUrl);
    await signUpAndConfirm(here.page, baseUrl, { name: 'Wren Tallow', email: freshEmail('wren.tallow'), password: 'long-enough-pw-1', workspaceName: 'Tallow bench' });
    const me = (await (await here.page.request.get(`${baseUrl}/api/auth/me`)).json()) as { memberships: { workspaceId: string }[] };
    const workspaceId = me.memberships[0]?.workspaceId;
    expect(workspaceId).toBeTruthy();

    await here.page.getByRole('link', { name: 'Account' }).click();
    await here.page.getByRole('heading', { name: 'API tokens' }).waitFor();
    await here.page.getByLabel('Name').fill('Overnight sweep');
    await here.page.getByLabel('Scope').selectOption('read');
    await here.page.getByRole('button', { name: 'Create token' }).click();
    const shown = here.page.getByRole('status');
    await shown.getByText('shown only this once', { exact: false }).waitFor();
    const token = await here.page.getByRole('textbox', { name: 'New API token' }).inputValue();
    expect(token).toMatch(/^rw_pat_/);
    await screenshot(here.page, 'api-tokens-1280');

    const setups = `${baseUrl}/api/workspaces/${workspaceId}/setups`;
    const asScript = () => fetch(setups, { headers: { Authorization: `Bearer ${token}` } });
    expect((await asScript()).status).toBe(200);

    await shown.getByRole('button', { name: 'Done' }).click();
    expect(await here.page.getByRole('textbox', { name: 'New API token' }).count()).toBe(0);
    expect(await here.page.content()).not.toContain(token);
    const row = here.page.getByRole('row', { name: 'Token Overnight sweep' });
    await row.getByText('read', { exact: true }).waitFor();
    await here.page.getByRole('button', { name: 'Revoke token Overnight sweep' }).click();
    await here.page.getByText('No API tokens.').waitFor();
    expect((await asScript()).status).toBe(401);
    await here.context.close();
  });
});
