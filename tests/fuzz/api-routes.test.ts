import fc from 'fast-check';
import { afterAll, describe, expect, it } from 'vitest';
import { routeKey, type RouteDef } from '../../server/http/registry.ts';
import { createRoleWorld } from '../api/helpers/role-world.ts';
import type { MatrixRequest } from '../api/helpers/route-matrix.ts';
import { allEntries } from '../api/matrix/all-entries.ts';
import { createFuzzApp } from './helpers/fuzz-app.ts';
import { fuzzSeed, fuzzTally } from './helpers/fuzz-record.ts';
import { deepArrayText, deepObjectText, hostileQuery, hostileSegment, hostileValue, pathsOf, REMOVE, withAt } from './helpers/hostile.ts';
import { checkResponse, fuzzCaller, type Mutation, sendMutated, ValidTarget } from './helpers/route-fuzz.ts';

// Every route the app mounts (the registry, so routes added later are covered without editing
// this file), called by a caller who passes its access check with the valid request of its
// route × role matrix entry, then with that request spoiled: hostile JSON bodies and fields,
// malformed or oversized bodies, hostile path segments and query strings.
// Properties: no 5xx, no hang (each request has a deadline), a refusal is an ErrorBody with a
// message, and a refusal or a read leaves the database exactly as it was.

const BODY_RUNS = Number(process.env.FUZZ_BODY_RUNS ?? 8);
const PATH_RUNS = Number(process.env.FUZZ_PATH_RUNS ?? 4);
const QUERY_RUNS = Number(process.env.FUZZ_QUERY_RUNS ?? 2);

const app = await createFuzzApp();
const world = await createRoleWorld(app);
const seed = fuzzSeed();
const tally = fuzzTally('api-routes');
afterAll(async () => {
  tally.write({ seed, routes: app.routes.length });
  await app.close();
});

const isUpload = (r: RouteDef) => (r.before?.length ?? 0) > 0;
const hasJsonBody = (r: RouteDef) => r.method !== 'get' && r.method !== 'delete' && !isUpload(r);
const paramsOf = (path: string) => [...path.matchAll(/:(\w+)/g)].map((m) => m[1]);

/** The concrete path with the segment that stands for `:param` replaced. */
function swapSegment(declared: string, concrete: string, param: string, text: string): string {
  const d = declared.split('/');
  const c = concrete.split('?')[0].split('/');
  const at = d.indexOf(`:${param}`);
  if (at < 0 || c.length !== d.length) throw new Error(`cannot line up ${concrete} with ${declared}`);
  c[at] = text;
  return c.join('/');
}

const oversized = () => JSON.stringify({ name: 'x'.repeat(1_100_000) });

/** Raw bodies every JSON route gets at least once (fast-check examples), then at random. */
const rawBodies = (first: unknown): Mutation[] => [
  { label: 'malformed JSON', text: { body: '{"name": ', contentType: 'application/json' } },
  { label: 'NaN literal', text: { body: '{"value": NaN}', contentType: 'application/json' } },
  { label: 'deep arrays', text: { body: deepArrayText(20_000), contentType: 'application/json' } },
  { label: 'deep objects', text: { body: deepObjectText(5_000), contentType: 'application/json' } },
  { label: 'oversized body', text: { body: oversized(), contentType: 'application/json' } },
  { label: 'text/plain body', text: { body: JSON.stringify(first ?? {}), contentType: 'text/plain' } },
  { label: 'latin-1 charset', text: { body: '{"name":"\u00e9"}', contentType: 'application/json; charset=latin1' } },
  { label: 'unknown charset', text: { body: '{}', contentType: 'application/json; charset=klingon' } },
  { label: 'proto pollution', text: { body: '{"__proto__":{"role":"admin"},"constructor":{"prototype":{"x":1}}}', contentType: 'application/json' } },
];

/** Builds the mutation from the current valid request (targets are rebuilt after a write goes through). */
type MakeMutation = (valid: MatrixRequest) => Mutation;

