import type { ElevationUnit } from '../schemas/road-record.ts';
import { readCsvRows, readNumber } from '../dyno/csv-rows.ts';

/**
 * Reads a measured road profile from CSV text: two columns, distance and elevation, with a
 * header such as `distance [m], elevation [mm]` (also `x`, `chainage`, `station`; `z`, `height`,
 * `profile`). Units come from the header, else from the options, else metres. A file without a
 * header is read as distance, elevation in that order. Comma, semicolon or tab delimited; `#`
 * and `//` lines skipped. Everything returned is in metres.
 */

export interface MeasuredCsvOptions {
  distanceUnit?: ElevationUnit;
  elevationUnit?: ElevationUnit;
  /** Data rows accepted; default 500 000. */
  maxRows?: number;
}

export interface CsvIssue {
  /** 1-based line of the text, when the problem sits on one line. */
  line?: number;
  message: string;
}

type UnitSource = 'header' | 'option' | 'default';

export type MeasuredCsvResult =
  | {
      ok: true;
      points: [number, number][];
      units: { distance: { unit: ElevationUnit; source: UnitSource }; elevation: { unit: ElevationUnit; source: UnitSource } };
      rows: number;
      hasHeader: boolean;
      warnings: CsvIssue[];
    }
  | { ok: false; errors: CsvIssue[] };

export const MEASURED_MAX_ROWS = 500_000;
const MAX_ERRORS = 20;

const distanceNames = ['distance', 'dist', 'x', 'chainage', 'station', 's', 'position'];
const elevationNames = ['elevation', 'elev', 'z', 'height', 'h', 'profile', 'level', 'altitude'];

function readHeader(cell: string): { role?: 'distance' | 'elevation'; unit?: string; raw: string } {
  const raw = cell.trim();
  const m = /^(.*?)\s*(?:[[(]\s*([^\])]*?)\s*[\])]|[_ ](mm|m))\s*$/i.exec(raw);
  const name = (m ? m[1] : raw).trim().toLowerCase().replace(/[_\s]+/g, ' ');
  const unit = m ? (m[2] ?? m[3])?.trim().toLowerCase() : undefined;
  const role = distanceNames.includes(name) ? 'distance' : elevationNames.includes(name) ? 'elevation' : undefined;
  return { role, unit, raw };
}

const scale = (u: ElevationUnit) => (u === 'mm' ? 1e-3 : 1);

export function parseMeasuredCsv(text: string, opts: MeasuredCsvOptions = {}): MeasuredCsvResult {
  const maxRows = opts.maxRows ?? MEASURED_MAX_ROWS;
  const csv = readCsvRows(text.replace(/^\uFEFF/, ''), maxRows);
  const errors: CsvIssue[] = [...csv.problems];
  const warnings: CsvIssue[] = [];
  const decimalComma = csv.delimiter !== ',';
  const first = csv.rows[0];
  if (!first) return { ok: false, errors: [{ line: 1, message: 'the file is empty; expected a header such as: distance [m], elevation [mm]' }] };

  const hasHeader = first.cells.some((c) => typeof readNumber(c, decimalComma) !== 'number');
  let distanceCol = 0;
  let elevationCol = 1;
  const units = {
    distance: { unit: opts.distanceUnit ?? 'm', source: opts.distanceUnit ? 'option' : 'default' } as { unit: ElevationUnit; source: UnitSource },
    elevation: { unit: opts.elevationUnit ?? 'm', source: opts.elevationUnit ? 'option' : 'default' } as { unit: ElevationUnit; source: UnitSource },
  };
  if (hasHeader) {
    const header = first.cells.map(readHeader);
    const d = header.findIndex((h) => h.role === 'distance');
    const e = header.findIndex((h) => h.role === 'elevation');
    if (d < 0 || e < 0) {
      const found = header.map((h) => `'${h.raw}'`).join(', ');
      return { ok: false, errors: [{ line: first.line, message: `columns not recognised (found ${found}); expected distance and elevation, e.g. distance [m], elevation [mm]` }] };
    }
    distanceCol = d;
    elevationCol = e;
    for (const [role, h] of [['distance', header[d]], ['elevation', header[e]]] as const) {
      if (h.unit === undefined) {
        if (units[role].source === 'default') warnings.push({ line: first.line, message: `column '${h.raw}' names no unit; read as m` });
        continue;
      }
      if (h.unit !== 'm' && h.unit !== 'mm') {
        errors.push({ line: first.line, message: `column '${h.raw}': unit '${h.unit}' not understood; use m or mm` });
        continue;
      }
      if (units[role].source === 'option' && units[role].unit !== h.unit) {
        warnings.push({ line: first.line, message: `column '${h.raw}' states ${h.unit}; used that instead of the chosen ${units[role].unit}` });
      }
      units[role] = { unit: h.unit, source: 'header' };
    }
    header.forEach((h, i) => {
      if (i !== distanceCol && i !== elevationCol && h.raw !== '') warnings.push({ line: first.line, message: `column '${h.raw}' is not used` });
    });
  } else {
    warnings.push({ line: first.line, message: 'no header row: read the first column as distance and the second as elevation' });
  }
  if (errors.length) return { ok: false, errors };

  const data = hasHeader ? csv.rows.slice(1) : csv.rows;
  if (csv.truncated) return { ok: false, errors: [{ line: csv.lastLine, message: `more than ${maxRows} data rows; thin the profile or split the file` }] };
  const width = hasHeader ? first.cells.length : 2;
  const need = Math.max(distanceCol, elevationCol);
  const points: [number, number][] = [];
  const ds = scale(units.distance.unit);
  const es = scale(units.elevation.unit);
  for (const { line, cells } of data) {
    if (errors.length >= MAX_ERRORS) break;
    if (cells.length <= need) {
      errors.push({ line, message: `${cells.length} value${cells.length === 1 ? '' : 's'} where ${width} are expected: the line is cut short` });
      continue;
    }
    const read = (col: number, what: string) => {
      const x = readNumber(cells[col], decimalComma);
      if (typeof x === 'number') return x;
      errors.push({ line, message: x.error === 'empty' ? `no ${what}` : `'${cells[col].trim()}' is not a number (${what})` });
      return undefined;
    };
    const x = read(distanceCol, 'distance');
    const z = read(elevationCol, 'elevation');
    if (x === undefined || z === undefined) continue;
    const prev = points[points.length - 1];
    if (prev && !(x * ds > prev[0])) {
      errors.push({ line, message: `distance ${x} ${units.distance.unit} does not rise after ${prev[0] / ds} ${units.distance.unit}` });
      continue;
    }
    if (Math.abs(z * es) > 1000) {
      errors.push({ line, message: `elevation ${z} ${units.elevation.unit} is beyond ±1000 m` });
      continue;
    }
    points.push([x * ds, z * es]);
  }
  if (errors.length) return { ok: false, errors: errors.slice(0, MAX_ERRORS) };
  if (points.length < 2) return { ok: false, errors: [{ line: csv.lastLine, message: `only ${points.length} data row${points.length === 1 ? '' : 's'}; a profile needs at least 2` }] };
  return { ok: true, points, units, rows: points.length, hasHeader, warnings };
}
