import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiSession, freshEmail, launchBrowser, linkIn, newSession, signIn, signOut, waitForMail } from './helpers/browser.ts';
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

describe('password reset by e-mailed link', () => {
  it('a new account forgets its password, resets it from the link, and only the new password works', async () => {
    // an account of its own, so the demo users keep their passwords for the other tests
    const email = freshEmail('pell.harrow');
    const oldPassword = 'first-password-1';
    const newPassword = 'second-password-2';
    const { page, context } = await newSession(browser, baseUrl);
    await signUpAndConfirm(page, baseUrl, { name: 'Pell Harrow', email, password: oldPassword, workspaceName: 'Harrow test bench' });
    await page.getByText(/Your role:\s*admin/).waitFor();
    await signOut(page);

    await page.getByRole('link', { name: 'Forgot your password?' }).click();
    await page.getByLabel('E-mail').fill(email);
    await page.getByRole('button', { name: 'Send me a link' }).click();
    await page.getByText('Check your e-mail').waitFor();

    // a reset mail is shown to its recipient only: read it as the account itself (its old
    // password still works until the reset), as the person would in their own mailbox
    const outbox = await apiSession(baseUrl, email, oldPassword);
    const mail = await waitForMail(outbox, email);
    await outbox.dispose();
    const link = linkIn(mail, '/reset/');
    await page.goto(link);
    await page.getByLabel('New password', { exact: true }).fill(newPassword);
    await page.getByRole('button', { name: 'Set password' }).click();
    await page.waitForURL('**/signin');

    // the old password is refused, the new one accepted
    await page.getByLabel('E-mail').fill(email);
    await page.getByLabel('Password', { exact: true }).fill(oldPassword);
    await page.getByRole('button', { name: 'Sign in', exact: true }).click();
    await page.getByRole('alert').filter({ hasText: /./ }).first().waitFor();
    expect(new URL(page.url()).pathname).toBe('/signin');
    await signIn(page, email, newPassword);
    expect(new URL(page.url()).pathname).toMatch(/^\/w\//);

    // the link is single-use
    const other = await newSession(browser, baseUrl);
    await other.page.goto(link);
    await other.page.getByLabel('New password', { exact: true }).fill('third-password-3');
    await other.page.getByRole('button', { name: 'Set password' }).click();
    await other.page.getByText('This link no longer works').waitFor();

    await Promise.all([context.close(), other.context.close()]);
  });
});
