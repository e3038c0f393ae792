import Papa from 'papaparse';
import type { FieldIssue } from '../../errors.ts';

/**
 * Reads a measured road profile from CSV text: two columns, distance and elevation. The
 * delimiter (comma, semicolon, tab) is detected; with semicolons a decimal comma is accepted.
 * Lines that are empty or start with `#` are skipped. A header row is optional; when present
 * it picks the columns (a name containing "dist" or "x", and one containing "elev", "height"
 * or "z") and may state units, e.g. `distance_m,elevation_mm` or `distance (m); elevation (mm)`.
 * Units stated in the options win over the header. The elevation unit must be stated one way
 * or the other: a silent guess would be wrong by a factor of 1000.
 */

export type LengthUnit = 'm' | 'mm';

export interface MeasuredCsvOptions {
  distanceUnit?: LengthUnit;
  elevationUnit?: LengthUnit;
  /** Rows accepted at most; default 5 000 000. */
  maxRows?: number;
}

export interface MeasuredCsv {
  /** `[distance m, elevation m]`, distance strictly rising. */
  points: Array<[number, number]>;
  distanceUnit: LengthUnit;
  elevationUnit: LengthUnit;
  /** Distance from the first to the last point, m. */
  length: number;
  /** Median distance between points, m. */
  medianSpacing: number;
}

export type MeasuredCsvOutcome = { ok: true; profile: MeasuredCsv } | { ok: false; reason: string; issues: FieldIssue[] };

const fail = (line: number | null, message: string): MeasuredCsvOutcome => {
  const path = line === null ? 'file' : `line ${line}`;
  return { ok: false, reason: `${path}: ${message}`, issues: [{ path, message }] };
};

function unitIn(name: string): LengthUnit | undefined {
  const n = name.toLowerCase();
  if (/(^|[^a-z])mm([^a-z]|$)/.test(n)) return 'mm';
  if (/(^|[^a-z])m([^a-z]|$)/.test(n)) return 'm';
  return undefined;
}

const isNumberText = (s: string) => /^[+-]?(\d+([.,]\d*)?|[.,]\d+)([eE][+-]?\d+)?$/.test(s.trim());

export function parseMeasuredCsv(text: string, options: MeasuredCsvOptions = {}): MeasuredCsvOutcome {
  const maxRows = options.maxRows ?? 5_000_000;
  const parsed = Papa.parse<string[]>(text.replace(/^\uFEFF/, ''), { skipEmptyLines: false, delimitersToGuess: [',', ';', '\t'] });
  const delimiter = parsed.meta.delimiter;
  const rows = parsed.data;

  let distCol = 0;
  let elevCol = 1;
  let distanceUnit = options.distanceUnit;
  let elevationUnit = options.elevationUnit;
  const points: Array<[number, number]> = [];
  let headerSeen = false;

  for (let i = 0; i < rows.length; i++) {
    const line = i + 1;
    const cells = rows[i].map((c) => c.trim());
    if (cells.every((c) => c === '') || cells[0].startsWith('#')) continue;
    if (!headerSeen && points.length === 0 && !cells.some(isNumberText)) {
      headerSeen = true;
      const lower = cells.map((c) => c.toLowerCase());
      const d = lower.findIndex((c) => c.includes('dist') || /^x([\s_([]|$)/.test(c));
      const e = lower.findIndex((c) => c.includes('elev') || c.includes('height') || /^z([\s_([]|$)/.test(c));
      if (d < 0 || e < 0 || d === e) {
        return fail(line, 'header must name a distance column and an elevation column, e.g. "distance_m,elevation_mm"');
      }
      distCol = d;
      elevCol = e;
      distanceUnit ??= unitIn(cells[d]);
      elevationUnit ??= unitIn(cells[e]);
      continue;
    }
    if (cells.length <= Math.max(distCol, elevCol)) {
      return fail(line, `expected ${Math.max(distCol, elevCol) + 1} columns, found ${cells.length}`);
    }
    const read = (s: string) => (delimiter === ';' ? s.replace(',', '.') : s);
    const dText = cells[distCol];
    const eText = cells[elevCol];
    if (!isNumberText(read(dText)) || (delimiter !== ';' && dText.includes(','))) return fail(line, `distance "${dText}" is not a number`);
    if (!isNumberText(read(eText)) || (delimiter !== ';' && eText.includes(','))) return fail(line, `elevation "${eText}" is not a number`);
    const dist = Number(read(dText));
    const elev = Number(read(eText));
    // "1e999" passes the number pattern but is Infinity (found by tests/fuzz/csv-parsers.test.ts).
    if (!Number.isFinite(dist)) return fail(line, `distance "${dText}" is too large`);
    if (!Number.isFinite(elev)) return fail(line, `elevation "${eText}" is too large`);
    if (points.length > 0 && !(dist > points[points.length - 1][0])) {
      return fail(line, `distance ${dText} does not rise after ${points[points.length - 1][0]}`);
    }
    if (points.length >= maxRows) return fail(line, `more than ${maxRows} rows`);
    points.push([dist, elev]);
  }

  if (!elevationUnit) {
    return fail(1, 'state the elevation unit (m or mm) in the header, e.g. "elevation_mm", or choose it in the form');
  }
  if (points.length < 4) return fail(null, `needs at least 4 rows of distance and elevation, found ${points.length}`);
  const dScale = (distanceUnit ?? 'm') === 'mm' ? 1e-3 : 1;
  const eScale = elevationUnit === 'mm' ? 1e-3 : 1;
  const out = points.map(([d, e]) => [d * dScale, e * eScale] as [number, number]);
  const gaps = out.slice(1).map((p, i) => p[0] - out[i][0]).sort((a, b) => a - b);
  return {
    ok: true,
    profile: {
      points: out,
      distanceUnit: distanceUnit ?? 'm',
      elevationUnit,
      length: out[out.length - 1][0] - out[0][0],
      medianSpacing: gaps[gaps.length >> 1],
    },
  };
}
