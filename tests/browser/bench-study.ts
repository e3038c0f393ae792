/**
 * `npm run bench:study`: times a 20 × 20 study (400 runs of 60 s over ISO 8608 class C at
 * 20 m/s, plus the base setup's run) in headless Chromium, through the same run code, worker
 * pool and study worker the study page uses. Not a test: it prints figures, asserts nothing.
 *
 * Steps: build tests/browser/bench-study/ with the project's Vite config into a temporary
 * folder, serve it on 127.0.0.1, open it in Debian's Chromium, warm the pool (the page does
 * that on mount), then run the study `--repeat` times (default 5) and print each run and the
 * median. The machine is shared: the load average is printed beside the figures.
 * `--seeds N` runs every point over N road seeds (400 × N runs, plus the base setup's N).
 */
import { createReadStream, existsSync, mkdtempSync, rmSync, statSync } from 'node:fs';
import { createServer } from 'node:http';
import { loadavg, tmpdir } from 'node:os';
import { extname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import type { BenchResult } from './bench-study/bench-entry.ts';
import { launchBrowser } from './helpers/browser.ts';

const root = resolve(fileURLToPath(new URL('../..', import.meta.url)));
const repeatArg = process.argv.indexOf('--repeat');
const repeat = repeatArg > 0 ? Math.max(1, Number(process.argv[repeatArg + 1]) || 5) : 5;
const seedsArg = process.argv.indexOf('--seeds');
const seeds = seedsArg > 0 ? Math.min(50, Math.max(1, Number(process.argv[seedsArg + 1]) || 1)) : 1;

const types: Record<string, string> = { '.html': 'text/html', '.js': 'text/javascript', '.css': 'text/css', '.json': 'application/json', '.map': 'application/json' };

const out = mkdtempSync(join(tmpdir(), 'ridewright-bench-study-'));
try {
  await build({
    root: join(root, 'tests/browser/bench-study'),
    configFile: join(root, 'vite.config.ts'),
    logLevel: 'warn',
    build: { outDir: out, emptyOutDir: true, sourcemap: false },
  });

  const server = createServer((req, res) => {
    const path = join(out, decodeURIComponent((req.url ?? '/').split('?')[0]).replace(/^\/+/, '') || 'index.html');
    if (!path.startsWith(out) || !existsSync(path) || statSync(path).isDirectory()) {
      res.writeHead(404).end();
      return;
    }
    res.writeHead(200, { 'content-type': types[extname(path)] ?? 'application/octet-stream' });
    createReadStream(path).pipe(res);
  });
  await new Promise<void>((done) => server.listen(0, '127.0.0.1', done));
  const address = server.address();
  const url = `http://127.0.0.1:${typeof address === 'object' && address ? address.port : 0}/`;

  const browser = await launchBrowser();
  try {
    const page = await browser.newPage();
    page.on('pageerror', (e) => console.error('page error:', e.message));
    await page.goto(url);
    await page.waitForFunction(() => document.getElementById('status')?.textContent === 'ready');
    const workers = await page.evaluate(() => window.benchStudy.warm());
    const hardware = await page.evaluate(() => navigator.hardwareConcurrency);
    console.log(`Chromium reports ${hardware} logical cores; ${workers} study workers.`);
    const results: BenchResult[] = [];
    for (let i = 0; i < repeat; i++) {
      const load = loadavg()[0];
      const r = await page.evaluate((n) => window.benchStudy.run(n), seeds);
      results.push(r);
      console.log(
        `run ${i + 1}: ${(r.elapsedMs / 1000).toFixed(2)} s for ${r.runs} runs (${(r.runs / (r.elapsedMs / 1000)).toFixed(0)} runs/s), ${r.status}; ` +
          `progress moved ${r.progressEvents} times (longest wait ${r.longestProgressGapMs.toFixed(0)} ms); longest main-thread gap ${r.longestGapMs.toFixed(0)} ms; load average before ${load.toFixed(1)}`,
      );
    }
    const sorted = results.map((r) => r.elapsedMs).sort((a, b) => a - b);
    const median = sorted[Math.floor(sorted.length / 2)];
    console.log(`median ${(median / 1000).toFixed(2)} s over ${repeat} runs${seeds === 1 ? ' (target ≤ 3 s)' : ` of 400 points × ${seeds} seeds`}; best ${(sorted[0] / 1000).toFixed(2)} s.`);
  } finally {
    await browser.close();
    server.close();
  }
} finally {
  rmSync(out, { recursive: true, force: true });
}
