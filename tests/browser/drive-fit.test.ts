import { readFileSync } from 'node:fs';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { appUrl } from './helpers/app-url.ts';
import { apiWrite, csrfToken, demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';

const baseUrl = appUrl();
const SIZES = [
  { width: 1440, height: 900 },
  { width: 1280, height: 800 },
] as const;
const example = (path: string) => readFileSync(new URL(`../../examples/${path}`, import.meta.url));

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function shoot(page: Page, name: string) {
  for (const size of SIZES) {
    await page.setViewportSize(size);
    await page.evaluate(() => new Promise((done) => requestAnimationFrame(done)));
    await screenshot(page, `${name}-${size.width}`);
  }
}

describe('drive fit', () => {
  it('an engineer uploads a drive log, fits the corner over a library profile and saves it as a revision citing the drive', async () => {
    const session = await newSession(browser, baseUrl, SIZES[0]);
    const { page, context } = session;
    await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
    const workspaceId = new URL(page.url()).pathname.split('/')[2];
    const ws = `/api/workspaces/${workspaceId}`;
    // The example corner (the drawing) under a name of its own, so tests that pick the demo's
    // "Brume Pipit front, baseline" by name never meet this copy, and the invented lane the
    // example drive was made over.
    const corner = { ...JSON.parse(example('pipit-front.setup.json').toString()), name: 'Pipit front for the drive fit' };
    const setup = SetupDetail.parse(await (await apiWrite(session, 'POST', `${ws}/setups`, { setup: corner })).json());
    const road = await page.request.post(`${ws}/roads/measured`, {
      headers: { 'x-csrf-token': await csrfToken(context) },
      multipart: { name: 'Tallis test lane', distanceUnit: 'm', elevationUnit: 'mm', file: { name: 'tallis-lane.csv', mimeType: 'text/csv', buffer: example('tallis-lane.csv') } },
    });
    expect(road.status()).toBe(201);

    await page.goto(`/w/${workspaceId}/corners/${setup.id}?part=drive`);
    await page.getByText('No measured drives for this setup yet.').waitFor();
    await page.getByRole('button', { name: 'Upload a drive log' }).click();
    const file = page.getByLabel('Drive log (CSV)');
    // a cell that is not a number: the refusal names its line and column
    const bad = example('drive/pipit-front-lane-drive.csv').toString().split('\n');
    bad[10] = bad[10].replace(/^([^,]*),[^,]*/, '$1,fast');
    await file.setInputFiles({ name: 'lane-bad.csv', mimeType: 'text/csv', buffer: Buffer.from(bad.join('\n')) });
    await page.getByRole('button', { name: 'Upload the drive' }).click();
    await page.getByText(/line 11, column B \(speed \[km\/h\]\)/).first().waitFor();

    await file.setInputFiles({ name: 'pipit-front-lane-drive.csv', mimeType: 'text/csv', buffer: example('drive/pipit-front-lane-drive.csv') });
    await page.getByRole('button', { name: 'Upload the drive' }).click();
    await page.getByRole('list', { name: 'Measured drives' }).getByText('pipit-front-lane-drive.csv').waitFor();
    await page.getByLabel('Road under the drive').selectOption({ label: 'Tallis test lane' });
    await page.getByRole('button', { name: 'Run the fit' }).click();
    await page.getByText('The model follows this drive').waitFor({ timeout: 60_000 });
    // the example drive was made with a 34.5 N/mm spring (examples/drive/make-drive.ts)
    const springRow = page.getByRole('table', { name: /Fitted parameters/ }).getByRole('row', { name: /Spring rate/ });
    await expect.poll(async () => (await springRow.textContent()) ?? '').toMatch(/34\.5\d? N\/mm/);
    await page.getByRole('figure', { name: /Body acceleration: spectra/ }).waitFor();
    await shoot(page, 'drive-fit');

    await page.getByRole('button', { name: `Save the fitted corner as revision ${setup.latestRevision + 1}` }).click();
    await page.getByText(`Saved as revision ${setup.latestRevision + 1}, citing pipit-front-lane-drive.csv.`).waitFor();
    const after = SetupDetail.parse(await (await page.request.get(`${ws}/setups/${setup.id}`)).json());
    expect(after.revision.message).toMatch(/fitted to drive pipit-front-lane-drive\.csv/);

    // the same drive over another lane of the library is reported as a poor fit and cannot be saved
    await page.getByLabel('Road under the drive').selectOption({ label: 'Test lane behind the works (invented)' });
    await page.getByRole('button', { name: 'Run the fit' }).click();
    await page.getByText('Poor fit: check the road and the signals before using these values').waitFor({ timeout: 60_000 });
    expect(await page.getByRole('button', { name: /Save the fitted corner as revision/ }).isDisabled()).toBe(true);
    await shoot(page, 'drive-fit-wrong-road');
    await context.close();
  });
});
