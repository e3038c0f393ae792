import { execFile } from 'node:child_process';
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { promisify } from 'node:util';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { formatQuantity, type UnitName } from '../../src/lib/format.ts';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
/** Per-test limit: several runs on a machine shared with other work (a limit, not a timed assertion). */
const LIMIT = 300_000;
const run = promisify(execFile);
let browser: Browser;
const scratch = mkdtempSync(join(tmpdir(), 'ridewright-runs-'));

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  rmSync(scratch, { recursive: true, force: true });
});

async function openRunsAs(role: 'engineer' | 'viewer') {
  const user = await demoUser(baseUrl, role);
  const session = await newSession(browser, baseUrl);
  // the machine is shared: give pages and runs room, without timing anything
  session.page.setDefaultTimeout(60_000);
  session.page.setDefaultNavigationTimeout(60_000);
  await signIn(session.page, user.email);
  const workspaceId = new URL(session.page.url()).pathname.split('/')[2];
  await session.page.goto(`/w/${workspaceId}/runs`);
  const form = session.page.getByRole('form', { name: 'Run a setup' });
  await form.waitFor();
  // the setup list and the revision's document have loaded once Run is enabled
  await form.getByRole('button', { name: 'Run', exact: true }).and(session.page.locator(':enabled')).waitFor();
  // the demo's Pipit front at its seeded revision: other files on this worker's database add
  // setups and revisions, and the list puts the last one changed first
  await form.getByLabel('Setup').selectOption({ label: 'Brume Pipit front, baseline' });
  await form.getByLabel('Revision').selectOption('3');
  await form.getByRole('button', { name: 'Run', exact: true }).and(session.page.locator(':enabled')).waitFor();
  return { ...session, workspaceId, form };
}

/** The number a figure shows (first span of the copy button), as text. */
async function shown(page: Page, selector: string): Promise<string> {
  return (await page.locator(`${selector} button > span`).first().textContent())?.trim() ?? '';
}

/** Shown text as a number (the app writes a true minus sign). */
const asNumber = (text: string) => Number(text.replace('\u2212', '-'));

/**
 * The browser's engine and Node's may differ in the last bits of Math.exp and friends, so a
 * figure that lands on a rounding boundary can show one unit more or less in its third
 * significant digit: allow exactly that, nothing wider.
 */
function expectWithinLastDigit(shownText: string, expectedText: string, name: string) {
  if (expectedText.includes('e')) return expect(shownText, name).toBe(expectedText);
  const decimals = expectedText.split('.')[1]?.length ?? 0;
  const step = 10 ** -decimals;
  expect(Math.abs(asNumber(shownText) - asNumber(expectedText)), `${name}: shown ${shownText}, npm run sim ${expectedText}`).toBeLessThanOrEqual(step * 1.0001);
}

async function runAndWait(page: Page) {
  await page.getByRole('button', { name: 'Run', exact: true }).click();
  await page.getByTestId('run-dashboard').waitFor({ timeout: 90_000 });
}

