import {
  DynoParseOptions,
  type DynoIssue,
  type DynoLayout,
  type DynoParseResult,
  type DynoUnitsUsed,
} from '../schemas/dyno.ts';
import { readCsvRows, readNumber, type NumberedRow } from './csv-rows.ts';
import { readHeaderCell, unitForRole, type ColumnRole, type HeaderCell } from './csv-header.ts';
import { buildPeaks, buildSeries, type Columns } from './csv-to-data.ts';

/** Fewest data rows accepted: a peak file needs two points, a time series some cycles. */
export const DYNO_MIN_PEAK_ROWS = 2;
export const DYNO_MIN_SERIES_ROWS = 20;
/** Errors listed before the rest are summarised. */
const MAX_ERRORS = 20;

const expectedLayouts =
  'direction, velocity, force · velocity, compression force, rebound force · velocity, force (signed) · time, displacement, force';

const needs: Record<DynoLayout, ColumnRole[]> = {
  'time-series': ['time', 'displacement', 'force'],
  'direction-column': ['direction', 'velocity', 'force'],
  'force-per-direction': ['velocity'],
  signed: ['velocity', 'force'],
};

function pickLayout(roles: Set<ColumnRole>): DynoLayout | undefined {
  const all = (...r: ColumnRole[]) => r.every((x) => roles.has(x));
  if (all('time', 'displacement', 'force')) return 'time-series';
  if (all('direction', 'velocity', 'force')) return 'direction-column';
  if (roles.has('velocity') && (roles.has('compressionForce') || roles.has('reboundForce'))) return 'force-per-direction';
  if (all('velocity', 'force')) return 'signed';
  return undefined;
}

/**
 * Reads a damper dyno CSV: either peak points (three layouts: a direction column; one force
 * column per direction; signed velocity and force) or a raw record (time, displacement, force,
 * optionally velocity). The layout is chosen from the header; units come from header tokens
 * such as `velocity [mm/s]` or `force (kN)`, else from `opts`, else SI. Comma, semicolon or tab
 * delimited; `#` and `//` lines and blank lines are skipped.
 *
 * Everything returned is SI and compression-positive (see `shared/schemas/dyno.ts`). A rejected
 * file returns every problem found (up to 20) with its 1-based line. The byte size limit is
 * the server's; the row limit (`opts.maxRows`, default 200 000) is checked here.
 */
