import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

const RESULTS = join(process.cwd(), 'test-results', 'fuzz');

/** Counts fuzz cases by label, prints them and writes `test-results/fuzz/<name>.json`. */
export function fuzzTally(name: string) {
  const counts = new Map<string, number>();
  return {
    add(label: string, n = 1) {
      counts.set(label, (counts.get(label) ?? 0) + n);
    },
    total: () => [...counts.values()].reduce((a, b) => a + b, 0),
    write(extra: Record<string, unknown> = {}) {
      const byLabel = Object.fromEntries([...counts.entries()].sort(([a], [b]) => a.localeCompare(b)));
      const total = [...counts.values()].reduce((a, b) => a + b, 0);
      mkdirSync(RESULTS, { recursive: true });
      writeFileSync(join(RESULTS, `${name}.json`), `${JSON.stringify({ name, total, ...extra, byLabel }, null, 2)}\n`);
      console.log(`[fuzz] ${name}: ${total} cases over ${counts.size} targets${Object.keys(extra).length ? ` ${JSON.stringify(extra)}` : ''}`);
    },
  };
}

/** The seed for this run: FUZZ_SEED when set (to replay a failure), else a fresh one, printed either way. */
export function fuzzSeed(): number {
  const fromEnv = Number(process.env.FUZZ_SEED);
  return Number.isInteger(fromEnv) && process.env.FUZZ_SEED ? fromEnv : Math.floor(Math.random() * 2 ** 31);
}
