import fc from 'fast-check';

/** Characters CSV readers care about, weighted towards the troublesome ones. */
const csvChars = fc.constantFrom(...'0123456789', '.', ',', ';', '\t', '-', '+', 'e', 'E', '"', "'", ' ', '\n', '\r', '#', '/', 'x', 'm', '[', ']', '(', ')', 'N', 'a', '\u00a0', '\uFEFF', '\u0000', '💥');

const headerish = fc.constantFrom(
  'velocity [mm/s],compression force [N],rebound force [N]',
  'direction,velocity,force',
  'velocity,force',
  'time [s],displacement [mm],force [kN]',
  'distance [m],elevation [mm]',
  'distance;elevation_mm',
  'x\tz',
  '',
);

/** Random text made of CSV-ish characters, often after a plausible header, sometimes huge lines. */
export const csvGarbage: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.tuple(headerish, fc.array(csvChars, { maxLength: 400 })).map(([h, cs]) => `${h}\n${cs.join('')}`) },
  { weight: 2, arbitrary: fc.string({ unit: 'binary', maxLength: 300 }) },
  { weight: 1, arbitrary: fc.tuple(headerish, fc.integer({ min: 1, max: 4 })).map(([h, k]) => `${h}\n${'1,'.repeat(20_000 * k)}\n`) },
  { weight: 1, arbitrary: fc.constantFrom('', '\uFEFF', '\n\n\n', '"', '"unterminated,1,2\n3,4,5', '#only a comment', ',,,\n,,,', '1e999,1e999\n2e999,2e999\n3,3\n4,4\n5,5') },
);

/** Bytes decoded the ways a browser or server might: UTF-8 (with invalid sequences), Latin-1, UTF-16LE with BOM. */
export const textOfBytes: fc.Arbitrary<string> = fc
  .tuple(fc.uint8Array({ maxLength: 600 }), fc.constantFrom('utf8', 'latin1', 'utf16le', 'valid-utf16'))
  .map(([bytes, how]) => {
    const b = Buffer.from(bytes);
    if (how === 'valid-utf16') return Buffer.from(`\uFEFFvelocity,force\r\n1,2\r\n3,4\r\n`, 'utf16le').toString('utf8');
    return b.toString(how as BufferEncoding);
  });

/** Ways to re-dress a valid file without changing what it says. */
export const dressings = ['bom', 'crlf', 'cr', 'comments', 'blank-lines', 'padded-cells', 'no-final-newline'] as const;
export type Dressing = (typeof dressings)[number][];

/** The lines of a valid CSV file joined with the given dressing. */
export function dressed(lines: string[], dress: Dressing): string {
  let rows = [...lines];
  if (dress.includes('padded-cells')) rows = rows.map((l) => l.split(',').map((c) => ` ${c}  `).join(','));
  if (dress.includes('comments')) rows = rows.flatMap((l, i) => (i % 3 === 1 ? ['# a note between rows', l] : [l]));
  if (dress.includes('blank-lines')) rows = rows.flatMap((l, i) => (i % 4 === 2 ? ['', l] : [l]));
  const eol = dress.includes('crlf') ? '\r\n' : dress.includes('cr') ? '\r' : '\n';
  return `${dress.includes('bom') ? '\uFEFF' : ''}${rows.join(eol)}${dress.includes('no-final-newline') ? '' : eol}`;
}