export function parseDynoCsv(text: string, opts: Partial<DynoParseOptions> = {}): DynoParseResult {
  const parsedOpts = DynoParseOptions.safeParse(opts);
  if (!parsedOpts.success) {
    return { ok: false, errors: parsedOpts.error.issues.map((i) => ({ message: `option ${i.path.join('.')}: ${i.message}` })) };
  }
  const options = parsedOpts.data;
  const csv = readCsvRows(text.replace(/^\uFEFF/, ''), options.maxRows);
  const errors: DynoIssue[] = [...csv.problems];
  const warnings: DynoIssue[] = [];
  const fail = (): DynoParseResult => ({ ok: false, errors: capErrors(errors) });

  const [headerRow, ...dataRows] = csv.rows;
  if (!headerRow) return { ok: false, errors: [{ line: 1, message: `the file is empty; expected a header row such as: ${expectedLayouts}` }] };
  if (headerRow.cells.every((c) => typeof readNumber(c, csv.delimiter !== ',') === 'number')) {
    return { ok: false, errors: [{ line: headerRow.line, message: `the first row holds numbers, not column names; add a header row such as: ${expectedLayouts}` }] };
  }

  const header = headerRow.cells.map(readHeaderCell);
  const index = new Map<ColumnRole, number>();
  header.forEach((h, i) => {
    if (h.raw === '') return;
    if (!h.role) {
      warnings.push({ line: headerRow.line, message: `column '${h.raw}' is not used` });
      return;
    }
    const prev = index.get(h.role);
    if (prev !== undefined) {
      errors.push({ line: headerRow.line, message: `columns '${header[prev].raw}' and '${h.raw}' both read as ${h.role}; keep one` });
    } else index.set(h.role, i);
  });
  const layout = pickLayout(new Set(index.keys()));
  if (!layout) {
    const found = header.map((h) => `'${h.raw}'`).join(', ');
    errors.push({ line: headerRow.line, message: `columns not recognised (found ${found}); expected one of: ${expectedLayouts}` });
    return fail();
  }
  const used = usedRoles(layout, index);
  const units = resolveUnits(used, header, index, opts, headerRow.line, errors, warnings);
  if (errors.length) return fail();

  if (csv.truncated) {
    errors.push({ line: csv.lastLine + 1, message: `more than ${options.maxRows} data rows; split the file or thin the record` });
    return fail();
  }
  const columns = readColumns(dataRows, header, index, used, layout, csv.delimiter !== ',', errors);
  if (errors.length) return fail();
  const minRows = layout === 'time-series' ? DYNO_MIN_SERIES_ROWS : DYNO_MIN_PEAK_ROWS;
  if (dataRows.length < minRows) {
    errors.push({
      line: csv.lastLine,
      message: `only ${dataRows.length} data row${dataRows.length === 1 ? '' : 's'}; ${layout === 'time-series' ? 'a time series' : 'a peak-point file'} needs at least ${minRows}`,
    });
    return fail();
  }

  const common = { ok: true as const, layout, units, rows: dataRows.length };
  if (layout === 'time-series') {
    const data = buildSeries(columns, units, options, errors);
    if (errors.length) return fail();
    return { ...common, kind: 'series', data, warnings };
  }
  const data = buildPeaks(columns, layout, units, options, warnings);
  if (data.compression.length + data.rebound.length < DYNO_MIN_PEAK_ROWS) {
    errors.push({ line: csv.lastLine, message: `fewer than ${DYNO_MIN_PEAK_ROWS} usable points (rows at zero velocity are skipped)` });
    return fail();
  }
  return { ...common, kind: 'peaks', data, warnings };
}

function capErrors(errors: DynoIssue[]): DynoIssue[] {
  const sorted = [...errors].sort((a, b) => (a.line ?? 0) - (b.line ?? 0));
  if (sorted.length <= MAX_ERRORS) return sorted;
  return [...sorted.slice(0, MAX_ERRORS), { message: `… and ${sorted.length - MAX_ERRORS} more problems` }];
}

function usedRoles(layout: DynoLayout, index: Map<ColumnRole, number>): ColumnRole[] {
  const extra: ColumnRole[] =
    layout === 'time-series' ? ['velocity'] : layout === 'force-per-direction' ? ['compressionForce', 'reboundForce'] : [];
  return [...needs[layout], ...extra.filter((r) => index.has(r))];
}

