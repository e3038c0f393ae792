import { describe, expect, inject, it } from 'vitest';
import { firstLoads } from './helpers/first-load.ts';

/**
 * Reads the build the browser tests already made (global-setup.ts). That build runs under
 * NODE_ENV=test, so React and the router are in their larger development form: the budget on
 * compressed size is checked on a production build by `npm run size`, not here.
 */
const clientDir = inject('clientDir');

describe('client bundle', () => {
  const loads = firstLoads(clientDir);

  it('is split by page: the shell loads without the code of any page, each page adds its own chunk', () => {
    const entry = loads.find((l) => l.page === 'entry');
    expect(entry).toBeDefined();
    const pages = loads.filter((l) => l.page.startsWith('src/app/routes/'));
    expect(pages.map((l) => l.page)).toEqual(expect.arrayContaining(['src/app/routes/corner-bench.tsx', 'src/app/routes/study-detail.tsx', 'src/app/routes/sign-in.tsx', 'src/app/routes/runs.tsx']));
    for (const p of pages) expect(p.files.length).toBeGreaterThan(entry!.files.length);
    // the heavy pages' code (charts, the setup editor) is not part of the shell
    expect(entry!.files.some((f) => /uplot|corner-bench|study-detail/.test(f))).toBe(false);
  });
});
