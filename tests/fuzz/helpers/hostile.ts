import fc from 'fast-check';

/** Nested arrays `depth` deep, as JSON text (JSON.stringify itself would recurse that deep). */
export const deepArrayText = (depth: number) => `${'['.repeat(depth)}${']'.repeat(depth)}`;
/** Nested objects `{"a":{"a":…}}` `depth` deep, as JSON text. */
export const deepObjectText = (depth: number) => `${'{"a":'.repeat(depth)}1${'}'.repeat(depth)}`;

/** A value nested `depth` deep (small enough to stringify). */
function nested(depth: number, leaf: unknown): unknown {
  let v = leaf;
  for (let i = 0; i < depth; i++) v = i % 2 ? [v] : { a: v };
  return v;
}

/** Boundary and wrong-type values a JSON field might receive. */
export const boundaryValues: unknown[] = [
  null,
  true,
  false,
  0,
  -0,
  -1,
  1,
  0.5,
  1e308,
  -1e308,
  5e-324,
  2 ** 53 + 2,
  -(2 ** 63),
  'NaN',
  'Infinity',
  '-Infinity',
  '1e999',
  '0x10',
  '12abc',
  '',
  ' ',
  '\u0000',
  '\uFEFF',
  '\uD800',
  'é'.normalize('NFD'),
  '💥'.repeat(500),
  'x'.repeat(20_000),
  '<script>alert(1)</script>',
  "'; drop table user; --",
  '../../etc/passwd',
  '%00%2e%2e',
  '__proto__',
  'constructor',
  '2024-02-30T25:61:00Z',
  'not-an-email@',
  [],
  [null],
  {},
  { __proto__: null, toString: 1 },
  Array.from({ length: 5000 }, (_, i) => i),
  nested(200, 'deep'),
];

/** Any hostile JSON value: a boundary value, a random JSON value, string or number. */
export const hostileValue: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: fc.constantFrom(...boundaryValues) },
  { weight: 2, arbitrary: fc.jsonValue({ maxDepth: 3 }) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', maxLength: 40 }) },
  { weight: 1, arbitrary: fc.double() },
  { weight: 1, arbitrary: fc.integer().map((n) => n * 1e6) },
);

/** Every path into a JSON value: `[]` is the value itself; object keys and array indices after. */
export function pathsOf(value: unknown, prefix: (string | number)[] = [], out: (string | number)[][] = []): (string | number)[][] {
  out.push(prefix);
  if (prefix.length > 6) return out;
  if (Array.isArray(value)) value.slice(0, 8).forEach((v, i) => pathsOf(v, [...prefix, i], out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) pathsOf(v, [...prefix, k], out);
  return out;
}

/** A deep copy of `value` with the thing at `path` replaced (or removed when `replacement` is `REMOVE`). */
export const REMOVE = Symbol('remove');
export function withAt(value: unknown, path: (string | number)[], replacement: unknown): unknown {
  if (path.length === 0) return replacement === REMOVE ? undefined : replacement;
  const copy = (Array.isArray(value) ? [...value] : { ...(value as object) }) as Record<string | number, unknown>;
  const [head, ...rest] = path;
  if (rest.length === 0 && replacement === REMOVE) {
    if (Array.isArray(copy)) (copy as unknown[]).splice(Number(head), 1);
    else delete copy[head];
  } else copy[head] = withAt(copy[head], rest, replacement);
  return copy;
}

/** Strings for a path segment (`:setupId`, `:token`, `:number`): sent percent-encoded unless `raw`. */
export const hostileSegment: fc.Arbitrary<{ text: string; raw: boolean }> = fc.oneof(
  fc.constantFrom(
    { text: '%E0%A4%A', raw: true },
    { text: '%', raw: true },
    { text: '%00', raw: true },
    { text: '..%2F..%2Fetc', raw: true },
    { text: '%C0%AE', raw: true },
    { text: '-1', raw: false },
    { text: '0', raw: false },
    { text: '1e309', raw: false },
    { text: 'NaN', raw: false },
    { text: '9'.repeat(400), raw: false },
    { text: 'x'.repeat(5000), raw: false },
    { text: "' or 1=1 --", raw: false },
    { text: '__proto__', raw: false },
    { text: '💥', raw: false },
    { text: ' ', raw: false },
  ),
  fc.string({ unit: 'grapheme', minLength: 1, maxLength: 30 }).map((text) => ({ text, raw: false })),
);

/** Query strings: wrong types, repeats, brackets, huge values. */
export const hostileQuery: fc.Arbitrary<string> = fc.oneof(
  fc.constantFrom('limit=NaN', 'limit=-1', 'limit=1e309', 'before=not-a-date', 'a[b][c]=1', 'limit=1&limit=2', `q=${'x'.repeat(10_000)}`, 'cursor=%FF', '__proto__[x]=1'),
  fc.dictionary(fc.string({ minLength: 1, maxLength: 8 }), fc.string({ maxLength: 20 }), { maxKeys: 4 }).map((d) => new URLSearchParams(d).toString()),
);
