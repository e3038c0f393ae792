// The import boundaries of DEVELOPERS.md are ESLint rules (eslint.config.js). These probes prove
// each rule still fires, so a loosened config fails here instead of letting drift in quietly.
import { resolve } from 'node:path';
import { ESLint } from 'eslint';
import { describe, expect, it } from 'vitest';

const root = resolve(__dirname, '../..');
const eslint = new ESLint({ cwd: root });

/** Rule ids that fire on `code` as if it were the file at `path` (relative to the repo). */
async function rulesFiredOn(path: string, code: string): Promise<string[]> {
  const [result] = await eslint.lintText(code, { filePath: resolve(root, path) });
  return result.messages.map((m) => m.ruleId ?? m.message);
}

const probes: { what: string; path: string; code: string; fires: string | null }[] = [
  { what: 'a domain reads another domain’s repository', path: 'server/roads/probe.ts', code: "import { findSetup } from '../setups/setups.repository.ts';\nexport const p = findSetup;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'a domain uses another domain’s index.ts', path: 'server/roads/probe.ts', code: "import { findSetup } from '../setups/index.ts';\nexport const p = findSetup;\n", fires: null },
  { what: 'a domain reaches into another domain’s service', path: 'server/roads/probe.ts', code: "import { listSetups } from '../setups/setups.service.ts';\nexport const p = listSetups;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'a route reads its own repository', path: 'server/roads/probe.routes.ts', code: "import { insertRoad } from './roads.repository.ts';\nexport const p = insertRoad;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'the app shell reads a repository', path: 'server/http/probe.ts', code: "import { insertRoad } from '../roads/roads.repository.ts';\nexport const p = insertRoad;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'a client feature imports another feature', path: 'src/features/runs/probe.ts', code: "import { createRoad } from '../roads/api/create-road.ts';\nexport const p = createRoad;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'a client feature imports the app shell', path: 'src/features/runs/probe.ts', code: "import { sections } from '../../app/sections.ts';\nexport const p = sections;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'the client imports server code', path: 'src/lib/probe.ts', code: "import { createApp } from '../../server/app.ts';\nexport const p = createApp;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'shared/ imports server code', path: 'shared/probe.ts', code: "import { createApp } from '../server/app.ts';\nexport const p = createApp;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'shared/ imports a Node built-in', path: 'shared/probe.ts', code: "import { readFileSync } from 'node:fs';\nexport const p = readFileSync;\n", fires: 'no-restricted-imports' },
  { what: 'a worker imports client code', path: 'workers/probe.ts', code: "import { formatSig } from '../src/lib/format.ts';\nexport const p = formatSig;\n", fires: 'import-x/no-restricted-paths' },
  { what: 'a migration imports today’s code', path: 'migrations/9999_probe.ts', code: "import { meters } from '../shared/units.ts';\nexport const p = meters;\n", fires: 'no-restricted-imports' },
];

describe('import boundaries (eslint.config.js)', () => {
  for (const probe of probes) {
    it(`${probe.fires ? 'refuses' : 'allows'}: ${probe.what}`, async () => {
      const fired = await rulesFiredOn(probe.path, probe.code);
      if (probe.fires) expect(fired).toContain(probe.fires);
      else expect(fired).toEqual([]);
    });
  }

  it('refuses an import cycle', async () => {
    const cycleLinter = new ESLint({ cwd: root, ignore: false });
    const results = await cycleLinter.lintFiles([resolve(root, 'tests/lint/fixtures/cycle/first.ts')]);
    expect(results[0].messages.map((m) => m.ruleId)).toContain('import-x/no-cycle');
  });
});
