// Import boundaries from DEVELOPERS.md: shared/ imports none of our folders, migrations import only
// kysely, client features never import each other, workers only import shared/.
import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative, resolve, dirname } from 'node:path';
import { describe, expect, it } from 'vitest';

const root = resolve(__dirname, '../..');

function walk(dir: string): string[] {
  let out: string[] = [];
  let entries: string[];
  try {
    entries = readdirSync(dir);
  } catch {
    return out;
  }
  for (const name of entries) {
    const p = join(dir, name);
    if (statSync(p).isDirectory()) out = out.concat(walk(p));
    else if (/\.(ts|tsx)$/.test(name)) out.push(p);
  }
  return out;
}

const importRe = /(?:^|\n)\s*(?:import|export)\s[^'"]*?from\s+['"]([^'"]+)['"]|import\(\s*['"]([^'"]+)['"]\s*\)/g;

function importsOf(file: string): string[] {
  const text = readFileSync(file, 'utf8');
  const found: string[] = [];
  for (const m of text.matchAll(importRe)) found.push((m[1] ?? m[2]) as string);
  return found;
}

/** Top-level folder (relative to the repo) that a relative import lands in. */
function targetOf(file: string, spec: string): string | null {
  if (!spec.startsWith('.')) return null;
  return relative(root, resolve(dirname(file), spec));
}

describe('import boundaries', () => {
  it('shared/ imports no other folder of ours and no Node built-in', () => {
    const bad: string[] = [];
    for (const f of walk(join(root, 'shared'))) {
      if (f.endsWith('.test.ts')) continue;
      for (const spec of importsOf(f)) {
        const t = targetOf(f, spec);
        if (t !== null && !t.startsWith('shared')) bad.push(`${relative(root, f)} → ${spec}`);
        if (spec.startsWith('node:')) bad.push(`${relative(root, f)} → ${spec}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it('migrations import only kysely', () => {
    const bad: string[] = [];
    for (const f of walk(join(root, 'migrations'))) {
      for (const spec of importsOf(f)) if (spec !== 'kysely') bad.push(`${relative(root, f)} → ${spec}`);
    }
    expect(bad).toEqual([]);
  });

  it('client features never import another feature', () => {
    const bad: string[] = [];
    for (const f of walk(join(root, 'src/features'))) {
      const own = relative(join(root, 'src/features'), f).split('/')[0];
      for (const spec of importsOf(f)) {
        const t = targetOf(f, spec);
        if (t?.startsWith('src/features/') && t.split('/')[2] !== own) bad.push(`${relative(root, f)} → ${spec}`);
      }
    }
    expect(bad).toEqual([]);
  });

  it('the client never imports server code, and workers import only shared/', () => {
    const bad: string[] = [];
    for (const f of walk(join(root, 'src'))) {
      for (const spec of importsOf(f)) {
        const t = targetOf(f, spec);
        if (t?.startsWith('server') || t?.startsWith('migrations')) bad.push(`${relative(root, f)} → ${spec}`);
      }
    }
    for (const f of walk(join(root, 'workers'))) {
      if (f.endsWith('.test.ts')) continue;
      for (const spec of importsOf(f)) {
        const t = targetOf(f, spec);
        if (t !== null && !t.startsWith('shared') && !t.startsWith('workers')) bad.push(`${relative(root, f)} → ${spec}`);
      }
    }
    expect(bad).toEqual([]);
  });
});