describe('runs in the browser', () => {
  it('runs a demo setup and shows the figures npm run sim gives for the same setup file and road', async () => {
    const { page, context, workspaceId, form } = await openRunsAs('engineer');
    // the defaults: ISO 8608 class C typed here, seed 7, 60 km/h, 20 s
    const setupId = await form.getByLabel('Setup').inputValue();
    const revision = await form.getByLabel('Revision').inputValue();
    await runAndWait(page);
    await page.waitForTimeout(300);
    await screenshot(page, 'run-dashboard-1280');
    await form.screenshot({ path: 'test-results/run-form.png' });
    await page.getByRole('table', { name: 'Saved runs' }).screenshot({ path: 'test-results/run-saved-list.png' });

    const exported = await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/revisions/${revision}/export`);
    expect(exported.ok()).toBe(true);
    const setupPath = join(scratch, 'setup.json');
    const roadPath = join(scratch, 'road.json');
    writeFileSync(setupPath, await exported.text());
    writeFileSync(roadPath, JSON.stringify({ kind: 'iso8608', class: 'C', seed: 7 }));
    const { stdout } = await run('npm', ['run', '--silent', 'sim', '--', '--setup', setupPath, '--road', roadPath, '--speed', String(60 / 3.6), '--duration', '20'], {
      cwd: process.cwd(),
      maxBuffer: 1 << 24,
    });
    const cli = JSON.parse(stdout) as { metrics: Record<string, number>; modal: { body: { naturalHz: number }; wheel: { naturalHz: number } } };

    const checks: [string, number, UnitName | undefined][] = [
      ['aw', cli.metrics.bodyAccelWkRms, 'mps2'],
      ['vdv', cli.metrics.vdv, 'mps175'],
      ['accelPeak', cli.metrics.bodyAccelPeak, 'mps2'],
      ['loadRatio', cli.metrics.tyreLoadRatio, 'percent'],
      ['loadMin', cli.metrics.tyreLoadMin, 'N'],
      ['travelRms', cli.metrics.travelRms, 'mm'],
      ['travelComp', cli.metrics.travelMaxCompression, 'mm'],
      // damper velocity in the default display unit (m/s; a person may choose another)
      ['velRms', cli.metrics.damperVelocityRms, 'mps'],
      ['energy', cli.metrics.damperEnergy, 'J'],
    ];
    for (const [name, value, unit] of checks) {
      const expected = unit ? formatQuantity(value, unit).number : String(value);
      expectWithinLastDigit(await shown(page, `[data-figure="${name}"]`), expected, name);
    }
    expect(await shown(page, '[data-headline="bodyHz"]')).toBe(formatQuantity(cli.modal.body.naturalHz, 'Hz').number);
    await context.close();
  }, LIMIT);

  it('follows a damper edit in live mode: the figures change', async () => {
    const { page, context } = await openRunsAs('engineer');
    await page.getByLabel('Duration, s').fill('8');
    await runAndWait(page);
    await page.getByText('Try a change live').click();
    const panel = page.getByRole('region', { name: 'Live run figures' });
    await page.locator('[data-live-figures][data-run-seq="1"]').waitFor({ timeout: 90_000 });
    const before = await shown(page, '[data-live-figures] [data-figure="aw"]');
    const velRmsBefore = await shown(page, '[data-live-figures] [data-figure="velRms"]');

    // raise the first rebound point to the force of the second: a much stiffer low-speed
    // rebound, and the table still never falls
    const second = Number(await page.getByLabel('rebound point 2 force').inputValue());
    const cell = page.getByLabel('rebound point 1 force');
    expect(Number(await cell.inputValue())).toBeLessThan(second);
    const seqBefore = Number(await page.locator('[data-live-figures]').getAttribute('data-run-seq'));
    await cell.fill(String(second));
    // a run the page started before the edit may still land first; the edited one follows it
    const figures = async () => [await shown(page, '[data-live-figures] [data-figure="aw"]'), await shown(page, '[data-live-figures] [data-figure="velRms"]')];
    await expect.poll(figures, { timeout: 90_000, interval: 250 }).not.toEqual([before, velRmsBefore]);
    expect(Number(await page.locator('[data-live-figures]').getAttribute('data-run-seq'))).toBeGreaterThan(seqBefore);
    await panel.screenshot({ path: 'test-results/run-live-panel.png' });

    // a table that no longer rises is refused with its reason, and the last figures stay
    await page.getByLabel('rebound point 2 velocity').fill('1');
    await panel.getByRole('alert').waitFor({ timeout: 60_000 });
    expect(await panel.getByRole('alert').textContent()).toMatch(/velocity must rise/);
    await context.close();
  }, LIMIT);

  it('cancels a long run: back to idle, and the earlier result is not shown as current', async () => {
    const { page, context } = await openRunsAs('engineer');
    await page.getByLabel('Duration, s').fill('4');
    await runAndWait(page);
    await page.getByLabel('Duration, s').fill('600');
    await page.getByRole('button', { name: 'Run', exact: true }).click();
    await page.getByRole('status', { name: 'Run in progress' }).waitFor();
    expect(await page.getByTestId('current-result').count()).toBe(0);
    // force: the button is there (the status above says the run is going); Playwright's
    // stability wait counts animation frames, which a loaded machine can stretch past the run
    await page.getByRole('button', { name: 'Cancel run' }).click({ force: true });
    await page.getByRole('status', { name: 'Run in progress' }).waitFor({ state: 'detached' });
    expect(await page.getByTestId('current-result').count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Cancel run' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: 'Run', exact: true }).isEnabled()).toBe(true);
    // a fresh run still works after the cancelled worker was replaced
    await page.getByLabel('Duration, s').fill('3');
    await runAndWait(page);
    await context.close();
  }, LIMIT);

  it('saves a run, and re-opens it after a reload without running again', async () => {
    const { page, context, workspaceId } = await openRunsAs('engineer');
    await page.getByLabel('Duration, s').fill('10');
    await runAndWait(page);
    const aw = await shown(page, '[data-figure="aw"]');
    const loadRatio = await shown(page, '[data-figure="loadRatio"]');
    const name = `Browser test save ${Date.now().toString(36)}`;
    await page.getByLabel('Save as').fill(name);
    await page.getByRole('button', { name: 'Save run' }).click();
    await page.waitForURL(new RegExp(`/w/${workspaceId}/runs/[^/?]+$`));
    await page.reload();
    await page.getByTestId('run-dashboard').waitFor();
    expect(await page.getByRole('heading', { level: 1 }).textContent()).toBe(name);
    expect(await page.getByText('nothing was run again').count()).toBe(1);
    expect(await shown(page, '[data-figure="aw"]')).toBe(aw);
    expect(await shown(page, '[data-figure="loadRatio"]')).toBe(loadRatio);
    await screenshot(page, 'run-saved-detail-1280');

    await page.getByRole('link', { name: 'Runs' }).first().click();
    const row = page.getByRole('row').filter({ hasText: name });
    await row.waitFor();
    await row.getByRole('link', { name }).click();
    await page.getByTestId('run-dashboard').waitFor();
    expect(await shown(page, '[data-figure="aw"]')).toBe(aw);
    await context.close();
  }, LIMIT);

  it('compares two setups on one road: one colour each, differences and the better value marked', async () => {
    const { page, context, workspaceId } = await openRunsAs('engineer');
    const setups = SetupsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups`)).json()).setups;
    const pipit = setups.filter((s) => s.name.includes('Pipit'));
    expect(pipit.length).toBeGreaterThanOrEqual(2);
    const params = pipit
      .slice(0, 2)
      .map((s) => `s=${s.id}:${s.latestRevision}`)
      .join('&');
    await page.goto(`/w/${workspaceId}/compare?${params}`);
    await page.getByLabel('Duration, s').fill('12');
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    await page.getByTestId('comparison').waitFor({ timeout: 90_000 });
    const table = page.getByRole('table', { name: 'Figures compared' });
    await table.waitFor();
    const awRow = table.locator('[data-row="aw"]');
    expect(await awRow.locator('[data-best]').count()).toBe(1);
    expect(await awRow.textContent()).toContain('lower is better');
    expect(await table.locator('[data-row="bodyHz"]').textContent()).toContain('not ranked');
    expect(await table.locator('[data-row="bodyHz"] [data-best]').count()).toBe(0);
    await page.waitForTimeout(300);
    await screenshot(page, 'compare-1280');
    await context.close();
  }, LIMIT);

  it('shows a viewer the runs page without a save control', async () => {
    const { page, context } = await openRunsAs('viewer');
    await page.getByLabel('Duration, s').fill('3');
    await runAndWait(page);
    expect(await page.getByRole('button', { name: 'Save run' }).count()).toBe(0);
    await context.close();
  }, LIMIT);
});
