import type { APIRequestContext, Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiSession, demoUser, freshEmail, launchBrowser, linkIn, newSession, screenshot, signIn, signOut, waitForMail } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
let outbox: APIRequestContext;

beforeAll(async () => {
  browser = await launchBrowser();
  outbox = await apiSession(baseUrl, (await demoUser(baseUrl, 'admin')).email);
});
afterAll(async () => {
  await outbox?.dispose();
  await browser?.close();
});

describe('inviting a new member by e-mail', () => {
  it('admin invites, the invitee follows the e-mailed link, joins with name and password, and can sign in again', async () => {
    const email = freshEmail('wren.ashby');
    const password = 'a-long-new-password';

    // the admin sends the invitation from the Team page
    const admin = await newSession(browser, baseUrl);
    await signIn(admin.page, (await demoUser(baseUrl, 'admin')).email);
    const workspaceId = new URL(admin.page.url()).pathname.split('/')[2];
    await admin.page.goto(`/w/${workspaceId}/team`);
    const form = admin.page.getByRole('form', { name: 'Invite a member' });
    await form.getByLabel('E-mail address').fill(email);
    await form.getByLabel('Role').selectOption('engineer');
    await form.getByRole('button', { name: 'Send invitation' }).click();
    await admin.page.getByText(`Invitation sent to ${email}.`).waitFor();
    await admin.page.getByRole('table', { name: 'Pending invitations' }).getByRole('row', { name: email }).waitFor();
    await screenshot(admin.page, 'team-admin-after-invite-1280');

    // the message reached the local sink and carries a working link
    const mail = await waitForMail(outbox, email);
    const link = linkIn(mail, '/invite/');
    expect(new URL(link).origin).toBe(baseUrl);

    // the admin can read the same message on the outbox page
    await admin.page.getByRole('link', { name: 'Outbox' }).click();
    await admin.page.getByRole('list', { name: 'Messages' }).getByRole('button', { name: new RegExp(`to ${email.replaceAll('.', '\\.')}`) }).click();
    await admin.page.getByRole('article', { name: `Message: ${mail.subject}` }).waitFor();
    expect(await admin.page.getByRole('article').getByRole('link', { name: link }).count()).toBe(1);
    await screenshot(admin.page, 'outbox-1280');

    // a stranger's browser opens it
    const invitee = await newSession(browser, baseUrl);
    await invitee.page.goto(link);
    await invitee.page.getByRole('heading', { name: 'Join Tallis & Brume — Chassis' }).waitFor();
    expect(await invitee.page.getByText(/as an\s*engineer/).count()).toBe(1);
    await screenshot(invitee.page, 'accept-invite-1280');

    const accept = invitee.page.getByRole('form', { name: 'Accept the invitation' });
    // a too-short password is refused beside the field and nothing is created
    await accept.getByLabel('Your name').fill('Wren Ashby');
    await accept.getByLabel('Choose a password').fill('short');
    await accept.getByRole('button', { name: 'Create account and join' }).click();
    await accept.getByText('Use at least 10 characters').waitFor();
    expect(new URL(invitee.page.url()).pathname).toMatch(/^\/invite\//);

    await accept.getByLabel('Choose a password').fill(password);
    await accept.getByRole('button', { name: 'Create account and join' }).click();
    await invitee.page.waitForURL(`**/w/${workspaceId}`);
    await invitee.page.getByText(/Your role:\s*engineer/).waitFor();
    expect(await invitee.page.getByRole('complementary').getByText('Wren Ashby').count()).toBe(1);

    // sign out, then back in with the chosen password
    await signOut(invitee.page);
    await signIn(invitee.page, email, password);
    expect(new URL(invitee.page.url()).pathname).toBe(`/w/${workspaceId}`);

    // the link worked once only
    const again = await newSession(browser, baseUrl);
    await again.page.goto(link);
    await again.page.getByText('This invitation no longer works').waitFor();

    // and the admin now sees the new member in the table
    await admin.page.goto(`/w/${workspaceId}/team`);
    await admin.page.getByRole('table', { name: 'Members of this workspace' }).getByRole('row', { name: 'Wren Ashby' }).waitFor();
    expect(await admin.page.getByRole('table', { name: 'Pending invitations' }).getByRole('row', { name: email }).count()).toBe(0);

    await Promise.all([admin.context.close(), invitee.context.close(), again.context.close()]);
  });
});
