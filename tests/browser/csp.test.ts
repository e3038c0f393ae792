import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { apiSession, demoUser, launchBrowser, newSession, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

// The built app under its own strict Content Security Policy (server/app.ts): every page the
// rail leads to, the first item of each list, the account, outbox, signed-out and shared pages
// load without a single CSP violation (scripts, styles, fonts, images, workers, connections).

const baseUrl = appUrl();
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** Records violations from the page (the DOM event) and from the console (workers report there). */
async function watchCsp(page: Page): Promise<() => Promise<string[]>> {
  const fromConsole: string[] = [];
  page.on('console', (msg) => {
    if (/Content Security Policy|Refused to (load|execute|apply|connect|create|frame)/i.test(msg.text())) fromConsole.push(msg.text());
  });
  await page.addInitScript(() => {
    const w = window as unknown as { __csp: string[] };
    w.__csp = [];
    document.addEventListener('securitypolicyviolation', (e) => w.__csp.push(`${e.violatedDirective} blocked ${e.blockedURI} at ${e.sourceFile}:${e.lineNumber}`));
  });
  return async () => [...fromConsole, ...(await page.evaluate(() => (window as unknown as { __csp: string[] }).__csp ?? []))];
}

/** Opens `path`, lets data, charts and workers arrive, and returns the violations seen on it. */
async function visit(page: Page, path: string, read: () => Promise<string[]>): Promise<string[]> {
  await page.goto(path);
  await page.locator('main, [role="main"], body > div').first().waitFor();
  // Playwright sometimes never marks a web worker's script request finished (seen on the setup
  // bench, whose live run starts two workers), so network quiet is waited for, not required.
  await page.waitForLoadState('networkidle', { timeout: 5_000 }).catch(() => undefined);
  await page.waitForTimeout(800); // live runs start after the page settles
  return (await read()).map((v) => `${path}: ${v}`);
}

describe('content security policy of the built app', () => {
  it('no page the app shows raises a CSP violation', async () => {
    const { page, context } = await newSession(browser, baseUrl);
    const read = await watchCsp(page);
    const seen: string[] = [];
    const visited: string[] = [];
    const go = async (path: string) => {
      visited.push(path);
      seen.push(...(await visit(page, path, read)));
    };

    for (const path of ['/signin', '/signup', '/reset', '/no/such/page']) await go(path);
    await signIn(page, (await demoUser(baseUrl, 'admin')).email);
    const workspace = new URL(page.url()).pathname;
    await go(workspace);
    const nav = page.getByRole('navigation', { name: 'Sections' }).getByRole('link');
    const sections = (await nav.evaluateAll((links) => links.map((a) => (a as HTMLAnchorElement).pathname))).filter((p) => p.startsWith(`${workspace}/`));
    expect(sections.length).toBeGreaterThanOrEqual(4);
    for (const section of sections) {
      await go(section);
      // the first item of the list, when there is one (a setup bench, a road, a run, a study, a sheet)
      const items = await page.locator(`main a[href^="${section}/"]`).evaluateAll((links) => links.map((a) => (a as HTMLAnchorElement).pathname));
      if (items[0]) await go(items[0]);
    }
    await go('/account');
    await go('/outbox');
    expect(visited.length).toBeGreaterThanOrEqual(12);

    // a share link, opened signed out
    const api = await apiSession(baseUrl, (await demoUser(baseUrl, 'engineer')).email);
    const me = await (await api.get('/api/auth/me')).json();
    const ws = me.memberships[0].workspaceId as string;
    const setups = (await (await api.get(`/api/workspaces/${ws}/setups`)).json()).setups as { id: string }[];
    const setup = await (await api.get(`/api/workspaces/${ws}/setups/${setups[0].id}`)).json();
    const csrf = (await api.storageState()).cookies.find((c) => c.name === 'rw_csrf')!.value;
    const link = await (await api.post(`/api/workspaces/${ws}/share-links`, { data: { objectType: 'setup_revision', objectId: setup.revision.id }, headers: { 'x-csrf-token': csrf } })).json();
    await api.dispose();
    const anon = await newSession(browser, baseUrl);
    const readAnon = await watchCsp(anon.page);
    seen.push(...(await visit(anon.page, link.path as string, readAnon)));

    expect(seen, `pages visited: ${visited.join(', ')}`).toEqual([]);
    await Promise.all([context.close(), anon.context.close()]);
  });
});
