import Papa from 'papaparse';
import { csvNumber } from './csv-number.ts';

/** A cell the product writes: numbers stay numbers; text is written as text. */
export type CsvCell = string | number | null | undefined;

/**
 * CSV text from rows, safe to open in a spreadsheet: a text cell that begins with `=`, `+`, `-`,
 * `@`, tab or CR is written with a leading `'` (and quoted) so no spreadsheet evaluates it as a
 * formula; numbers are never touched, so `-0.5` stays a negative number. Cells holding line
 * breaks are quoted, so they cannot start a row of their own. Every number is spelled by
 * `csvNumber` (no float noise; a writer that knows a value is a computed figure rounds it further
 * with `csvNumber(x, FIGURE_DIGITS)` first); a number that is not finite becomes an empty cell.
 * Every CSV export goes through here.
 */
export function writeCsv(rows: readonly (readonly CsvCell[])[], fields?: readonly string[]): string {
  const data = rows.map((r) => r.map((c) => (c === null || c === undefined ? '' : typeof c === 'number' ? (csvNumber(c) ?? '') : c)));
  return Papa.unparse(fields ? { fields: [...fields], data } : data, { newline: '\n', escapeFormulae: true });
}

// C0 and C1 controls, DEL, and the text-direction embeddings, overrides and isolates.
const unsafeInLine = /[\p{Cc}\u202a-\u202e\u2066-\u2069]/gu;

/**
 * Free text for a `#` comment line above a CSV table: line breaks, controls and direction
 * overrides become spaces, so a name can never end the comment and begin a formula row.
 */
export function commentText(text: string): string {
  return text.replace(unsafeInLine, ' ');
}
