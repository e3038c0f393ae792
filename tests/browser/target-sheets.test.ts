import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { TargetSheetDetail, TargetSheetsResponse, type TargetPoint } from '../../shared/schemas/target-sheet.ts';
import { apiSession, demoUser, launchBrowser, linkIn, newSession, RESULTS_DIR, screenshot, signIn, waitForMail } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
let browser: Browser;

beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

/** A peak-point dyno file made from the sheet's own targets, each force times (1 + offset). */
function dynoFile(unit: string, compression: TargetPoint[], rebound: TargetPoint[], offset: (direction: string, i: number) => number): Buffer {
  const rows = compression.map((c, i) => {
    const r = rebound[i];
    return `${c.velocity},${(c.force * (1 + offset('compression', i))).toFixed(1)},${(r.force * (1 + offset('rebound', i))).toFixed(1)}`;
  });
  return Buffer.from(`# invented test readings for unit ${unit}\nvelocity [m/s],compression force [N],rebound force [N]\n${rows.join('\n')}\n`);
}

async function openSheets(page: Page) {
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Target sheets' }).click();
  await page.getByRole('heading', { name: 'Target sheets', level: 1 }).waitFor();
}

describe('damper target sheet, from draft to dyno check and print', () => {
  it('an engineer drafts and submits, the lead is mailed and releases, dyno verdicts show, the sheet prints', async () => {
    const engineer = await demoUser(baseUrl, 'engineer');
    const lead = await demoUser(baseUrl, 'lead');
    const admin = await demoUser(baseUrl, 'admin');

    // The engineer drafts a sheet from the latest revision of a demo setup.
    const eng = await newSession(browser, baseUrl);
    await signIn(eng.page, engineer.email);
    await openSheets(eng.page);
    await eng.page.getByRole('table', { name: 'Target sheets' }).waitFor();
    await screenshot(eng.page, 'sheets-list');
    const form = eng.page.getByRole('form', { name: 'Draft a target sheet' });
    await form.getByLabel('Setup').selectOption({ label: 'Brume Corrie front, touring' });
    await form.getByLabel('Revision').locator('option', { hasText: '(latest)' }).waitFor({ state: 'attached' });
    await form.getByRole('button', { name: 'Draft sheet' }).click();
    await eng.page.waitForURL(/\/sheets\/[^/]+$/);
    const sheetPath = new URL(eng.page.url()).pathname;
    const sheetId = sheetPath.split('/').pop()!;
    const workspaceId = sheetPath.split('/')[2];
    await eng.page.getByRole('form', { name: 'Edit targets' }).waitFor();
    const number = (await eng.page.getByRole('heading', { level: 1 }).innerText()).trim();
    await screenshot(eng.page, 'sheet-draft-editor');
    expect(number).toMatch(/^TS-[A-Z0-9]+-\d{4}-\d{4}$/);

    // A tighter band on the first rebound point, saved in place.
    await eng.page.getByLabel('Rebound tolerance percent, point 1').fill('12');
    await eng.page.getByRole('button', { name: 'Save targets' }).click();
    await eng.page.getByText('Unsaved changes').waitFor({ state: 'detached' });
    const saved = TargetSheetDetail.parse(await (await eng.page.request.get(`/api/workspaces/${workspaceId}/target-sheets/${sheetId}`)).json());
    expect(saved.sheet.rebound[0].tolPct).toBe(12);

    await eng.page.getByRole('button', { name: 'Submit for review' }).click();
    await eng.page.getByText(/Submitted for review; \d+ (people were|person was) e-mailed/).waitFor();
    expect(await eng.page.getByRole('button', { name: 'Submit for review' }).count()).toBe(0);

    // The lead's mail sits in the sink; its link opens the sheet.
    const outbox = await apiSession(baseUrl, admin.email);
    const mail = await waitForMail(outbox, lead.email, new RegExp(`${number} is waiting for your review`));
    const link = linkIn(mail, `/w/${workspaceId}/sheets/`);
    await outbox.dispose();

    const ld = await newSession(browser, baseUrl);
    await signIn(ld.page, lead.email);
    await ld.page.goto(new URL(link).pathname);
    await ld.page.getByRole('button', { name: 'Release…' }).click();
    const releasePanel = ld.page.getByRole('group', { name: 'Release this sheet' });
    await releasePanel.getByText(/changes parts fitted to vehicles/).waitFor();
    await screenshot(ld.page, 'sheet-release-confirm');
    await releasePanel.getByRole('button', { name: `Release ${number}` }).click();
    await ld.page.getByText(/Released; 1 person was e-mailed/).waitFor();
    expect(await ld.page.getByRole('form', { name: 'Edit targets' }).count()).toBe(0);
    await ld.context.close();

    // Back with the engineer: the sheet is released and read-only; two dampers go on the dyno.
    await eng.page.reload();
    await eng.page.getByText(/^Released: final, and the sheet in force/).waitFor();
    expect(await eng.page.getByRole('form', { name: 'Edit targets' }).count()).toBe(0);
    const released = TargetSheetDetail.parse(await (await eng.page.request.get(`/api/workspaces/${workspaceId}/target-sheets/${sheetId}`)).json()).sheet;
    expect(released.approver?.name).toBe(lead.name);
    const inside = dynoFile('CF-0101', released.compression, released.rebound, (_d, i) => (i % 2 ? 0.03 : -0.02));
    // Rebound 25 % high at the fourth speed: far outside a ±10 % band (and its 20 N floor).
    const outside = dynoFile('CF-0102', released.compression, released.rebound, (d, i) => (d === 'rebound' && i === 3 ? 0.25 : 0.01));
    await eng.page.getByLabel('Dyno files, one per damper (CSV)').setInputFiles([
      { name: 'CF-0101.csv', mimeType: 'text/csv', buffer: inside },
      { name: 'CF-0102.csv', mimeType: 'text/csv', buffer: outside },
    ]);
    await eng.page.getByRole('button', { name: 'Check 2 dampers' }).click();
    const verdicts = eng.page.getByRole('table', { name: 'Verdict per damper' });
    await verdicts.waitFor();
    const rowOf = (label: string) => verdicts.getByRole('row').filter({ has: eng.page.getByRole('cell', { name: label, exact: true }) });
    expect(await rowOf('CF-0101').getByRole('cell').last().innerText()).toMatch(/Pass/);
    expect(await rowOf('CF-0102').getByRole('cell').last().innerText()).toMatch(/Fail/);
    await eng.page.getByText('1 of 2 dampers inside every band').waitFor();
    // The failing point says which side it fell on, in words.
    const failing = eng.page.getByRole('table', { name: 'Points of CF-0102' });
    await failing.waitFor();
    expect(await failing.getByText('(above band)').count()).toBe(1);
    await screenshot(eng.page, 'sheet-detail-checked');

    // The print view: only the paper prints, on A4, with identity, tables, plot and cautions.
    await eng.page.getByRole('link', { name: 'Print view' }).click();
    const paper = eng.page.getByRole('article', { name: `Printable sheet ${number}` });
    await paper.waitFor();
    await paper.locator('canvas').first().waitFor();
    // The paper's content width on A4 (210 mm − 2 × 14 mm margins ≈ 688 CSS px), so the
    // screenshot shows the layout the PDF page gets.
    await eng.page.setViewportSize({ width: 688, height: 1000 });
    await eng.page.emulateMedia({ media: 'print' });
    expect(await eng.page.getByRole('navigation', { name: 'Sections' }).isVisible()).toBe(false);
    expect(await eng.page.getByRole('button', { name: 'Print' }).isVisible()).toBe(false);
    expect(await paper.isVisible()).toBe(true);
    for (const words of [number, 'RELEASED', lead.name, 'Compression', 'Rebound', 'do not certify a vehicle', 'do not open, heat or puncture', 'local rules', 'change parts fitted to vehicles']) {
      expect(await paper.getByText(words).first().isVisible(), words).toBe(true);
    }
    await screenshot(eng.page, 'sheet-print');
    mkdirSync(RESULTS_DIR, { recursive: true });
    const pdf = await eng.page.pdf({ format: 'A4', preferCSSPageSize: true, printBackground: true });
    writeFileSync(join(RESULTS_DIR, 'sheet-print.pdf'), pdf);
    expect(pdf.subarray(0, 5).toString()).toBe('%PDF-');
    // The whole sheet fits one A4 page.
    expect(pdf.toString('latin1').match(/\/Type\s*\/Page[^s]/g)?.length).toBe(1);
    await eng.context.close();
  });

  it('a replacement drafted from an older revision leaves the released sheet in force; the lead reviews the difference, releases with a comment, and only then is the old sheet superseded', async () => {
    const engineer = await demoUser(baseUrl, 'engineer');
    const lead = await demoUser(baseUrl, 'lead');
    const eng = await newSession(browser, baseUrl, { width: 1280, height: 800 });
    await signIn(eng.page, engineer.email);
    const workspaceId = new URL(eng.page.url()).pathname.split('/')[2];
    const api = `/api/workspaces/${workspaceId}`;
    const sheetsOf = async (page: Page) => TargetSheetsResponse.parse(await (await page.request.get(`${api}/target-sheets`)).json()).sheets;
    const inForce = async (page: Page, setupId: string) => (await sheetsOf(page)).filter((s) => s.setupId === setupId && s.status === 'released' && !s.supersededBy);

    const old = (await sheetsOf(eng.page)).find((s) => s.setupName === 'Brume Pipit front, baseline' && s.status === 'released' && !s.supersededBy);
    if (!old) throw new Error('the demo data has a released sheet for the Pipit front corner');
    const setup = SetupsResponse.parse(await (await eng.page.request.get(`${api}/setups`)).json()).setups.find((s) => s.id === old.setupId)!;

    await eng.page.goto(`/w/${workspaceId}/sheets/${old.id}`);
    await eng.page.getByRole('button', { name: 'Draft a replacement…' }).click();
    const replace = eng.page.getByRole('form', { name: 'Draft a replacement' });
    const from = replace.getByLabel(`Targets from revision of ${old.setupName}`);
    await from.locator('option', { hasText: '(latest)' }).waitFor({ state: 'attached' });
    expect(Number(await from.inputValue())).toBe(setup.latestRevision);
    await screenshot(eng.page, 'sheet-replace-panel-1280');
    await from.selectOption('1');
    await replace.getByRole('button', { name: 'Draft the replacement' }).click();
    await eng.page.waitForURL((url) => url.pathname.startsWith(`/w/${workspaceId}/sheets/`) && !url.pathname.endsWith(old.id));
    const nextId = new URL(eng.page.url()).pathname.split('/').pop()!;
    await eng.page.getByRole('form', { name: 'Edit targets' }).waitFor();
    // Drafting the replacement leaves the released sheet as it was, in force.
    expect((await inForce(eng.page, old.setupId)).map((s) => s.id)).toEqual([old.id]);
    const drafted = TargetSheetDetail.parse(await (await eng.page.request.get(`${api}/target-sheets/${nextId}`)).json());
    expect(drafted.sheet.setupRevision).toBe(1);
    expect(drafted.replaces?.id).toBe(old.id);
    await eng.page.getByRole('button', { name: 'Submit for review' }).click();
    await eng.page.getByText(/Submitted for review/).waitFor();
    await eng.context.close();

    // The lead's review: the sheet in force and this one side by side, then a release with a comment.
    const ld = await newSession(browser, baseUrl, { width: 1440, height: 900 });
    await signIn(ld.page, lead.email);
    await ld.page.goto(`/w/${workspaceId}/sheets/${nextId}`);
    const against = ld.page.getByRole('region', { name: 'Against the sheet in force' });
    await against.waitFor();
    expect(await against.getByRole('link', { name: old.number }).count()).toBe(1);
    const rebound = against.getByRole('table', { name: `Rebound: ${old.number} against ${drafted.sheet.number}` });
    expect(await rebound.getByRole('row').count()).toBe(1 + new Set([...old.rebound, ...drafted.sheet.rebound].map((p) => p.velocity)).size);
    // Revision 1 has the softer rebound (revision 2 raised it), so some rebound targets differ.
    expect(await rebound.getByText(/^-\d+\.\d %$/).count()).toBeGreaterThan(0);
    await ld.page.getByRole('button', { name: 'Release…' }).click();
    const releasePanel = ld.page.getByRole('group', { name: 'Release this sheet' });
    await releasePanel.getByText(`Releasing supersedes ${old.number}`, { exact: false }).waitFor();
    const comment = 'Back to the first rebound curve: the +15 % knee made the rear hop on the test loop.';
    await releasePanel.getByLabel(/Release comment/).fill(comment);
    await screenshot(ld.page, 'sheet-review-against-in-force-1440');
    await ld.page.setViewportSize({ width: 1280, height: 800 });
    await screenshot(ld.page, 'sheet-review-against-in-force-1280');
    await releasePanel.getByRole('button', { name: `Release ${drafted.sheet.number}` }).click();
    await ld.page.getByText(/Released; /).waitFor();
    await ld.page.locator('dl[aria-label="Sheet identity"]').getByText(comment).waitFor();
    expect(await ld.page.getByRole('list', { name: 'History' }).getByText(comment, { exact: false }).count()).toBe(1);
    await screenshot(ld.page, 'sheet-released-with-comment-1280');

    // Now, and only now, the old sheet is superseded: one sheet in force.
    expect((await inForce(ld.page, old.setupId)).map((s) => s.id)).toEqual([nextId]);
    const oldNow = TargetSheetDetail.parse(await (await ld.page.request.get(`${api}/target-sheets/${old.id}`)).json()).sheet;
    expect(oldNow.supersededBy?.id).toBe(nextId);
    await ld.context.close();
  });
});
