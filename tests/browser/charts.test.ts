import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, expect, it } from 'vitest';
import { apiSession, demoUser, launchBrowser, newSession, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

it('compare draws each run minus the reference in every time history and names "best" only beyond a stated 1 % margin', async () => {
  const engineer = await demoUser(baseUrl, 'engineer');
  const api = await apiSession(baseUrl, engineer.email);
  const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workspaceId: string }[] };
  const workspace = me.memberships[0]!.workspaceId;
  const { runs } = (await (await api.get(`/api/workspaces/${workspace}/runs`)).json()) as { runs: { id: string }[] };
  await api.dispose();
  expect(runs.length).toBeGreaterThanOrEqual(2);

  const { page, context } = await newSession(browser, baseUrl, { width: 1280, height: 800 });
  await signIn(page, engineer.email);
  await page.goto(`/w/${workspace}/compare?run=${runs[0]!.id}&run=${runs[1]!.id}`);
  await page.getByRole('button', { name: 'Compare', exact: true }).click();
  const table = page.getByRole('table', { name: 'Figures compared' });
  await table.waitFor();
  await expect.poll(() => page.getByText('“best” marks a figure more than 1 % better than every other run').count()).toBe(1);

  const timeCard = page.getByRole('region', { name: 'Time histories' });
  for (const name of ['Body acceleration overlaid', 'Travel (+ compression) overlaid', 'Tyre load overlaid']) {
    const legend = timeCard.getByRole('figure', { name }).locator('.u-legend');
    await legend.waitFor();
    await expect.poll(() => legend.getByText(/^Δ .+ − .+$/).count()).toBe(1);
  }

  // every cell marked best beats the other run by more than 1 %
  const bestCells = table.locator('td[data-best]');
  for (let i = 0; i < (await bestCells.count()); i++) {
    const row = bestCells.nth(i).locator('xpath=..');
    const figures = await row.locator('td').evaluateAll((cells) => cells.slice(1).map((c) => Number.parseFloat((c.textContent ?? '').replace(/best|−/g, (m) => (m === '−' ? '-' : '')))));
    const [a, b] = figures as [number, number];
    expect(Math.abs(a - b) / Math.max(Math.abs(a), Math.abs(b))).toBeGreaterThan(0.01);
  }
  await context.close();
});
