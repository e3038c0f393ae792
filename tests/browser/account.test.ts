import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { freshEmail, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
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

describe('account page', () => {
  it('changing the password keeps this browser signed in and signs the other one out', async () => {
    const email = freshEmail('ysolde.crane');
    const first = 'original-password-1';
    const second = 'replacement-password-2';

    const here = await newSession(browser, baseUrl);
    await signUpAndConfirm(here.page, baseUrl, { name: 'Ysolde Crane', email, password: first, workspaceName: 'Crane rig' });

    const elsewhere = await newSession(browser, baseUrl);
    await signIn(elsewhere.page, email, first);

    await here.page.getByRole('link', { name: 'Account' }).click();
    await here.page.getByRole('heading', { name: 'Your account' }).waitFor();
    const form = here.page.getByRole('form', { name: 'Change password' });

    // a wrong current password is named at its field and changes nothing
    await form.getByLabel('Current password').fill('not-my-password');
    await form.getByLabel('New password').fill(second);
    await form.getByRole('button', { name: 'Change password' }).click();
    await form.getByRole('alert').first().waitFor();
    await elsewhere.page.reload();
    await elsewhere.page.getByText(/Your role:\s*admin/).waitFor();

    await form.getByLabel('Current password').fill(first);
    await form.getByLabel('New password').fill(second);
    await form.getByRole('button', { name: 'Change password' }).click();
    await here.page.getByText('Password changed.', { exact: false }).waitFor();
    await screenshot(here.page, 'account-1280');

    // this browser is still in; the other one is sent to sign-in
    await here.page.reload();
    await here.page.getByRole('heading', { name: 'Your account' }).waitFor();
    await elsewhere.page.reload();
    await elsewhere.page.waitForURL('**/signin**');
    expect(new URL(elsewhere.page.url()).pathname).toBe('/signin');

    await Promise.all([here.context.close(), elsewhere.context.close()]);
  });
});
