import type { Page } from 'playwright-core';
import { apiSession, linkIn, waitForMail } from './browser.ts';

/**
 * The whole sign-up path as a person takes it: the form, "check your mail", the confirmation
 * mail (read from the demo outbox as the new account, which may sign in before confirming),
 * and the confirm button, which signs the browser in and opens the new workspace.
 */
export async function signUpAndConfirm(page: Page, baseUrl: string, who: { name: string; email: string; password: string; workspaceName: string }): Promise<void> {
  await page.goto('/signup');
  const form = page.getByRole('form', { name: 'Create an account' });
  await form.getByLabel('Your name').fill(who.name);
  await form.getByLabel('E-mail').fill(who.email);
  await form.getByLabel('Password').fill(who.password);
  await form.getByLabel('Workspace name').fill(who.workspaceName);
  await form.getByRole('button', { name: 'Create account and workspace' }).click();
  await page.getByRole('heading', { name: 'Check your mail' }).waitFor();
  const mailbox = await apiSession(baseUrl, who.email, who.password);
  const mail = await waitForMail(mailbox, who.email, /Confirm your address/);
  await mailbox.dispose();
  await page.goto(linkIn(mail, '/confirm/'));
  await page.getByRole('button', { name: 'Confirm and sign in' }).click();
  await page.waitForURL('**/w/*');
}