function resolveUnits(
  used: ColumnRole[],
  header: HeaderCell[],
  index: Map<ColumnRole, number>,
  given: Partial<DynoParseOptions>,
  line: number,
  errors: DynoIssue[],
  warnings: DynoIssue[],
): DynoUnitsUsed {
  const defaults = DynoParseOptions.parse({});
  const pick = <R extends 'time' | 'displacement' | 'velocity' | 'force' | 'compressionForce' | 'reboundForce'>(
    role: R,
    option: 'timeUnit' | 'displacementUnit' | 'velocityUnit' | 'forceUnit',
  ) => {
    const cell = header[index.get(role)!];
    const fromHeader = unitForRole(role, cell.unitText);
    const explicit = given[option];
    if (fromHeader !== undefined && typeof fromHeader === 'object') {
      errors.push({ line, message: `column '${cell.raw}': ${fromHeader.error}` });
      return { unit: defaults[option], source: 'default' as const };
    }
    if (fromHeader !== undefined) {
      if (explicit !== undefined && explicit !== fromHeader) {
        warnings.push({ line, message: `column '${cell.raw}' states ${fromHeader}; used that instead of the chosen ${explicit}` });
      }
      return { unit: fromHeader, source: 'header' as const };
    }
    if (explicit !== undefined) return { unit: explicit, source: 'option' as const };
    warnings.push({ line, message: `column '${cell.raw}' names no unit; read as ${defaults[option]}` });
    return { unit: defaults[option], source: 'default' as const };
  };
  const has = (r: ColumnRole) => used.includes(r);
  const forceRoles = (['force', 'compressionForce', 'reboundForce'] as const).filter(has);
  const forces = forceRoles.map((r) => pick(r, 'forceUnit'));
  if (forces.length === 2 && forces[0].unit !== forces[1].unit) {
    errors.push({ line, message: 'the two force columns state different units; use one unit for both' });
  }
  return {
    force: forces[0] as DynoUnitsUsed['force'],
    velocity: has('velocity') ? (pick('velocity', 'velocityUnit') as DynoUnitsUsed['velocity']) : undefined,
    displacement: has('displacement') ? (pick('displacement', 'displacementUnit') as DynoUnitsUsed['displacement']) : undefined,
    time: has('time') ? (pick('time', 'timeUnit') as DynoUnitsUsed['time']) : undefined,
  };
}

/** Reads every used column of every row as numbers (direction as text), collecting errors. */
function readColumns(
  rows: NumberedRow[],
  header: HeaderCell[],
  index: Map<ColumnRole, number>,
  used: ColumnRole[],
  layout: DynoLayout,
  decimalComma: boolean,
  errors: DynoIssue[],
): Columns {
  const numeric = used.filter((r) => r !== 'direction');
  const cols: Columns = { lines: [], values: new Map(numeric.map((r) => [r, []])), directions: [] };
  const lastNeeded = Math.max(...used.map((r) => index.get(r)!));
  const width = header.length;
  // Blank cells are allowed only where one direction has no reading at that speed.
  const blankOk = (r: ColumnRole) => layout === 'force-per-direction' && (r === 'compressionForce' || r === 'reboundForce');
  for (const row of rows) {
    if (errors.length > MAX_ERRORS * 2) break;
    const { line, cells } = row;
    if (cells.length <= lastNeeded) {
      errors.push({ line, message: `${cells.length} value${cells.length === 1 ? '' : 's'} where the header has ${width}: the line is cut short` });
      continue;
    }
    if (cells.slice(width).some((c) => c.trim() !== '')) {
      errors.push({ line, message: `${cells.length} values where the header has ${width}` });
      continue;
    }
    cols.lines.push(line);
    for (const r of numeric) {
      const col = index.get(r)!;
      const x = readNumber(cells[col], decimalComma);
      if (typeof x === 'number') {
        cols.values.get(r)!.push(x);
        continue;
      }
      cols.values.get(r)!.push(Number.NaN);
      if (x.error === 'empty' && blankOk(r)) continue;
      const name = header[col].raw;
      const message =
        x.error === 'empty'
          ? `no value in column '${name}'`
          : x.error === 'infinite'
            ? `'${cells[col].trim()}' in column '${name}' is too large`
            : `'${cells[col].trim()}' in column '${name}' is not a number`;
      errors.push({ line, message });
    }
    if (used.includes('direction')) {
      const d = readDirection(cells[index.get('direction')!]);
      if (d === undefined) errors.push({ line, message: `direction '${cells[index.get('direction')!].trim()}' not understood; use compression or rebound` });
      cols.directions.push(d ?? 'compression');
    }
  }
  return cols;
}

function readDirection(cell: string): 'compression' | 'rebound' | undefined {
  const t = cell.trim().toLowerCase();
  if (['compression', 'comp', 'c', 'bump', 'b', 'in'].includes(t)) return 'compression';
  if (['rebound', 'reb', 'r', 'extension', 'ext', 'e', 'out'].includes(t)) return 'rebound';
  return undefined;
}
