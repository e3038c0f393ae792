import type { APIRequestContext, Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { join } from 'node:path';
import { apiSession, demoUser, launchBrowser, newSession, RESULTS_DIR, screenshot, signIn } from './helpers/browser.ts';
import { SetupsResponse, SetupRevision } from '../../shared/schemas/setup-record.ts';
import { StudiesResponse, StudyDetail } from '../../shared/schemas/study-record.ts';
import { TargetSheetDetail } from '../../shared/schemas/target-sheet.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;
let api: APIRequestContext;
const defaults = { damperVelocity: 'm/s', rate: 'N/mm', speed: 'km/h', length: 'mm' };

const csrf = async () => (await api.storageState()).cookies.find((c) => c.name === 'rw_csrf')?.value ?? '';

async function putUnits(units: typeof defaults) {
  const res = await api.put('/api/account/units', { data: units, headers: { 'x-csrf-token': await csrf() } });
  expect(res.status()).toBe(200);
}

/** Both widths a person uses, the page as it stands. */
async function lookAt(page: Page, name: string) {
  await screenshot(page, `${name}-1440`);
  await page.setViewportSize({ width: 1280, height: 800 });
  await screenshot(page, `${name}-1280`);
  await page.setViewportSize({ width: 1440, height: 900 });
}

/** The cells of a table column by its header text, as shown. */
async function column(page: Page, table: string, header: RegExp) {
  const t = page.getByRole('table', { name: table, exact: true });
  await t.waitFor();
  const heads = (await t.locator('thead th').allInnerTexts()).map((h) => h.trim());
  const at = heads.findIndex((h) => header.test(h));
  expect(at, `a column headed ${header} among ${heads.join(' | ')}`).toBeGreaterThanOrEqual(0);
  return { head: heads[at]!, cells: (await t.locator(`tbody tr > :nth-child(${at + 1})`).allInnerTexts()).map((c) => c.trim()) };
}

const shownNumber = (text: string) => Number(text.replace('\u2212', '-').replace(/[^\d.eE+-]/g, ''));

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

  it('lbf/in, in, mph and mm/s reach a study table, a target sheet (editor and print) and the revision difference; a typed speed is stored in m/s', async () => {
    // 1 lbf/in = 175.126835 N/m, 1 in = 0.0254 m (NIST SP 811, B.8); 1 mm/s = 0.001 m/s
    const LBF_PER_IN = 4.4482216152605 / 0.0254;
    await putUnits({ damperVelocity: 'mm/s', rate: 'lbf/in', speed: 'mph', length: 'in' });
    const me = (await (await api.get('/api/auth/me')).json()) as { memberships: { workspaceId: string }[] };
    const workspace = me.memberships[0]!.workspaceId;
    const setups = SetupsResponse.parse(await (await api.get(`/api/workspaces/${workspace}/setups`)).json()).setups;
    const pipit = setups.find((s) => s.name === 'Brume Pipit front, baseline')!;
    const studies = StudiesResponse.parse(await (await api.get(`/api/workspaces/${workspace}/studies`)).json()).studies;
    const demoStudy = studies.find((s) => s.name === 'Pipit front: rebound against spring rate')!;
    const study = StudyDetail.parse(await (await api.get(`/api/workspaces/${workspace}/studies/${demoStudy.id}`)).json());
    const created = await api.post(`/api/workspaces/${workspace}/target-sheets`, { data: { setupId: pipit.id, revision: 1 }, headers: { 'x-csrf-token': await csrf() } });
    expect(created.status()).toBe(201);
    const sheet = TargetSheetDetail.parse(await created.json()).sheet;
    const revision = async (n: number) => SetupRevision.parse(await (await api.get(`/api/workspaces/${workspace}/setups/${pipit.id}/revisions/${n}`)).json());
    const [r2, r3] = [await revision(2), await revision(3)];

    const { page, context } = await newSession(browser, baseUrl, { width: 1440, height: 900 });
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);

    // the study's points table: spring rates in lbf/in, the same SI values converted
    await page.goto(`/w/${workspace}/studies/${study.id}`);
    const springs = await column(page, 'Study points', /^spring rate/);
    expect(springs.head).toMatch(/^spring rate \[lbf\/in\]/);
    const sweptSprings = new Set(study.points.map((p) => p.values.springRate!));
    expect(springs.cells.length).toBeGreaterThan(0);
    for (const cell of springs.cells) expect([...sweptSprings].some((si) => Math.abs(shownNumber(cell) - si / LBF_PER_IN) < 0.5)).toBe(true);
    await expect.poll(async () => page.getByRole('region', { name: 'Best compromise' }).textContent()).toMatch(/lbf\/in/);
    await lookAt(page, 'units-study-imperial');

    // the sheet editor shows mm/s; a speed typed there is saved in m/s
    await page.goto(`/w/${workspace}/sheets/${sheet.id}`);
    const editor = page.getByRole('form', { name: 'Edit targets' });
    await editor.waitFor();
    expect(await editor.getByRole('table', { name: 'Compression targets (editable)' }).locator('thead th').first().innerText()).toBe('Speed [mm/s]');
    const first = editor.getByLabel('Compression speed, point 1');
    expect(Number(await first.inputValue())).toBeCloseTo(sheet.compression[0]!.velocity * 1000, 6);
    const typed = Math.round((sheet.compression[0]!.velocity + sheet.compression[1]!.velocity) * 500);
    await first.fill(String(typed));
    await editor.getByRole('button', { name: 'Save targets' }).click();
    await editor.getByText('Unsaved changes').waitFor({ state: 'detached' });
    const saved = TargetSheetDetail.parse(await (await api.get(`/api/workspaces/${workspace}/target-sheets/${sheet.id}`)).json()).sheet;
    expect(saved.compression[0]!.velocity).toBe(typed / 1000);
    await lookAt(page, 'units-sheet-editor-mm');

    await page.goto(`/w/${workspace}/sheets/${sheet.id}/print`);
    const paper = page.getByRole('article', { name: `Printable sheet ${sheet.number}` });
    await paper.getByText('Piston speeds in mm/s', { exact: false }).waitFor();
    expect((await column(page, 'Compression targets', /^Speed/)).cells[0]).toBe(String(typed));
    await lookAt(page, 'units-sheet-print-mm');

    // the revision difference: r2 → r3 of the demo setup changes the bump stop clearance, read in inches
    await page.goto(`/w/${workspace}/corners/${pipit.id}?part=revisions`);
    await page.getByRole('radio', { name: 'Compare from revision 2' }).check();
    await page.getByRole('radio', { name: 'Compare to revision 3' }).check();
    const row = page.getByRole('table', { name: 'Differences from revision 2 to revision 3' }).getByRole('row', { name: /Bump stop clearance/ });
    const [before, after] = (await row.locator('td').allInnerTexts()).map((t) => t.trim());
    expect(before).toMatch(/^[\d.]+\s?in$/);
    expect(shownNumber(before!)).toBeCloseTo(r2.document.bumpStop!.clearance / 0.0254, 3);
    expect(shownNumber(after!)).toBeCloseTo(r3.document.bumpStop!.clearance / 0.0254, 3);
    await row.scrollIntoViewIfNeeded();
    await lookAt(page, 'units-revision-diff-in');

    await api.delete(`/api/workspaces/${workspace}/target-sheets/${sheet.id}`, { headers: { 'x-csrf-token': await csrf() } });
    await putUnits(defaults);
    await context.close();
  });
});
