import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { routeKey, type RouteDef } from '../../server/http/registry.ts';
import { createRoleWorld } from '../api/helpers/role-world.ts';
import { allEntries } from '../api/matrix/all-entries.ts';
import { peaksCsv } from '../api/helpers/road-dyno-fixtures.ts';
import { createFuzzApp } from './helpers/fuzz-app.ts';
import { csvGarbage, dressed, dressings, textOfBytes } from './helpers/csv-text.ts';
import { fuzzSeed, fuzzTally } from './helpers/fuzz-record.ts';
import { boundaryValues } from './helpers/hostile.ts';
import { checkResponse, fuzzCaller, type Mutation, sendMutated, ValidTarget } from './helpers/route-fuzz.ts';

// Every upload route (a route that declares middleware before its handler: multer) with the
// valid upload of its matrix entry, its file swapped for broken text or bytes, its form fields
// for hostile values, or the multipart form itself spoiled. Same properties as the JSON routes:
// no 5xx, no hang, a refusal in words, and nothing stored by a refusal.

const RUNS = Number(process.env.FUZZ_UPLOAD_RUNS ?? 40);

const app = await createFuzzApp();
const world = await createRoleWorld(app);
const seed = fuzzSeed();
const tally = fuzzTally('upload-routes');
afterAll(async () => {
  tally.write({ seed });
  await app.close();
});

const uploads = app.routes.filter((r) => (r.before?.length ?? 0) > 0);
const peakLines = peaksCsv.trim().split('\n');

/** Larger than every per-file limit (dyno 2 MB, measured road 8 MB). */
const overLimit = Buffer.alloc(9 * 1024 * 1024, '1,2\n');

const examples: Mutation[] = [
  { label: 'empty file', file: Buffer.alloc(0) },
  { label: 'BOM only', file: Buffer.from('\uFEFF') },
  { label: 'NUL bytes', file: Buffer.from('velocity,force\n1,\u00002\n') },
  { label: 'UTF-16LE with BOM', file: Buffer.from(`\uFEFF${peaksCsv}`, 'utf16le') },
  { label: 'invalid UTF-8', file: Buffer.from([0x76, 0xc3, 0x28, 0x2c, 0xa0, 0xa1, 0x0a, 0xf0, 0x28, 0x8c, 0x28]) },
  { label: 'CR line ends', file: Buffer.from(peaksCsv.replaceAll('\n', '\r')) },
  { label: 'over the per-file limit', file: overLimit },
  { label: 'no file', multipart: 'no-file' },
  { label: 'file in another field', multipart: 'wrong-field' },
  { label: 'two files', multipart: 'two-files' },
  { label: 'not multipart', text: { body: peaksCsv, contentType: 'text/csv' } },
  { label: 'broken boundary', text: { body: '--xyz\r\nContent-Disposition: form-data; name="file"; filename="a.csv"\r\n\r\n1,2', contentType: 'multipart/form-data; boundary=xyz' } },
  { label: 'no boundary', text: { body: 'whatever', contentType: 'multipart/form-data' } },
];

const hostileField = fc.oneof(
  fc.constantFrom(...boundaryValues.filter((v): v is string | number => typeof v === 'string' || typeof v === 'number').map(String)),
  fc.string({ unit: 'grapheme', maxLength: 40 }),
);

const mutation: fc.Arbitrary<Mutation> = fc.oneof(
  { weight: 3, arbitrary: csvGarbage.map((t) => ({ label: 'garbage text', file: Buffer.from(t) })) },
  { weight: 2, arbitrary: textOfBytes.map((t) => ({ label: 'odd encoding', file: Buffer.from(t, 'latin1') })) },
  { weight: 1, arbitrary: fc.uint8Array({ maxLength: 2000 }).map((b) => ({ label: 'binary', file: Buffer.from(b) })) },
  {
    weight: 2,
    arbitrary: fc.subarray([...dressings], { minLength: 1 }).map((d) => ({ label: `dressed ${d.join('+')}`, file: Buffer.from(dressed(peakLines, d)) })),
  },
  { weight: 2, arbitrary: hostileField.map((v) => ({ label: `fields = ${JSON.stringify(v.slice(0, 20))}`, fieldValue: v })) },
  {
    weight: 1,
    arbitrary: fc
      .tuple(fc.constantFrom('name', 'label', 'velocityUnit', 'gasForce', 'distanceUnit', 'elevationUnit', 'spacing', '__proto__'), hostileField)
      .map(([k, v]) => ({ label: `extra field ${k}`, fields: { [k]: v } })),
  },
  { weight: 1, arbitrary: fc.constantFrom(...examples) },
);

describe('every upload route under broken files and forms', () => {
  it('finds the upload routes in the registry', () => {
    expect(uploads.length).toBeGreaterThanOrEqual(3);
    expect(uploads.filter((r) => !allEntries[routeKey(r)]?.build).map(routeKey)).toEqual([]);
  });

  describe.each(uploads.map((r) => [routeKey(r), r] as const))('%s', (key, route: RouteDef) => {
    it('answers every spoiled upload with a clean refusal or a good read', async () => {
      const target = new ValidTarget(app, world, allEntries[key], fuzzCaller(route));
      await fc.assert(
        fc.asyncProperty(mutation, async (m) => {
          const { req, before } = await target.get();
          const res = await sendMutated(world, route, req, target.caller, m);
          const outcome = checkResponse(route, m, res, before, () => app.checksum());
          if (m.file === overLimit) expect(res.status).toBe(413);
          target.settle(route, outcome);
          tally.add(`${key} ${outcome.rejected ? 'refused' : 'accepted'}`);
        }),
        { numRuns: RUNS + examples.length, seed, endOnFailure: false, examples: examples.map((m): [Mutation] => [m]) },
      );
    });
  });
});
