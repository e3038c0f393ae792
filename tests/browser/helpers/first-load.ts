import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';

/**
 * What a browser downloads to show one page of the built client, from Vite's build manifest
 * (`build.manifest: true` writes `.vite/manifest.json`): the entry chunk and everything it
 * imports statically, the page's own lazy chunk (React Router `lazy`) and its static imports,
 * and their stylesheets. Sizes are gzip at level 9, as a server or CDN would send them. Fonts
 * (already compressed, fetched only for the glyphs a page uses) and the simulation workers
 * (started on demand) are not counted.
 */

interface ManifestChunk {
  file: string;
  src?: string;
  isEntry?: boolean;
  isDynamicEntry?: boolean;
  imports?: string[];
  css?: string[];
}
type Manifest = Record<string, ManifestChunk>;

export interface PageLoad {
  /** Source file of the page (`src/app/routes/corner-bench.tsx`), or `entry` for the shell alone. */
  page: string;
  files: string[];
  rawBytes: number;
  gzipBytes: number;
}

export function readManifest(distDir: string): Manifest {
  return JSON.parse(readFileSync(join(distDir, '.vite', 'manifest.json'), 'utf8')) as Manifest;
}

function closure(manifest: Manifest, key: string, into: Set<string>): void {
  const chunk = manifest[key];
  if (!chunk || into.has(chunk.file)) return;
  into.add(chunk.file);
  for (const css of chunk.css ?? []) into.add(css);
  for (const imported of chunk.imports ?? []) closure(manifest, imported, into);
}

/** First load of the shell alone and of every lazily loaded page under `src/app/routes/`. */
export function firstLoads(distDir: string): PageLoad[] {
  const manifest = readManifest(distDir);
  const entryKey = Object.keys(manifest).find((k) => manifest[k].isEntry);
  if (!entryKey) throw new Error('the manifest has no entry chunk');
  const base = new Set<string>(['index.html']);
  closure(manifest, entryKey, base);
  const size = (files: Set<string>) => {
    let rawBytes = 0;
    let gzipBytes = 0;
    for (const f of files) {
      const bytes = readFileSync(join(distDir, f));
      rawBytes += bytes.length;
      gzipBytes += gzipSync(bytes, { level: 9 }).length;
    }
    return { rawBytes, gzipBytes };
  };
  const loads: PageLoad[] = [{ page: 'entry', files: [...base], ...size(base) }];
  for (const [key, chunk] of Object.entries(manifest)) {
    if (!chunk.isDynamicEntry || !key.startsWith('src/app/routes/')) continue;
    const files = new Set(base);
    closure(manifest, key, files);
    loads.push({ page: key, files: [...files], ...size(files) });
  }
  return loads.sort((a, b) => b.gzipBytes - a.gzipBytes);
}

/** Most a signed-in first page may download, gzip (issue: under 250 kB compressed). */
export const FIRST_LOAD_BUDGET_BYTES = 250 * 1000;
