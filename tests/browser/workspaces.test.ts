import { request, type APIRequestContext, type Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiSession, demoUser, freshEmail, launchBrowser, linkIn, newSession, screenshot, signIn, waitForMail } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
let admin: APIRequestContext;

beforeAll(async () => {
  browser = await launchBrowser();
  admin = await apiSession(baseUrl, (await demoUser(baseUrl, 'admin')).email);
});
afterAll(async () => {
  await admin?.dispose();
  await browser?.close();
});

async function csrf(api: APIRequestContext): Promise<string> {
  return (await api.storageState()).cookies.find((c) => c.name === 'rw_csrf')?.value ?? '';
}

describe('belonging to two workspaces', () => {
  it('an existing account accepts an invitation while signed in, then switches between its workspaces', async () => {
    // someone with a workspace of their own
    const email = freshEmail('odile.tarn');
    const password = 'odile-password-1';
    const own = await request.newContext({ baseURL: baseUrl });
    await own.get('/api/config');
    const signup = await own.post('/api/auth/signup', {
      data: { name: 'Odile Tarn', email, password, workspaceName: 'Tarn spring lab' },
      headers: { 'x-csrf-token': await csrf(own) },
    });
    expect(signup.status()).toBe(202);
    await own.dispose();
    // they confirm the address from the mailed link (read as themselves from the demo outbox)
    const mailbox = await apiSession(baseUrl, email, password);
    const token = linkIn(await waitForMail(mailbox, email, /Confirm your address/), '/confirm/').split('/confirm/')[1];
    const confirmed = await mailbox.post('/api/auth/confirm', { data: { token }, headers: { 'x-csrf-token': await csrf(mailbox) } });
    expect(confirmed.status()).toBe(200);
    const ownWorkspaceId: string = (await confirmed.json()).memberships[0].workspaceId;
    await mailbox.dispose();

    // the demo admin invites that address as a lead
    const demoWorkspaceId: string = (await (await admin.get('/api/auth/me')).json()).memberships[0].workspaceId;
    const invite = await admin.post(`/api/workspaces/${demoWorkspaceId}/invitations`, {
      data: { email, role: 'lead' },
      headers: { 'x-csrf-token': await csrf(admin) },
    });
    expect(invite.status()).toBe(201);
    const link = linkIn(await waitForMail(admin, email), '/invite/');

    // signed in as that person, the link asks for one click
    const { page, context } = await newSession(browser, baseUrl);
    await signIn(page, email, password);
    expect(new URL(page.url()).pathname).toBe(`/w/${ownWorkspaceId}`);
    await page.goto(link);
    await page.getByRole('button', { name: 'Join the workspace' }).click();
    await page.waitForURL(`**/w/${demoWorkspaceId}`);
    await page.getByText(/Your role:\s*lead/).waitFor();

    // the rail now offers both workspaces; switching keeps the section
    const switcher = page.getByRole('complementary').getByRole('combobox', { name: 'Workspace' });
    expect(await switcher.locator('option').allTextContents()).toEqual(expect.arrayContaining(['Tallis & Brume — Chassis', 'Tarn spring lab']));
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Team' }).click();
    await page.waitForURL(`**/w/${demoWorkspaceId}/team`);
    await screenshot(page, 'team-two-workspaces-1280');
    await switcher.selectOption(ownWorkspaceId);
    await page.waitForURL(`**/w/${ownWorkspaceId}/team`);
    await page.getByText(/Your role:\s*admin/).waitFor();
    // the members table of the other workspace arrives after the role line
    const ownRow = page.getByRole('table', { name: 'Members of this workspace' }).getByRole('row', { name: 'Odile Tarn' });
    await ownRow.first().waitFor();
    expect(await ownRow.count()).toBe(1);

    await context.close();
  });
});
