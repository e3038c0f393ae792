import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StudyDetail } from '../../shared/schemas/study-record.ts';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

describe('seed ensembles in the browser', () => {
  it('a three-parameter study over three road seeds shows the mean with its spread in the card, the table and the charts, and slices the map; a run repeats over seeds', async () => {
    const { page, context } = await newSession(browser, baseUrl, { width: 1440, height: 900 });
    page.setDefaultTimeout(60_000);
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    const workspaceId = new URL(page.url()).pathname.split('/')[2];
    await page.goto(`/w/${workspaceId}/studies`);
    await page.getByRole('button', { name: 'New study' }).click();
    const form = page.getByRole('form', { name: 'Define a study' });
    await form.getByLabel('Study name').fill(`Seeds ${Date.now()}`);
    await form.getByLabel('Base setup').selectOption({ label: 'Brume Pipit front, baseline' });
    const axis = async (name: string, parameter: string, from: string, to: string) => {
      const g = form.getByRole('group', { name });
      await g.getByLabel('Parameter').selectOption(parameter);
      await g.getByLabel('From').fill(from);
      await g.getByLabel('To').fill(to);
      await g.getByLabel('Steps').fill('2');
    };
    await axis('First swept parameter', 'reboundScale', '0.8', '1.4');
    await axis('Second swept parameter', 'springRate', '26', '36');
    await form.getByRole('button', { name: 'Sweep a third parameter' }).click();
    await axis('Third swept parameter', 'tyreRate', '180', '260');
    await form.getByLabel('Road 1').selectOption('iso:C');
    // the form shows speeds in the person's unit, km/h by default: 72 km/h = 20 m/s
    await form.getByLabel('Speeds [km/h]').fill('72');
    await form.getByLabel('Run length [s]').fill('10');
    await form.getByLabel('Road seeds per point').fill('3');
    // 8 points × 3 seeds, and the base setup's 3 runs.
    await form.getByText('8 points, 27 runs of 10 s (3 road seeds a point)').waitFor();
    await form.getByRole('button', { name: 'Save and run' }).click();

    await page.waitForURL(new RegExp(`/w/${workspaceId}/studies/[^/?]+$`));
    const studyId = new URL(page.url()).pathname.split('/')[4];
    await page.getByText('Saved: complete results.').waitFor({ timeout: 120_000 });
    const saved = StudyDetail.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/studies/${studyId}`)).json());
    expect(saved.definition.seeds).toBe(3);
    expect(saved.points).toHaveLength(8);
    // The server works the spread out again from the saved runs: three seeds per point.
    expect(saved.points.every((p) => p.runs.length === 3 && p.spread?.bodyAccelWkRms?.n === 3)).toBe(true);

    const card = page.getByRole('region', { name: 'Best compromise' });
    expect(await card.getByTestId('compromise-spread').textContent()).toMatch(/^Chosen on the mean over 3 road seeds\. Across them, Wk-weighted body acceleration runs from /);
    await page.getByTestId('seed-note').waitFor();
    const table = page.getByRole('table', { name: 'Study points' });
    expect(await table.getByText(/±/).count()).toBeGreaterThan(0);
    // The map shows two of the three parameters; the third is held at a value the engineer picks.
    const map = page.getByRole('region', { name: 'Map of a figure' });
    await map.getByLabel('At tyre rate [N/mm]').selectOption({ index: 1 });
    await screenshot(page, 'study-seeds-1440');
    await page.setViewportSize({ width: 1280, height: 800 });
    await screenshot(page, 'study-seeds-1280');

    // A single run over seeds, from the runs page.
    await page.goto(`/w/${workspaceId}/runs`);
    const runForm = page.getByRole('form', { name: 'Run a setup' });
    await runForm.getByRole('button', { name: 'Run', exact: true }).and(page.locator(':enabled')).waitFor();
    await runForm.getByRole('button', { name: 'Run', exact: true }).click();
    await page.getByTestId('current-result').waitFor({ timeout: 120_000 });
    await page.getByText('Repeat over several road seeds').click();
    await page.getByRole('region', { name: 'Over several road seeds' }).getByLabel('Road seeds').fill('4');
    await page.getByRole('button', { name: 'Repeat over 4 seeds' }).click();
    const result = page.getByTestId('seed-repeat-result');
    await result.waitFor({ timeout: 120_000 });
    const rows = result.getByRole('table', { name: 'Figures over road seeds' }).getByRole('row');
    expect(await rows.count()).toBeGreaterThan(4);
    expect(await result.getByText(/^4 runs of /).count()).toBe(1);
    await screenshot(page, 'run-seeds-1280');
    await context.close();
  });
});
