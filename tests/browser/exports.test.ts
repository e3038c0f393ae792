import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Locator, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StudiesResponse } from '../../shared/schemas/study-record.ts';
import { RoadsResponse } from '../../shared/schemas/road-record.ts';
import { RunList } from '../../shared/schemas/run-record.ts';
import { SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { TargetSheetsResponse } from '../../shared/schemas/target-sheet.ts';
import { apiWrite, demoUser, RESULTS_DIR, launchBrowser, newSession, screenshot, type Session, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

/**
 * Exports and the smaller faults around them: full-rate trace CSVs of a saved run with a name
 * that says which run, a one-revision setup that has nothing to compare, a signed-out page
 * without console errors, one 403 for a viewer on the outbox, the shared copy control on a
 * study link, the labelled supplier notes, the sign-in sketch with compression up.
 */

const baseUrl = appUrl();
let browser: Browser;
const LIMIT = 180_000;
const SIZES = [
  { width: 1440, height: 900 },
  { width: 1280, height: 800 },
];

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signedIn(role: 'engineer' | 'viewer' | 'lead'): Promise<Session & { workspaceId: string }> {
  const session = await newSession(browser, baseUrl, SIZES[1]);
  await signIn(session.page, (await demoUser(baseUrl, role)).email);
  const workspaceId = /\/w\/([^/]+)/.exec(session.page.url())?.[1];
  if (!workspaceId) throw new Error(`no workspace in ${session.page.url()}`);
  return { ...session, workspaceId };
}

/** Full-page pictures at both sizes, top of the page first. */
async function pictures(page: Page, name: string) {
  for (const size of SIZES) {
    await page.setViewportSize(size);
    await page.evaluate(() => window.scrollTo(0, 0));
    await screenshot(page, `${name}-${size.width}`);
  }
}

/** Clicks the "Save PNG" of `host`, keeps the image in test-results/ to look at, answers its file name. */
async function savePng(page: Page, host: Locator, keepAs: string): Promise<string> {
  const [download] = await Promise.all([page.waitForEvent('download'), host.getByRole('button', { name: 'Save PNG' }).click()]);
  await download.saveAs(join(RESULTS_DIR, keepAs));
  return download.suggestedFilename();
}

describe('exports', () => {
  it('exports a saved run’s traces at every sample, evenly spaced, with the rate in the header and a name that says which run', async () => {
    const { page, context, workspaceId } = await signedIn('engineer');
    const runs = RunList.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/runs`)).json()).runs;
    expect(runs.length).toBeGreaterThan(0);
    await page.goto(`/w/${workspaceId}/runs/${runs[0].id}`);
    await page.getByTestId('run-dashboard').waitFor();
    await page.getByLabel('Trace sample rate').selectOption('1000');
    const [download] = await Promise.all([page.waitForEvent('download', { timeout: 120_000 }), page.getByRole('button', { name: 'Traces CSV' }).click()]);
    const name = download.suggestedFilename();
    expect(name).toMatch(/^[A-Za-z0-9_-]+-r\d+_[A-Za-z0-9-]+_\d+kmh_traces-1000hz\.csv$/);
    const text = readFileSync(await download.path(), 'utf8');
    const lines = text.trim().split('\n');
    expect(lines[1]).toBe('# sample rate 1000 Hz: every computed sample, evenly spaced 0.001 s apart');
    expect(lines[2]).toMatch(/^# computed again from the stored inputs: Wk-weighted body acceleration [\d.]+ m\/s² \(stored run [\d.]+ m\/s², /);
    expect(lines[3].startsWith('time_s,')).toBe(true);
    const times = lines.slice(4).map((l) => Number(l.split(',')[0]));
    expect(times.length).toBeGreaterThan(1000);
    for (let i = 1; i < times.length; i++) expect(times[i] - times[i - 1]).toBeCloseTo(0.001, 9);
    expect(text).not.toMatch(/\d\.\d{13,}/);

    // a saved chart image is named for the run too (its title, context line and legend: compose-image.test.ts)
    const png = await savePng(page, page.getByRole('figure', { name: 'Body acceleration', exact: true }), 'exports-run-body-accel.png');
    expect(png).toMatch(/^[A-Za-z0-9_-]+-r\d+_[A-Za-z0-9-]+_\d+kmh_time-bodyaccel\.png$/);
    await pictures(page, 'exports-saved-run');
    await context.close();
  }, LIMIT);

  it('a setup with one revision says there is nothing to compare', async () => {
    const session = await signedIn('engineer');
    const { page, context, workspaceId } = session;
    const setups = SetupsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups`)).json()).setups;
    const revision = await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setups[0].id}/revisions/1`)).json();
    const name = `One revision ${Date.now().toString(36)}`;
    const created = await apiWrite(session, 'POST', `/api/workspaces/${workspaceId}/setups`, { setup: { ...revision.document, name }, message: 'First revision' });
    expect(created.status()).toBe(201);
    const { id } = await created.json();
    await page.goto(`/w/${workspaceId}/corners/${id}?part=revisions`);
    await page.getByRole('table', { name: 'Revisions' }).waitFor();
    await page.getByText('This setup has one revision, so there is nothing to compare yet.').waitFor();
    expect(await page.getByText(/Changes from r1 to r1/).count()).toBe(0);
    expect(await page.getByRole('radio', { name: /Compare (from|to) revision/ }).count()).toBe(0);
    await page.getByRole('heading', { name: 'Changes between revisions' }).scrollIntoViewIfNeeded();
    await pictures(page, 'exports-one-revision');
    await context.close();
  }, LIMIT);
});

describe('export controls on the other pages that name their run', () => {
  it('a fresh run exports figures and traces at its own rate, named for setup, revision, road and speed; compare and road pages look right', async () => {
    const { page, context, workspaceId } = await signedIn('engineer');
    page.setDefaultTimeout(60_000);
    await page.goto(`/w/${workspaceId}/runs`);
    const form = page.getByRole('form', { name: 'Run a setup' });
    await form.getByRole('button', { name: 'Run', exact: true }).and(page.locator(':enabled')).waitFor();
    await page.getByLabel('Duration, s').fill('4');
    await form.getByRole('button', { name: 'Run', exact: true }).click();
    await page.getByTestId('run-dashboard').waitFor({ timeout: 90_000 });
    expect(await page.getByLabel('Trace sample rate').inputValue()).toBe('500');
    const [figures] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Figures CSV' }).click()]);
    expect(figures.suggestedFilename()).toMatch(/^[a-z0-9-]+-r\d+_iso-C_60kmh_figures\.csv$/);
    const text = readFileSync(await figures.path(), 'utf8');
    expect(text).not.toMatch(/\d\.\d{13,}/);
    await pictures(page, 'exports-fresh-run');

    const setups = SetupsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups`)).json()).setups.slice(0, 2);
    await page.goto(`/w/${workspaceId}/compare?${setups.map((x) => `s=${x.id}:${x.latestRevision}`).join('&')}`);
    await page.getByLabel('Duration, s').fill('4');
    await page.getByRole('button', { name: 'Compare', exact: true }).click();
    await page.getByTestId('comparison').waitFor({ timeout: 90_000 });
    const [compared] = await Promise.all([page.waitForEvent('download'), page.getByRole('button', { name: 'Figures CSV' }).click()]);
    expect(compared.suggestedFilename()).toMatch(/^compare-[a-z0-9-]+_[A-Za-z0-9-]+_\d+kmh_figures\.csv$/);
    await pictures(page, 'exports-compare');

    const roads = RoadsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/roads`)).json()).roads;
    await page.goto(`/w/${workspaceId}/roads/${roads[0].id}`);
    await page.getByRole('button', { name: 'Save PNG' }).first().waitFor();
    await pictures(page, 'exports-road');
    await context.close();
  }, LIMIT);
});

describe('smaller faults', () => {
  it('a signed-out sign-in page logs no console error and draws compression up and to the right', async () => {
    const { page, context } = await newSession(browser, baseUrl, SIZES[0]);
    const errors: string[] = [];
    page.on('console', (m) => {
      if (m.type() === 'error') errors.push(m.text());
    });
    page.on('pageerror', (e) => errors.push(e.message));
    const me = page.waitForResponse((r) => r.url().endsWith('/api/auth/me'));
    await page.goto('/signin');
    expect((await me).status()).toBe(200);
    await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
    await page.reload();
    await page.getByRole('button', { name: 'Sign in', exact: true }).waitFor();
    expect(errors).toEqual([]);

    // compression positive: its branch lies above the speed axis (smaller y) and right of the force axis
    const sketch = page.getByTestId('curve-sketch');
    if ((await sketch.count()) > 0) {
      const box = (branch: string) => sketch.locator(`[data-branch="${branch}"]`).evaluate((el) => {
          const b = (el as SVGGraphicsElement).getBBox();
          return { x: b.x, y: b.y, width: b.width, height: b.height };
        });
      const compression = await box('compression');
      const rebound = await box('rebound');
      expect(compression.y + compression.height).toBeLessThanOrEqual(110);
      expect(compression.x).toBeGreaterThanOrEqual(150);
      expect(rebound.y).toBeGreaterThanOrEqual(110);
      expect(rebound.x + rebound.width).toBeLessThanOrEqual(150);
    }
    await pictures(page, 'signin-signed-out');
    await context.close();
  }, LIMIT);

  it('a viewer opening the outbox gets one 403 request, not a retry or a poll after it', async () => {
    const { page, context } = await signedIn('viewer');
    await page.clock.install();
    let outboxCalls = 0;
    page.on('request', (r) => {
      if (new URL(r.url()).pathname === '/api/outbox') outboxCalls++;
    });
    await page.goto('/outbox');
    await page.getByText('Only workspace admins can read the outbox.').waitFor();
    // a minute of the page's own clock: retries and 5 s polls would all have fired by now
    await page.clock.runFor(60_000);
    await page.getByText('Only workspace admins can read the outbox.').waitFor();
    expect(outboxCalls).toBe(1);
    await pictures(page, 'outbox-viewer');
    await context.close();
  }, LIMIT);

  it('a study link takes an expiry and is shown with the same copy control as a setup link', async () => {
    const { page, context, workspaceId } = await signedIn('engineer');
    const studies = StudiesResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/studies`)).json()).studies;
    // the demo's two-parameter study (other files on this worker's database add studies of other shapes)
    const demo = studies.find((s) => s.name === 'Pipit front: rebound against spring rate') ?? studies[0];
    await page.goto(`/w/${workspaceId}/studies/${demo.id}`);
    await page.getByRole('button', { name: 'Share read-only link' }).click();
    await page.getByLabel('Link expiry').selectOption('7');
    await page.getByRole('button', { name: 'Make read-only link' }).click();
    const fresh = page.getByRole('status').filter({ hasText: 'Read-only link to the study' });
    await fresh.waitFor();
    expect(await fresh.getByRole('button', { name: 'Copy link' }).count()).toBe(1);
    expect(await fresh.getByLabel('Share link').inputValue()).toMatch(/\/shared\/[A-Za-z0-9_-]{43,}$/);
    expect(await fresh.getByText(/expires on/).count()).toBe(1);
    await pictures(page, 'study-share-link');
    const map = await savePng(page, page.getByRole('img', { name: /over .* and .*; hatched cells break a limit/ }).locator('..'), 'exports-study-map.png');
    expect(map).toMatch(/^[a-z0-9-]+_[a-z0-9-]+-r\d+_[A-Za-z0-9_-]+_map-[a-z0-9-]+\.png$/);

    // the setup's share panel uses the same control
    const setups = SetupsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/setups`)).json()).setups;
    await page.goto(`/w/${workspaceId}/corners/${setups[0].id}?part=links`);
    await page.getByRole('button', { name: 'Make read-only link' }).click();
    await page.getByRole('status').filter({ hasText: 'Read-only link to' }).getByRole('button', { name: 'Copy link' }).waitFor();
    await context.close();
  }, LIMIT);

  it('the supplier notes box is found by its label', async () => {
    const { page, context, workspaceId } = await signedIn('engineer');
    const sheets = TargetSheetsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/target-sheets`)).json()).sheets;
    const draft = sheets.find((s) => s.status === 'draft');
    expect(draft).toBeDefined();
    await page.goto(`/w/${workspaceId}/sheets/${draft!.id}`);
    const notes = page.getByRole('textbox', { name: 'Notes for the supplier' });
    await notes.waitFor();
    await notes.fill('Valve stack as per the last sample, please.');
    expect(await notes.inputValue()).toBe('Valve stack as per the last sample, please.');
    await notes.scrollIntoViewIfNeeded();
    await pictures(page, 'sheet-notes-label');
    await context.close();
  }, LIMIT);
});
