import { mkdirSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { type APIRequestContext, type Browser, type BrowserContext, chromium, type Page, request } from 'playwright-core';
import { AppConfig, type DemoUser } from '../../../shared/schemas/config.ts';
import { OutboxResponse, type OutboxMessage } from '../../../shared/schemas/outbox.ts';
import type { Role } from '../../../shared/schemas/workspace.ts';

/**
 * Shared tools for browser tests. Every test file gets its app's address with `appUrl()`
 * (helpers/app-url.ts, one app per vitest worker; see global-setup.ts) and uses these helpers;
 * see tests/browser/README.md.
 */

const root = resolve(fileURLToPath(new URL('../../..', import.meta.url)));
export const RESULTS_DIR = join(root, 'test-results');

/** Debian's Chromium; no test tool downloads a browser of its own. */
export const CHROMIUM = '/usr/bin/chromium';
const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

/** One Chromium per test file; each `newSession` is a separate, empty profile (own cookies, storage). */
export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM, args: CHROMIUM_ARGS, headless: true });
}

export const DESKTOP = { width: 1280, height: 860 };
export const TABLET = { width: 820, height: 1180 };

export interface Session {
  context: BrowserContext;
  page: Page;
}

/** A fresh signed-out visitor at `baseUrl`; page.goto('/signin') etc. resolve against it. */
export async function newSession(browser: Browser, baseUrl: string, viewport = DESKTOP): Promise<Session> {
  const context = await browser.newContext({ baseURL: baseUrl, viewport, locale: 'en-GB', timezoneId: 'Europe/London' });
  const page = await context.newPage();
  // a limit, not a timed assertion: during `npm test` the unit, API and hardening projects
  // share the two cores with the browser, and a page can wait tens of seconds for a turn
  page.setDefaultTimeout(30_000);
  return { context, page };
}

/** Demo accounts as the server reports them in demo mode. */
export async function demoUsers(baseUrl: string): Promise<DemoUser[]> {
  const response = await fetch(`${baseUrl}/api/config`);
  return AppConfig.parse(await response.json()).demoUsers;
}

export async function demoUser(baseUrl: string, role: Role): Promise<DemoUser> {
  const user = (await demoUsers(baseUrl)).find((u) => u.role === role);
  if (!user) throw new Error(`no demo user with role ${role}`);
  return user;
}

/** Signs in through the form and waits until the app has left the sign-in page. */
export async function signIn(page: Page, email: string, password = 'ridewright-demo'): Promise<void> {
  await page.goto('/signin');
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password', { exact: true }).fill(password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
}

/** Signs out with the rail's button and waits for the sign-in page. */
export async function signOut(page: Page): Promise<void> {
  await page.getByRole('button', { name: 'Sign out' }).click();
  await page.waitForURL((url) => url.pathname.startsWith('/signin'));
}

/** The CSRF token the page's cookies hold (set by GET /api/config or /api/auth/me). */
export async function csrfToken(context: BrowserContext): Promise<string> {
  const cookie = (await context.cookies()).find((c) => c.name === 'rw_csrf');
  if (!cookie) throw new Error('no rw_csrf cookie yet; load a page of the app first');
  return cookie.value;
}

/** A write through the page's own session and CSRF token, as the app itself would send it. */
export async function apiWrite(session: Session, method: 'POST' | 'PUT' | 'PATCH' | 'DELETE', path: string, body?: unknown) {
  const token = await csrfToken(session.context);
  return session.page.request.fetch(path, { method, data: body, headers: { 'x-csrf-token': token } });
}

/** A cookie-keeping HTTP client signed in as `email` (no browser), for setup and the outbox. */
export async function apiSession(baseUrl: string, email: string, password = 'ridewright-demo'): Promise<APIRequestContext> {
  const api = await request.newContext({ baseURL: baseUrl });
  await api.get('/api/config');
  const token = (await api.storageState()).cookies.find((c) => c.name === 'rw_csrf')?.value ?? '';
  const response = await api.post('/api/auth/signin', { data: { email, password }, headers: { 'x-csrf-token': token } });
  if (!response.ok()) throw new Error(`sign-in as ${email} failed: ${response.status()} ${await response.text()}`);
  return api;
}

/** Every message the local mail sink holds, newest first (read as the demo admin). */
export async function readOutbox(api: APIRequestContext): Promise<OutboxMessage[]> {
  const response = await api.get('/api/outbox');
  if (!response.ok()) throw new Error(`GET /api/outbox answered ${response.status()}`);
  return OutboxResponse.parse(await response.json()).messages;
}

/**
 * The newest message to `to` whose subject matches, polling while the mail is in flight
 * (the server hands it to the sink asynchronously). Fails after `waitMs`.
 */
export async function waitForMail(api: APIRequestContext, to: string, subject: RegExp = /./, waitMs = 10_000): Promise<OutboxMessage> {
  const deadline = Date.now() + waitMs;
  for (;;) {
    const found = (await readOutbox(api)).find((m) => m.to.toLowerCase().includes(to.toLowerCase()) && subject.test(m.subject));
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to} matching ${subject} within ${waitMs} ms`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

/** The first link in a message's text whose path starts with `pathPrefix` ("/invite/"). */
export function linkIn(message: OutboxMessage, pathPrefix: string): string {
  for (const raw of message.text.match(/https?:\/\/[^\s<>"]+/g) ?? []) {
    if (new URL(raw).pathname.startsWith(pathPrefix)) return raw;
  }
  throw new Error(`no ${pathPrefix} link in "${message.subject}":\n${message.text}`);
}

/** Full-page PNG in test-results/<name>.png (gitignored), for a person to look at. */
export async function screenshot(page: Page, name: string): Promise<string> {
  mkdirSync(RESULTS_DIR, { recursive: true });
  const path = join(RESULTS_DIR, `${name}.png`);
  await page.screenshot({ path, fullPage: true });
  return path;
}

/** A unique address at the demo maker's reserved domain, so reruns never collide. */
export function freshEmail(stem: string): string {
  return `${stem}.${Date.now().toString(36)}${Math.floor(Math.random() * 1e4)}@tallisbrume.example`;
}
