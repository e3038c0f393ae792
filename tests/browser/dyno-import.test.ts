import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { TargetSheetDetail, TargetSheetsResponse } from '../../shared/schemas/target-sheet.ts';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
const SIZES = [
  { width: 1440, height: 900 },
  { width: 1280, height: 800 },
] as const;
// 1 in = 0.0254 m and 1 lbf = 4.4482216152605 N exactly (NIST SP 811, appendix B)
const INCH = 0.0254;
const LBF = 4.4482216152605;
/** Invented peak readings in inch-pound units, with one compression force written with the wrong sign (line 4). */
const IMPERIAL = 'velocity [in/s],compression force [lbf],rebound force [lbf]\n2,14,30\n4,25,55\n8,-25,118\n12,55,180\n20,70,260\n';

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function engineer(size: (typeof SIZES)[number]) {
  const session = await newSession(browser, baseUrl, size);
  await signIn(session.page, (await demoUser(baseUrl, 'engineer')).email);
  return { ...session, workspaceId: new URL(session.page.url()).pathname.split('/')[2] };
}

async function shoot(page: Page, name: string) {
  for (const size of SIZES) {
    await page.setViewportSize(size);
    await page.evaluate(() => new Promise((done) => requestAnimationFrame(done)));
    await screenshot(page, `${name}-${size.width}`);
  }
}

describe('dyno files in inch-pound units', () => {
  it('the bench reads an in/s and lbf file and names the file and line of a force with the wrong sign', async () => {
    const { page, context } = await engineer(SIZES[0]);
    await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Corners' }).click();
    await page.getByRole('table', { name: 'Corner setups' }).getByRole('link', { name: 'Brume Corrie rear, touring', exact: true }).click();
    await page.getByRole('tab', { name: 'Dyno fit' }).click();
    await page.getByRole('button', { name: 'Upload a dyno file' }).click();
    const upload = page.getByRole('form', { name: 'Upload a dyno file' });
    await upload.getByLabel('Dyno file (CSV)').setInputFiles({ name: 'corrie-rear-bench-b.csv', mimeType: 'text/csv', buffer: Buffer.from(IMPERIAL) });
    await upload.getByText(/velocity in in\/s \(from the header\)/).waitFor();
    await upload.getByText(/force in lbf \(from the header\)/).waitFor();
    const warnings = upload.getByRole('list', { name: 'Warnings from the file' });
    await warnings.getByText('corrie-rear-bench-b.csv, line 4: compression force -25 lbf at 8 in/s has the wrong sign for its direction', { exact: false }).waitFor();
    await shoot(page, 'dyno-import-imperial');
    await context.close();
  });

  it('a sheet check takes two files in different units, each read with its own settings', async () => {
    const { page, context, workspaceId } = await engineer(SIZES[0]);
    const list = TargetSheetsResponse.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/target-sheets`)).json());
    const released = list.sheets.find((s) => s.status === 'released');
    if (!released) throw new Error('the demo has a released sheet');
    const { sheet } = TargetSheetDetail.parse(await (await page.request.get(`/api/workspaces/${workspaceId}/target-sheets/${released.id}`)).json());
    // one damper measured on the targets, written once in in/s and lbf, once bare in mm/s and kN
    const rows = sheet.compression.map((c, i) => [c.velocity, c.force, sheet.rebound[i].force] as const);
    const imperial = `velocity [in/s],compression force [lbf],rebound force [lbf]\n${rows.map(([v, c, r]) => [v / INCH, c / LBF, r / LBF].join(',')).join('\n')}\n`;
    const bare = `velocity,compression force,rebound force\n${rows.map(([v, c, r]) => [v * 1000, c / 1000, r / 1000].join(',')).join('\n')}\n`;

    await page.goto(`/w/${workspaceId}/sheets/${sheet.id}`);
    await page.getByLabel('Dyno files, one per damper (CSV)').setInputFiles([
      { name: 'PF-0301-bench-b.csv', mimeType: 'text/csv', buffer: Buffer.from(imperial) },
      { name: 'PF-0302-bench-c.csv', mimeType: 'text/csv', buffer: Buffer.from(bare) },
    ]);
    await page.getByLabel('Speed unit of PF-0302-bench-c.csv').selectOption('mm/s');
    await page.getByLabel('Force unit of PF-0302-bench-c.csv').selectOption('kN');
    await shoot(page, 'sheet-check-per-file-units');
    await page.setViewportSize(SIZES[0]);
    await page.getByRole('button', { name: 'Check 2 dampers' }).click();
    const verdicts = page.getByRole('table', { name: 'Verdict per damper' }).first();
    await verdicts.getByRole('cell', { name: 'PF-0302-bench-c', exact: true }).waitFor();
    const rowOf = (label: string) => verdicts.getByRole('row').filter({ has: page.getByRole('cell', { name: label, exact: true }) });
    expect(await rowOf('PF-0301-bench-b').getByRole('cell').last().innerText()).toMatch(/Pass/);
    expect(await rowOf('PF-0302-bench-c').getByRole('cell').last().innerText()).toMatch(/Pass/);
    await context.close();
  });
});
