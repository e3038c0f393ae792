import { SheetNumber } from '../schemas/target-sheet.ts';

/**
 * Sheet numbers read `TS-<code>-<year>-<sequence>`: a workspace's short code (2–6 capitals or
 * digits), the calendar year the sheet was created, and a sequence from 0001 that restarts each
 * year. A superseding sheet takes a new number; the link between them is kept on the sheets.
 */
export interface SheetNumberParts {
  code: string;
  year: number;
  sequence: number;
}

const skipWords = new Set(['and', 'the', 'of', 'for', 'a', 'an', '&']);

/**
 * A short code from a workspace name: initials of its first four meaningful words
 * ("Tallis & Brume Motor Works" → "TBMW"), or the first three letters of a single word
 * ("Chassis" → "CHA"). Falls back to "WS" when the name has no letters or digits.
 */
export function workspaceShortCode(name: string): string {
  const words = name
    .normalize('NFKD')
    .replace(/[^A-Za-z0-9\s&]/g, '')
    .split(/\s+/)
    .filter((w) => w && !skipWords.has(w.toLowerCase()));
  const code = (words.length === 1 ? words[0].slice(0, 3) : words.slice(0, 4).map((w) => w[0]).join('')).toUpperCase();
  return code.length >= 2 ? code : code.length === 1 ? `${code}X` : 'WS';
}

/** Formats parts as a sheet number; the sequence is padded to four digits. */
export function formatSheetNumber({ code, year, sequence }: SheetNumberParts): string {
  return SheetNumber.parse(`TS-${code}-${year}-${String(sequence).padStart(4, '0')}`);
}

/** The parts of a sheet number, or `undefined` when the text is not one. */
export function parseSheetNumber(text: string): SheetNumberParts | undefined {
  const m = /^TS-([A-Z0-9]{2,6})-(\d{4})-(\d{4,6})$/.exec(text.trim());
  return m ? { code: m[1], year: Number(m[2]), sequence: Number(m[3]) } : undefined;
}

/** The next free number for a code and year, given the numbers already issued (any codes/years). */
export function nextSheetNumber(code: string, year: number, existing: readonly string[]): string {
  let last = 0;
  for (const n of existing) {
    const p = parseSheetNumber(n);
    if (p && p.code === code && p.year === year) last = Math.max(last, p.sequence);
  }
  return formatSheetNumber({ code, year, sequence: last + 1 });
}
