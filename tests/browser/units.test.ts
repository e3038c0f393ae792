import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { apiSession, demoUser, launchBrowser, newSession, RESULTS_DIR, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
let api: APIRequestContext;
const defaults = { damperVelocity: 'm/s', rate: 'N/mm', speed: 'km/h', length: 'mm' };

async function putUnits(units: typeof defaults) {
  const token = (await api.storageState()).cookies.find((c) => c.name === 'rw_csrf')?.value ?? '';
  const res = await api.put('/api/account/units', { data: units, headers: { 'x-csrf-token': token } });
  expect(res.status()).toBe(200);
}

beforeAll(async () => {
  browser = await launchBrowser();
  api = await apiSession(baseUrl, (await demoUser(baseUrl, 'engineer')).email);
  await putUnits(defaults);
});
afterAll(async () => {
  // the demo engineer is shared with the other browser files: leave the defaults behind
  await putUnits(defaults);
  await api.dispose();
  await browser?.close();
});

/** The setup editor's compression table: header text and the velocity cells as numbers. */
async function dampTable(page: Page, workspace: string, setupId: string) {
  await page.goto(`/w/${workspace}/corners/${setupId}`);
  const table = page.getByRole('table', { name: 'Compression points' });
  await table.waitFor();
  const header = (await table.locator('thead th').nth(1).textContent()) ?? '';
  const cells = table.getByRole('textbox', { name: /^compression velocity, point \d+$/ });
  const values = (await cells.evaluateAll((inputs) => inputs.map((i) => (i as HTMLInputElement).value))).map(Number);
  return { header, values };
}

/** The run page's damper chart: its axis titles, legend x label and the x value under a fixed cursor point. */
async function runDamperChart(page: Page, workspace: string, runId: string) {
  await page.goto(`/w/${workspace}/runs/${runId}`);
  const chart = page.getByRole('figure', { name: 'Damper curve' });
  await chart.locator('.u-over').waitFor();
  await chart.scrollIntoViewIfNeeded();
  const axes = (await chart.locator('[data-axis-titles]').textContent()) ?? '';
  const box = (await chart.locator('.u-over').boundingBox())!;
  await page.mouse.move(box.x + box.width * 0.8, box.y + box.height / 2);
  const xSeries = chart.locator('.u-legend .u-series').first();
  await expect.poll(async () => ((await xSeries.locator('.u-value').textContent()) ?? '').trim()).not.toMatch(/^(|--|–)$/);
  const xLabel = ((await xSeries.locator('.u-label').textContent()) ?? '').trim();
  const xValue = Number.parseFloat(((await xSeries.locator('.u-value').textContent()) ?? '').replace('−', '-').replace(/,/g, ''));
  return { axes, xLabel, xValue };
}

describe('display units', () => {
  it('damper velocity in mm/s shows mm/s with 1000× the m/s values in the setup editor table and the run damper chart', async () => {
    const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workspaceId: string }[] };
    const workspace = me.memberships[0]!.workspaceId;
    const setups = ((await (await api.get(`/api/workspaces/${workspace}/setups`)).json()) as { setups: { id: string }[] }).setups;
    const runs = ((await (await api.get(`/api/workspaces/${workspace}/runs`)).json()) as { runs: { id: string }[] }).runs;
    expect(setups.length).toBeGreaterThan(0);
    expect(runs.length).toBeGreaterThan(0);

    const { page, context } = await newSession(browser, baseUrl, { width: 1440, height: 900 });
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);

    const siTable = await dampTable(page, workspace, setups[0]!.id);
    expect(siTable.header).toBe('Velocity [m/s]');
    const siChart = await runDamperChart(page, workspace, runs[0]!.id);
    expect(siChart.axes).toContain('[m/s]');
    expect(siChart.xLabel).toBe('m/s');

    // choose mm/s on the account page, as a person would
    await page.goto('/account');
    const group = page.getByRole('radiogroup', { name: 'Damper velocity' });
    await group.getByRole('radio', { name: 'mm/s' }).click();
    await expect.poll(() => group.getByRole('radio', { name: 'mm/s' }).getAttribute('aria-checked')).toBe('true');
    await screenshot(page, 'units-account-1440');
    await page.setViewportSize({ width: 1280, height: 800 });
    await screenshot(page, 'units-account-1280');
    await page.setViewportSize({ width: 1440, height: 900 });

    const mmTable = await dampTable(page, workspace, setups[0]!.id);
    expect(mmTable.header).toBe('Velocity [mm/s]');
    expect(mmTable.values).toHaveLength(siTable.values.length);
    mmTable.values.forEach((v, i) => expect(v).toBeCloseTo(siTable.values[i]! * 1000, 6));
    await page.getByTestId('damper-curve-editor').screenshot({ path: join(RESULTS_DIR, 'units-damper-editor-mm-1440.png') });
    await screenshot(page, 'units-setup-editor-mm-1440');
    await page.setViewportSize({ width: 1280, height: 800 });
    await screenshot(page, 'units-setup-editor-mm-1280');
    await page.setViewportSize({ width: 1440, height: 900 });

    const mmChart = await runDamperChart(page, workspace, runs[0]!.id);
    expect(mmChart.axes).toContain('[mm/s]');
    expect(mmChart.axes).not.toContain('[m/s]');
    expect(mmChart.xLabel).toBe('mm/s');
    // the same cursor position reads 1000× the number: the axis moved with its label
    expect(mmChart.xValue / siChart.xValue).toBeGreaterThan(990);
    expect(mmChart.xValue / siChart.xValue).toBeLessThan(1010);
    await context.close();
  });

  it('switching a speed field from km/h to m/s converts the number (60 km/h = 16.6667 m/s) and back', async () => {
    await putUnits(defaults);
    const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workspaceId: string }[] };
    const workspace = me.memberships[0]!.workspaceId;
    const { page, context } = await newSession(browser, baseUrl, { width: 1280, height: 800 });
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    await page.goto(`/w/${workspace}/runs`);
    const value = page.getByRole('textbox', { name: 'Speed value' });
    const unit = page.getByRole('combobox', { name: 'Speed unit' });
    await value.fill('60');
    await unit.selectOption('m/s');
    await expect.poll(() => value.inputValue()).toBe('16.6667');
    await unit.selectOption('mph');
    await expect.poll(() => value.inputValue()).toBe('37.2823');
    await unit.selectOption('km/h');
    await expect.poll(() => value.inputValue()).toBe('60');
    await context.close();
  });

  it('the bench live run takes a typed speed in the preferred unit beside its presets', async () => {
    await putUnits({ ...defaults, speed: 'mph' });
    const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workspaceId: string }[] };
    const workspace = me.memberships[0]!.workspaceId;
    const setups = ((await (await api.get(`/api/workspaces/${workspace}/setups`)).json()) as { setups: { id: string }[] }).setups;
    const { page, context } = await newSession(browser, baseUrl, { width: 1440, height: 900 });
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    await page.goto(`/w/${workspace}/corners/${setups[0]!.id}`);
    const live = page.getByRole('region', { name: 'Live run figures' });
    await live.waitFor();
    // 60 km/h, the bench's starting speed, reads in mph
    await expect.poll(async () => live.textContent()).toMatch(/at 37\.3\u2009mph/);
    const speed = page.getByLabel('at', { exact: true });
    await speed.fill('47');
    await expect.poll(async () => live.textContent()).toMatch(/at 47\.0\u2009mph/);
    await live.locator('xpath=..').screenshot({ path: join(RESULTS_DIR, 'units-bench-live-mph-1440.png') });
    await putUnits(defaults);
    await context.close();
  });
});
