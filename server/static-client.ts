import { existsSync } from 'node:fs';
import { join, resolve } from 'node:path';
import express, { type Express } from 'express';

const missingBuild = `<!doctype html><meta charset="utf-8"><title>Ridewright</title>
<p>The Ridewright API is running, but the client is not built yet. Run <code>npm run build</code> (or <code>npm start</code>, which builds first).</p>`;

/**
 * Serves the built client: hashed assets with long caching, and index.html for every other GET
 * outside /api so the client's router (and its 404 page) handles the path.
 */
export function mountStaticClient(app: Express, distDir: string): void {
  const root = resolve(distDir);
  const indexFile = join(root, 'index.html');
  // Source maps stay private: the build makes none, and a stale one in dist is never served.
  app.use((req, res, next) => {
    if (req.path.endsWith('.map')) res.status(404).type('text').send('Not found');
    else next();
  });
  app.use(
    express.static(root, {
      index: false,
      setHeaders: (res, path) => {
        if (path.includes(`${join(root, 'assets')}`)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
      },
    }),
  );
  app.get('/{*splat}', (req, res, next) => {
    if (req.path === '/api' || req.path.startsWith('/api/')) return next();
    if (!existsSync(indexFile)) {
      res.status(200).type('html').send(missingBuild);
      return;
    }
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(indexFile);
  });
}
