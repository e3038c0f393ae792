import Papa from 'papaparse';

/** One non-blank, non-comment CSV row with the 1-based line of the text where it starts. */
export interface NumberedRow {
  line: number;
  cells: string[];
}

export interface CsvRows {
  rows: NumberedRow[];
  delimiter: string;
  /** Problems papaparse found (unbalanced quotes), by line. */
  problems: { line: number; message: string }[];
  /** True when reading stopped at `maxRows` rows (more were present). */
  truncated: boolean;
  /** Line of the last row read, for messages about the end of the file. */
  lastLine: number;
}

const candidates = [',', ';', '\t'];

/** Picks the delimiter that occurs most on the first meaningful line (comma on a tie). */
function guessDelimiter(text: string): string {
  const first = text.split(/\r\n|\n|\r/).find((l) => l.trim() !== '' && !isComment(l)) ?? '';
  let best = ',';
  let bestCount = 0;
  for (const d of candidates) {
    const count = first.split(d).length - 1;
    if (count > bestCount) {
      best = d;
      bestCount = count;
    }
  }
  return best;
}

function isComment(line: string): boolean {
  const t = line.trimStart();
  return t.startsWith('#') || t.startsWith('//');
}

/**
 * Splits CSV text into rows with papaparse, keeping the text line each row starts on (quoted
 * fields may span lines, so counting rows is not enough). Blank lines and lines starting with
 * `#` or `//` are skipped. Reads at most `maxRows + 1` rows so a huge file stops early.
 */
export function readCsvRows(text: string, maxRows: number): CsvRows {
  const delimiter = guessDelimiter(text);
  const newline = text.includes('\n') ? '\n' : '\r';
  const rows: NumberedRow[] = [];
  const problems: CsvRows['problems'] = [];
  let truncated = false;
  let scanned = 0;
  let line = 1;
  let rowStart = 0;
  const lineAt = (pos: number) => {
    for (let nl = text.indexOf(newline, scanned); nl !== -1 && nl < pos; nl = text.indexOf(newline, nl + 1)) line++;
    scanned = Math.max(scanned, pos);
    return line;
  };
  Papa.parse<string[]>(text, {
    delimiter,
    skipEmptyLines: false,
    step: (result, parser) => {
      const start = rowStart;
      rowStart = result.meta.cursor;
      // papaparse leaves the row's leading newline in place after a blank row; skip past it
      let first = start;
      while (first < text.length && (text[first] === '\n' || text[first] === '\r')) first++;
      const at = lineAt(first);
      for (const e of result.errors) {
        if (e.type === 'Quotes') problems.push({ line: at, message: 'a quoted value is not closed' });
      }
      const cells = result.data;
      if (cells.length === 0 || (cells.length === 1 && cells[0].trim() === '')) return;
      if (isComment(cells[0])) return;
      if (rows.length > maxRows) {
        truncated = true;
        parser.abort();
        return;
      }
      rows.push({ line: at, cells });
    },
  });
  return { rows, delimiter, problems, truncated, lastLine: rows.length ? rows[rows.length - 1].line : 1 };
}

const numberPattern = /^[+-]?(\d+(\.\d*)?|\.\d+)([eE][+-]?\d+)?$/;

/**
 * A cell as a finite number, or why not. With `decimalComma` (files delimited by `;` or tab)
 * `1,5` reads as 1.5.
 */
export function readNumber(cell: string, decimalComma: boolean): number | { error: 'empty' | 'text' | 'infinite' } {
  let t = cell.trim();
  if (t === '') return { error: 'empty' };
  if (decimalComma && !t.includes('.')) t = t.replace(',', '.');
  if (!numberPattern.test(t)) return { error: 'text' };
  const x = Number(t);
  return Number.isFinite(x) ? x : { error: 'infinite' };
}
