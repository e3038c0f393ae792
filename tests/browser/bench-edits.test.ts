import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { demoUser, launchBrowser, newSession, screenshot, signIn } from './helpers/browser.ts';
import { appUrl } from './helpers/app-url.ts';

const baseUrl = appUrl();
/** Desktop and laptop sizes the bench must read well at. */
const SIZES = [
  { width: 1440, height: 900 },
  { width: 1280, height: 800 },
] as const;

let browser: Browser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
});

async function openBench(page: Page, name: string) {
  await signIn(page, (await demoUser(baseUrl, 'engineer')).email);
  await page.getByRole('navigation', { name: 'Sections' }).getByRole('link', { name: 'Corners' }).click();
  // other files on this worker's database may have made a setup of the same name: any one will do
  await page.getByRole('table', { name: 'Corner setups' }).getByRole('link', { name, exact: true }).first().click();
  await page.waitForURL(/\/corners\/[0-9a-f-]{36}$/);
  await page.getByTestId('damper-curve-editor').waitFor();
  return new URL(page.url()).pathname;
}

/** Width, overflow and the number of lines of each label of the equivalent-damping panel. */
async function figuresPanelLayout(page: Page) {
  return page.getByRole('region', { name: 'Damping figures' }).evaluate((panel) => {
    const lines = [...panel.querySelectorAll('dt')].map((dt) => {
      const text = dt.firstChild;
      if (!text) return 0;
      const range = document.createRange();
      range.selectNodeContents(text);
      return new Set([...range.getClientRects()].map((r) => Math.round(r.top))).size;
    });
    return { width: panel.getBoundingClientRect().width, scrollWidth: panel.scrollWidth, clientWidth: panel.clientWidth, lines };
  });
}

