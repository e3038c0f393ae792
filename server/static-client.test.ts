import { mkdirSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import express from 'express';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { mountStaticClient } from './static-client.ts';

const dist = mkdtempSync(join(tmpdir(), 'rw-dist-'));
mkdirSync(join(dist, 'assets'));
writeFileSync(join(dist, 'index.html'), '<!doctype html><title>Ridewright</title>');
writeFileSync(join(dist, 'assets', 'index-abc.js'), 'console.log(1)\n//# sourceMappingURL=index-abc.js.map');
writeFileSync(join(dist, 'assets', 'index-abc.js.map'), '{"version":3,"sources":["src/secret.ts"]}');
afterAll(() => rmSync(dist, { recursive: true, force: true }));

const app = express();
mountStaticClient(app, dist);

describe('static client', () => {
  it('serves the hashed script but never a source map, even one left in dist', async () => {
    await request(app).get('/assets/index-abc.js').expect(200);
    const map = await request(app).get('/assets/index-abc.js.map').expect(404);
    expect(map.text).not.toContain('sources');
  });

  it('answers a client route with index.html', async () => {
    const res = await request(app).get('/w/some/page').expect(200);
    expect(res.text).toContain('<title>Ridewright</title>');
  });
});
