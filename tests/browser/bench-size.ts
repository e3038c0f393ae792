import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { FIRST_LOAD_BUDGET_BYTES, firstLoads } from './helpers/first-load.ts';

/**
 * `npm run size`: builds the client into a temporary folder and prints what the first load of
 * each page weighs (raw and gzip), heaviest first; exits 1 when one is over the budget.
 * (`tests/browser/bundle-size.test.ts` checks the split itself on the browser tests' build, which
 * is not a production one.)
 */
// the size that ships: React and the router in production form, whatever the calling shell set
process.env.NODE_ENV = 'production';
const root = resolve(fileURLToPath(new URL('../..', import.meta.url)));
const dir = mkdtempSync(join(tmpdir(), 'ridewright-size-'));
try {
  await build({ root, configFile: join(root, 'vite.config.ts'), logLevel: 'warn', mode: 'production', build: { outDir: dir, emptyOutDir: true, manifest: true } });
  const kB = (n: number) => (n / 1000).toFixed(1).padStart(8);
  const loads = firstLoads(dir);
  console.log(`${'first load of'.padEnd(44)} ${'raw kB'.padStart(8)} ${'gzip kB'.padStart(8)}`);
  for (const l of loads) console.log(`${l.page.replace('src/app/routes/', '').padEnd(44)} ${kB(l.rawBytes)} ${kB(l.gzipBytes)}`);
  const over = loads.filter((l) => l.gzipBytes > FIRST_LOAD_BUDGET_BYTES);
  console.log(`budget ${FIRST_LOAD_BUDGET_BYTES / 1000} kB gzip: ${over.length ? `${over.length} page(s) over` : 'every page within'}`);
  process.exitCode = over.length ? 1 : 0;
} finally {
  rmSync(dir, { recursive: true, force: true });
}
