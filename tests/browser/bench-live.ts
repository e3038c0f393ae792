/**
 * Live-mode latency in headless Chromium: from a damper-point edit to the updated figures of a
 * 20 s run on screen. A benchmark that prints figures, never a test that asserts them.
 *
 *   npm run bench:browser            # 20 edits after 3 warm-up edits
 *   npm run bench:browser -- 40      # another count
 *
 * It builds the client, seeds a fresh database and starts the server exactly as the browser
 * tests do (tests/browser/global-setup.ts), signs in as the demo engineer, runs the default
 * scenario (Brume Pipit front, ISO 8608 class C seed 7, 60 km/h) and opens "Try a change live".
 * Each edit is made inside the page (the input's value set and an input event dispatched) and
 * timed with the page's own clock up to the commit that shows the new figures, then up to the
 * next animation frame (figures painted). Edits are spaced beyond the 150 ms quiet time, so each
 * one is a leading-edge run, as a single change by a person is.
 */
import { loadavg, cpus } from 'node:os';
import { chromium } from 'playwright-core';
import setup from './global-setup.ts';
import { CHROMIUM } from './helpers/browser.ts';

const edits = Number(process.argv[2] ?? 20);
const WARM_UP = 3;

let baseUrl = '';
const teardown = await setup({ provide: (_key: string, value: string) => (baseUrl = value) } as never);

function stats(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  const q = (p: number) => s[Math.min(s.length - 1, Math.floor(p * s.length))];
  return { median: q(0.5), p90: q(0.9), min: s[0], max: s[s.length - 1] };
}

const browser = await chromium.launch({ executablePath: CHROMIUM, args: ['--headless', '--no-sandbox', '--disable-gpu'], headless: true });
try {
  const config = (await (await fetch(`${baseUrl}/api/config`)).json()) as { demoUsers: { role: string; email: string; password: string }[] };
  const engineer = config.demoUsers.find((u) => u.role === 'engineer')!;
  const context = await browser.newContext({ baseURL: baseUrl, viewport: { width: 1280, height: 900 } });
  const page = await context.newPage();
  page.setDefaultTimeout(120_000);
  await page.goto('/signin');
  await page.getByLabel('E-mail').fill(engineer.email);
  await page.getByLabel('Password', { exact: true }).fill(engineer.password);
  await page.getByRole('button', { name: 'Sign in', exact: true }).click();
  await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
  const workspaceId = new URL(page.url()).pathname.split('/')[2];
  await page.goto(`/w/${workspaceId}/runs`);
  const run = page.getByRole('button', { name: 'Run', exact: true });
  await run.and(page.locator(':enabled')).waitFor();
  await run.click();
  await page.getByTestId('run-dashboard').waitFor();
  await page.getByText('Try a change live').click();
  await page.locator('[data-live-figures][data-run-seq="1"]').waitFor();

  const low = Number(await page.getByLabel('rebound point 1 force').inputValue());
  const high = Number(await page.getByLabel('rebound point 2 force').inputValue());
  const committed: number[] = [];
  const painted: number[] = [];
  for (let i = 0; i < WARM_UP + edits; i++) {
    const value = String(i % 2 === 0 ? Math.round((low + high) / 2) : low);
    const t = await page.evaluate(
      (v) =>
        new Promise<{ commit: number; paint: number }>((resolve) => {
          const panel = document.querySelector<HTMLElement>('[data-live-figures]')!;
          const input = document.querySelector<HTMLInputElement>('[aria-label="rebound point 1 force"]')!;
          const before = panel.dataset.runSeq;
          let t0 = 0;
          const observer = new MutationObserver(() => {
            if (panel.dataset.runSeq === before) return;
            const commit = performance.now() - t0;
            observer.disconnect();
            requestAnimationFrame(() => resolve({ commit, paint: performance.now() - t0 }));
          });
          observer.observe(panel, { attributes: true, attributeFilter: ['data-run-seq'] });
          const setValue = Object.getOwnPropertyDescriptor(HTMLInputElement.prototype, 'value')!.set!;
          t0 = performance.now();
          setValue.call(input, v);
          input.dispatchEvent(new Event('input', { bubbles: true }));
        }),
      value,
    );
    if (i >= WARM_UP) {
      committed.push(t.commit);
      painted.push(t.paint);
    }
    await page.waitForTimeout(400);
  }
  const fmt = (o: Record<string, number>) => Object.fromEntries(Object.entries(o).map(([k, v]) => [k, Math.round(v * 10) / 10]));
  const report = {
    what: 'live mode, 20 s run, edit → updated figures (ms)',
    edits,
    toFiguresCommitted: fmt(stats(committed)),
    toFiguresPainted: fmt(stats(painted)),
    machine: { cpus: cpus().length, loadAverage1min: Math.round(loadavg()[0] * 100) / 100 },
  };
  console.log(JSON.stringify(report, null, 2));
  await context.close();
} finally {
  await browser.close();
  await teardown();
}