const bodyMutation = (first: unknown): fc.Arbitrary<MakeMutation> => {
  const paths = pathsOf(first ?? {});
  const fixed = (m: Mutation): MakeMutation => () => m;
  const inner = paths.filter((p) => p.length > 0);
  const removals = inner.length
    ? [{ weight: 1, arbitrary: fc.constantFrom(...inner).map((p): MakeMutation => (valid) => ({ label: `missing ${p.join('.')}`, json: { value: withAt(valid.body, p, REMOVE) } })) }]
    : [];
  return fc.oneof(
    {
      weight: 3,
      arbitrary: fc.tuple(fc.constantFrom(...paths), hostileValue).map(([p, v]): MakeMutation => (valid) => ({ label: `field ${p.join('.') || '(body)'}`, json: { value: withAt(valid.body ?? {}, p, v) } })),
    },
    ...removals,
    {
      weight: 1,
      arbitrary: fc.tuple(fc.string({ maxLength: 12 }), hostileValue).map(([k, v]): MakeMutation => (valid) => ({ label: 'unknown key', json: { value: { ...(valid.body as object), [k]: v } } })),
    },
    { weight: 1, arbitrary: hostileValue.map((v) => fixed({ label: 'whole body', json: { value: v } })) },
    { weight: 1, arbitrary: fc.constantFrom(...rawBodies(first)).map(fixed) },
  );
};

async function runCases(route: RouteDef, label: string, arb: (first: MatrixRequest) => fc.Arbitrary<MakeMutation>, numRuns: number, examples: (first: MatrixRequest) => Mutation[] = () => []) {
  const entry = allEntries[routeKey(route)];
  const target = new ValidTarget(app, world, entry, fuzzCaller(route));
  const first = await target.get();
  const fixed = examples(first.req);
  await fc.assert(
    fc.asyncProperty(arb(first.req), async (make) => {
      const { req, before } = await target.get();
      const mutation = make(req);
      const res = await sendMutated(world, route, req, target.caller, mutation);
      const outcome = checkResponse(route, mutation, res, before, () => app.checksum());
      target.settle(route, outcome);
      tally.add(`${routeKey(route)} ${label}`);
    }),
    // fast-check counts examples within numRuns: add them so the random cases keep their number.
    { numRuns: numRuns + fixed.length, seed, endOnFailure: false, examples: fixed.map((m): [MakeMutation] => [() => m]) },
  );
}

describe('every API route under hostile input', () => {
  it('has a matrix entry (a valid request) for every route it fuzzes', () => {
    expect(app.routes.filter((r) => !allEntries[routeKey(r)]).map(routeKey)).toEqual([]);
  });

  describe.each(app.routes.map((r) => [routeKey(r), r] as const))('%s', (_key, route) => {
    if (hasJsonBody(route)) {
      it('refuses hostile bodies cleanly', async () => {
        await runCases(route, 'body', (first) => bodyMutation(first.body), BODY_RUNS, (first) => rawBodies(first.body));
      });
    }

    const params = paramsOf(route.path);
    if (params.length > 0) {
      it('refuses hostile path segments cleanly', async () => {
        await runCases(
          route,
          'path',
          () =>
            fc.tuple(fc.constantFrom(...params), hostileSegment).map(([param, seg]): MakeMutation => (valid) => ({
              label: `:${param} = ${JSON.stringify(seg.text.slice(0, 20))}`,
              path: swapSegment(route.path, valid.path, param, seg.raw ? seg.text : encodeURIComponent(seg.text)),
            })),
          PATH_RUNS,
        );
      });
    }

    it('ignores or refuses hostile query strings', async () => {
      await runCases(route, 'query', () => hostileQuery.map((q): MakeMutation => () => ({ label: `?${q.slice(0, 30)}`, query: q })), QUERY_RUNS);
    });
  });
});
