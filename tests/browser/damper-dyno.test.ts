import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoUser, launchBrowser, newSession, RESULTS_DIR, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const PEAKS_CSV = fileURLToPath(new URL('../../examples/dyno/pipit-front-peaks.csv', import.meta.url));
const RECORD_CSV = fileURLToPath(new URL('../../examples/dyno/pipit-front-sine-record.csv', import.meta.url));
/** A dyno file with text where a force should be, on line 3. */
const BAD_CSV = 'velocity [m/s],compression force [N],rebound force [N]\n0.05,120,300\n0.1,lots,520\n0.2,330,800\n';
const SETUP = 'Brume Skerry rear, road';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function signedInAs(role: 'engineer' | 'viewer') {
  const session = await newSession(browser, baseUrl);
  await signIn(session.page, (await demoUser(baseUrl, role)).email);
  const workspaceId = new URL(session.page.url()).pathname.split('/')[2];
  return { ...session, workspaceId };
}

async function openSection(page: Page, name: string) {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name }).click();
}

/** Opens the bench of a demo setup; returns its id and latest revision number (other files may have saved to it). */
async function openBench(page: Page, workspaceId: string, name: string) {
  await openSection(page, 'Corners');
  await page.waitForURL(`**/w/${workspaceId}/corners`);
  await page.getByRole('table', { name: 'Corner setups' }).getByRole('link', { name }).click();
  await page.waitForURL(/\/corners\/[0-9a-f-]{36}$/);
  const setupId = new URL(page.url()).pathname.split('/').pop() ?? '';
  await page.getByTestId('damper-curve-editor').waitFor();
  return { setupId, latest: await latestRevision(page, workspaceId, setupId) };
}

async function latestRevision(page: Page, workspaceId: string, setupId: string): Promise<{ number: number; source: string | null; document: { damper: { compression: [number, number][] } } }> {
  const list = await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/revisions`)).json();
  const newest = list.revisions[0];
  return { ...newest, document: (await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/revisions/${newest.number}`)).json()).document };
}