describe('edits on the corner bench', () => {
  it('an invalid damper cell is an unsaved change named in plain words; leaving asks first, and staying keeps it', async () => {
    const { page, context } = await newSession(browser, baseUrl, SIZES[0]);
    const benchPath = await openBench(page, 'Brume Corrie front, touring');
    const status = page.getByTestId('save-status');
    expect(await status.textContent()).toMatch(/^No changes since revision \d+$/);

    const editor = page.getByTestId('damper-curve-editor');
    const speed = Number(await editor.getByLabel('rebound velocity, point 2', { exact: true }).inputValue());
    const cell = editor.getByLabel('rebound force, point 2', { exact: true });
    await cell.fill('-112');
    await expect.poll(() => status.textContent()).toMatch(/^Unsaved changes to revision \d+, one of them invalid$/);
    const bar = page.getByRole('form', { name: 'Save as a new revision' });
    await bar.getByRole('list', { name: 'Values to fix' }).getByText(`Rebound force at ${speed} m/s must be 0 N or more`).waitFor();
    expect(await bar.getByRole('button', { name: /^Save my edits as revision/ }).isDisabled()).toBe(true);
    // no validator wording anywhere on the page
    expect(await page.getByText(/expected|Too small|Too big|Invalid input/).count()).toBe(0);

    for (const size of SIZES) {
      await page.setViewportSize(size);
      const layout = await figuresPanelLayout(page);
      console.log(`equivalent-damping panel at ${size.width}×${size.height}: ${Math.round(layout.width)} px wide, label lines ${layout.lines.join(' ')}`);
      expect(layout.width).toBeGreaterThanOrEqual(240);
      expect(layout.scrollWidth).toBeLessThanOrEqual(layout.clientWidth);
      // each label on one line: the panel is never crushed to a word per line
      for (const n of layout.lines) expect(n).toBe(1);
      await page.evaluate(() => window.scrollTo(0, 0));
      await screenshot(page, `bench-invalid-edit-${size.width}`);
    }

    // leaving for another section asks; staying keeps the page and the text as typed
    const nav = page.getByRole('navigation', { name: 'Sections' });
    await nav.getByRole('link', { name: 'Runs' }).click();
    const ask = page.getByRole('alertdialog', { name: 'Leave without saving?' });
    await ask.waitFor();
    expect(await ask.textContent()).toMatch(/not valid yet/);
    await page.screenshot({ path: 'test-results/bench-leave-dialog-1280.png' });
    await ask.getByRole('button', { name: 'Stay and keep editing' }).click();
    await ask.waitFor({ state: 'detached' });
    expect(new URL(page.url()).pathname).toBe(benchPath);
    expect(await cell.inputValue()).toBe('-112');

    // discarding brings the table back and the bar says so
    await bar.getByRole('button', { name: 'Discard changes' }).click();
    await expect.poll(() => status.textContent()).toMatch(/^No changes since revision \d+$/);
    expect(Number(await editor.getByLabel('rebound force, point 2', { exact: true }).inputValue())).toBeGreaterThan(0);

    // a valid edit counts too; leaving anyway goes
    await editor.getByLabel('rebound force, point 2', { exact: true }).fill(String(Number(await cell.inputValue()) + 1));
    await expect.poll(() => status.textContent()).toMatch(/^Unsaved changes to revision \d+$/);
    await nav.getByRole('link', { name: 'Runs' }).click();
    await ask.getByRole('button', { name: 'Leave and lose the edits' }).click();
    await page.waitForURL(/\/runs$/);
    await context.close();
  });

  it('the two ways to save a revision have different names and sit with what they save', async () => {
    const { page, context } = await newSession(browser, baseUrl, SIZES[0]);
    const benchPath = await openBench(page, 'Brume Pipit front, baseline');
    const saveName = /as revision \d+$/;
    // the bench tab: only the button that saves the edits in the form and tables
    const benchButtons = page.getByRole('button', { name: saveName });
    expect(await benchButtons.count()).toBe(1);
    const editsName = (await benchButtons.textContent())?.trim() ?? '';
    expect(editsName).toMatch(/^Save my edits as revision \d+$/);
    expect(await page.getByRole('form', { name: 'Save as a new revision' }).getByRole('button', { name: editsName }).count()).toBe(1);

    // an edit on the bench, then the dyno tab: its own button, and a word that the edit is not in it
    await page.getByRole('group', { name: 'Setup values' }).getByLabel('Sprung mass', { exact: true }).fill('301');
    await page.getByRole('tab', { name: /^Bench/ }).getByText('unsaved edits').waitFor();
    await page.getByRole('tab', { name: 'Dyno fit' }).click();
    const dyno = page.getByTestId('dyno-panel');
    await dyno.getByRole('table', { name: 'Compression residuals' }).waitFor();
    const dynoButtons = page.getByRole('button', { name: saveName });
    expect(await dynoButtons.count()).toBe(1);
    const fitName = (await dynoButtons.textContent())?.trim() ?? '';
    expect(fitName).toMatch(/^Save the fitted dyno curve as revision \d+$/);
    expect(await dyno.getByRole('group', { name: 'Save the fitted curve' }).getByRole('button', { name: fitName }).count()).toBe(1);
    expect(fitName).not.toBe(editsName);
    await dyno.getByText('Your unsaved edits on the bench are not part of it.').waitFor();
    expect(new URL(page.url()).search).toBe('?part=dyno');

    for (const size of SIZES) {
      await page.setViewportSize(size);
      for (const part of ['Dyno fit', 'Bench'] as const) {
        const tab = page.getByRole('tab', { name: new RegExp(`^${part}`) });
        await tab.click();
        await expect.poll(() => tab.getAttribute('aria-selected')).toBe('true');
        await page.getByRole('tabpanel', { name: new RegExp(`^${part}`) }).waitFor();
        const height = await page.evaluate(() => new Promise<number>((done) => requestAnimationFrame(() => done(document.documentElement.scrollHeight))));
        console.log(`corner bench, ${part} tab, at ${size.width}×${size.height}: page ${height} px tall`);
        await page.evaluate(() => window.scrollTo(0, 0));
        await screenshot(page, `bench-${part === 'Bench' ? 'edit' : 'dyno'}-tab-${size.width}`);
      }
    }
    // the edit survived the trips between tabs
    expect(await page.getByRole('group', { name: 'Setup values' }).getByLabel('Sprung mass', { exact: true }).inputValue()).toBe('301');
    expect(new URL(page.url()).pathname).toBe(benchPath);
    await context.close();
  });
});