async function dynoFileCount(page: Page, workspaceId: string, setupId: string): Promise<number> {
  return (await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/dyno-files`)).json()).files.length;
}

describe('damper curve editor and dyno fit on the setup bench', () => {
  it('an engineer drags a damper point (the table follows), saves, uploads a dyno file and saves its fit as a new revision; a bad file shows its line', async () => {
    const { page, context, workspaceId } = await signedInAs('engineer');
    const { setupId, latest } = await openBench(page, workspaceId, SETUP);
    const editor = page.getByTestId('damper-curve-editor');

    // drag compression point 3 upwards: its force cell changes and stays in step with the chart
    const cell = editor.getByLabel('compression force, point 3', { exact: true });
    const before = Number(await cell.inputValue());
    const handle = editor.locator('[data-handle="compression-2"]');
    await handle.scrollIntoViewIfNeeded();
    const box = await handle.boundingBox();
    if (!box) throw new Error('no handle for compression point 3');
    await page.mouse.move(box.x + box.width / 2, box.y + box.height / 2);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width / 2, box.y - 25, { steps: 6 });
    await page.mouse.up();
    await expect.poll(async () => Number(await cell.inputValue())).toBeGreaterThan(before);
    const dragged = Number(await cell.inputValue());
    await screenshot(page, 'bench-damper-dragged-1280');
    await editor.getByText('Build from parameters, scale, re-balance').click();
    await editor.getByRole('group', { name: 'Compression builder' }).waitFor();
    await editor.screenshot({ path: join(RESULTS_DIR, 'damper-editor-1280.png') });

    const bar = page.getByRole('form', { name: 'Save as a new revision' });
    await bar.getByLabel('What changed').fill('Compression point 3 raised on the chart');
    await bar.getByRole('button', { name: `Save my edits as revision ${latest.number + 1}` }).click();
    await page.getByText(`Corner setup · revision ${latest.number + 1}`).waitFor();
    const saved = await latestRevision(page, workspaceId, setupId);
    expect(saved.number).toBe(latest.number + 1);
    expect(saved.document.damper.compression[2][1]).toBeCloseTo(dragged, 6);

    // a bad dyno file: the problem by line, before and after asking the server; nothing kept
    const files = await dynoFileCount(page, workspaceId, setupId);
    await page.getByRole('tab', { name: 'Dyno fit' }).click();
    const dyno = page.getByTestId('dyno-panel');
    await dyno.getByRole('button', { name: 'Upload a dyno file' }).click();
    const upload = page.getByRole('form', { name: 'Upload a dyno file' });
    await upload.getByLabel('Dyno file (CSV)').setInputFiles({ name: 'bad-dyno.csv', mimeType: 'text/csv', buffer: Buffer.from(BAD_CSV) });
    await upload.getByRole('list', { name: 'Problems in the file' }).getByText('line 3:').waitFor();
    await upload.getByRole('button', { name: 'Upload and keep' }).click();
    await upload.getByText(/bad-dyno\.csv was not saved: line 3: 'lots'/).waitFor();
    await screenshot(page, 'bench-dyno-bad-file-1280');
    expect(await dynoFileCount(page, workspaceId, setupId)).toBe(files);
    expect((await latestRevision(page, workspaceId, setupId)).number).toBe(saved.number);

    // the example peak file: read, kept, fitted, saved as the next revision
    await upload.getByLabel('Dyno file (CSV)').setInputFiles(PEAKS_CSV);
    await upload.getByText('Read as peak points, one force column per direction').waitFor();
    await upload.getByRole('button', { name: 'Upload and keep' }).click();
    await dyno.getByRole('list', { name: 'Dyno files' }).getByText('pipit-front-peaks.csv').first().waitFor();
    await dyno.getByRole('table', { name: 'Compression residuals' }).waitFor();
    expect(await dynoFileCount(page, workspaceId, setupId)).toBe(files + 1);
    await dyno.getByRole('button', { name: `Save the fitted dyno curve as revision ${saved.number + 1}` }).click();
    await dyno.getByText(`Saved as revision ${saved.number + 1}`).waitFor();
    await page.getByText(`Corner setup · revision ${saved.number + 1}`).waitFor();
    const fitted = await latestRevision(page, workspaceId, setupId);
    expect(fitted.source).toMatch(/^dyno-fit:/);
    await dyno.getByText(`made revision ${fitted.number}`).waitFor();
    await screenshot(page, 'bench-dyno-fitted-1280');
    await dyno.screenshot({ path: join(RESULTS_DIR, 'dyno-panel-fitted-1280.png') });

    // a raw record: its strokes become peak points, drawn over the force-velocity loop
    await dyno.getByRole('button', { name: 'Upload a dyno file' }).click();
    await upload.getByLabel('Dyno file (CSV)').setInputFiles(RECORD_CSV);
    await upload.getByText('Read as a raw record (time, displacement, force)').waitFor();
    // Its header says "gas force included": the setup's static gas force (pressure × rod area) is taken out by default, and the page says why.
    const damper = (await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/revisions/${fitted.number}`)).json()).document.damper;
    const gas = damper.gas.force ?? damper.gas.pressure * damper.gas.rodArea;
    const gasText = String(Math.round(gas * 10) / 10);
    expect(await upload.getByLabel('Gas force in the readings [N]').inputValue()).toBe(gasText);
    const choice = upload.getByTestId('upload-gas-choice');
    expect(await choice.innerText()).toMatch(/header says the readings include it \(line 2: .*gas force included.*\), so the setup’s static gas force is taken out/);
    await screenshot(page, 'bench-dyno-record-gas-default-1280');
    await upload.getByRole('button', { name: 'Upload and keep' }).click();
    await dyno.getByRole('list', { name: 'Dyno files' }).getByText('pipit-front-sine-record.csv').waitFor();
    await dyno.getByRole('table', { name: 'Rebound residuals' }).waitFor();
    const kept = (await (await page.request.get(`/api/workspaces/${workspaceId}/setups/${setupId}/dyno-files`)).json()).files[0];
    expect(kept.options.gasForce).toBeCloseTo(gas, 1);
    // Beside the fit: what was taken out and what the file declares.
    expect(await dyno.getByTestId('gas-in-readings').innerText()).toMatch(/^Gas force taken out of the readings: \d+ N — the file’s header says the readings include it/);
    await dyno.screenshot({ path: join(RESULTS_DIR, 'dyno-panel-record-1280.png') });
    await page.setViewportSize({ width: 1440, height: 900 });
    await dyno.screenshot({ path: join(RESULTS_DIR, 'dyno-panel-record-1440.png') });
    await context.close();
  });

  it('a viewer sees the curve and the dyno files without edit controls', async () => {
    const { page, context, workspaceId } = await signedInAs('viewer');
    await openBench(page, workspaceId, SETUP);
    const editor = page.getByTestId('damper-curve-editor');
    expect(await editor.getByLabel('compression force, point 1', { exact: true }).isDisabled()).toBe(true);
    expect(await editor.getByText('Build from parameters, scale, re-balance').count()).toBe(0);
    await page.getByRole('tab', { name: 'Dyno fit' }).click();
    await page.getByTestId('dyno-panel').waitFor();
    expect(await page.getByRole('button', { name: 'Upload a dyno file' }).count()).toBe(0);
    expect(await page.getByRole('button', { name: /as revision \d+$/ }).count()).toBe(0);
    await screenshot(page, 'bench-viewer-1280');
    await context.close();
  });
});

describe('road library', () => {
  it('lists the demo roads, filters them, and shows a profile and a PSD against the ISO classes', async () => {
    const { page, context, workspaceId } = await signedInAs('engineer');
    await openSection(page, 'Roads');
    await page.waitForURL(`**/w/${workspaceId}/roads`);
    const table = page.getByRole('table', { name: 'Roads in this workspace' });
    await table.getByRole('link', { name: 'Town road, class C' }).waitFor();
    expect(await table.getByRole('link').count()).toBeGreaterThanOrEqual(6);
    await screenshot(page, 'roads-list-1280');

    await page.getByRole('combobox', { name: 'Filter by kind' }).selectOption('measured');
    await table.getByRole('link', { name: 'Test lane behind the works (invented)' }).waitFor();
    expect(await table.getByRole('link', { name: 'Town road, class C' }).count()).toBe(0);
    await page.getByRole('combobox', { name: 'Filter by kind' }).selectOption('');

    await table.getByRole('link', { name: 'Town road, class C' }).click();
    await page.getByRole('heading', { name: 'Town road, class C' }).waitFor();
    await page.getByRole('figure', { name: 'Road displacement PSD against ISO 8608 classes' }).locator('canvas').waitFor();
    expect(await page.getByTestId('fitted-iso-class').textContent()).toBe('C');
    await screenshot(page, 'road-detail-iso-c-1280');

    await page.goBack();
    await table.getByRole('link', { name: 'Test lane behind the works (invented)' }).click();
    await page.getByRole('figure', { name: 'Road profile' }).locator('canvas').waitFor();
    await page.getByRole('figure', { name: 'Road displacement PSD against ISO 8608 classes' }).locator('canvas').waitFor();
    await screenshot(page, 'road-detail-measured-1280');

    // a new kerb, previewed while it is typed, saved and opened
    await openSection(page, 'Roads');
    await page.getByRole('button', { name: 'Add a road' }).click();
    await page.getByLabel('Kind of road').selectOption('kerb');
    const form = page.getByRole('form', { name: 'Save road: road fields' });
    await form.getByLabel('Name').fill('Browser kerb, 60 mm up');
    await form.getByLabel('Step (up +, down −) [mm]').fill('60');
    await page.getByRole('figure', { name: 'Road profile' }).locator('canvas').waitFor();
    await screenshot(page, 'road-new-kerb-1280');
    await form.getByRole('button', { name: 'Save road' }).click();
    await page.getByRole('heading', { name: 'Browser kerb, 60 mm up' }).waitFor();
    expect(await page.getByText('Kerb step · changed').count()).toBe(1);
    await context.close();
  });
});
