import { readCsvRows, readNumber } from '../dyno/csv-rows.ts';
import { type DriveChannel, type DriveData, type DriveIssue, type DriveSummary, DRIVE_MAX_ROWS, driveChannels } from '../schemas/drive.ts';
import { type DriveColumn, quantityLabel, readDriveHeader } from './drive-header.ts';

export type DriveParseOutcome = { ok: true; data: DriveData; summary: DriveSummary } | { ok: false; errors: DriveIssue[] };

/** Most problems listed for one file: past that the file is plainly in another layout. */
const MAX_ISSUES = 20;
/** Sampling rates accepted after resampling, Hz: the model's modes sit between 1 and 15 Hz. */
const MIN_RATE = 20;
const MAX_RATE = 2000;
/** Time steps further than this from the median are reported (the file is put on an even grid). */
const STEP_SPREAD = 0.05;

/** Spreadsheet-style column letter (1 → A, 27 → AA), as people find a column in their editor. */
export function columnLetter(index: number): string {
  let n = index + 1;
  let s = '';
  while (n > 0) {
    const r = (n - 1) % 26;
    s = String.fromCharCode(65 + r) + s;
    n = Math.floor((n - 1) / 26);
  }
  return s;
}

const columnName = (c: { index: number; header: string }) => `${columnLetter(c.index)} (${c.header})`;

/**
 * Reads a drive log: a header row naming each column with its unit in brackets
 * (`time [s]`, `speed [km/h]`, `body accel [g]`, `wheel accel [m/s^2]`, `damper travel [mm]`,
 * `wheel travel [mm]`), then one row per sample. Time and speed are required, with at least one
 * of the four signals; unknown columns are ignored with a warning. Every problem names its CSV
 * line and column. The samples are put on an even grid at the median time step (linear
 * interpolation), in SI units.
 */
export function parseDriveCsv(text: string, maxRows = DRIVE_MAX_ROWS): DriveParseOutcome {
  const csv = readCsvRows(text, maxRows);
  const errors: DriveIssue[] = csv.problems.map((p) => ({ line: p.line, message: p.message }));
  const warnings: DriveIssue[] = [];
  if (csv.truncated) return { ok: false, errors: [{ message: `the file has more than ${maxRows} data rows; split it or lower the logging rate` }] };
  const [head, ...body] = csv.rows;
  if (!head) return { ok: false, errors: [{ message: 'the file is empty' }] };

  const columns: DriveColumn[] = [];
  head.cells.forEach((raw, index) => {
    if (raw.trim() === '') return;
    const read = readDriveHeader(raw, index);
    const where = { line: head.line, column: columnName({ index, header: raw.trim() }) };
    if (!read.ok) errors.push({ ...where, message: read.message });
    else if (read.column === null) warnings.push({ ...where, message: 'not a drive signal; the column is ignored' });
    else if (columns.some((c) => c.quantity === read.column?.quantity)) errors.push({ ...where, message: `a second ${quantityLabel[read.column.quantity]} column` });
    else columns.push(read.column);
  });
  const find = (q: string) => columns.find((c) => c.quantity === q);
  for (const q of ['time', 'speed'] as const) {
    if (!find(q)) errors.push({ line: head.line, message: `no ${quantityLabel[q]} column: the header needs "${q} [${q === 'time' ? 's' : 'km/h'}]" or similar` });
  }
  const signals = columns.filter((c) => (driveChannels as readonly string[]).includes(c.quantity));
  if (signals.length === 0 && errors.length === 0) {
    errors.push({ line: head.line, message: 'no signal to fit: add body accel, wheel accel, damper travel or wheel travel (each with its unit)' });
  }
  if (errors.length) return { ok: false, errors: errors.slice(0, MAX_ISSUES) };
  if (body.length < 8) return { ok: false, errors: [{ line: csv.lastLine, message: `only ${body.length} data rows; a drive needs many more` }] };

  const decimalComma = csv.delimiter !== ',';
  const values = columns.map(() => new Float64Array(body.length));
  for (let r = 0; r < body.length && errors.length < MAX_ISSUES; r++) {
    const row = body[r];
    columns.forEach((c, k) => {
      const cell = row.cells[c.index];
      if (cell === undefined) {
        errors.push({ line: row.line, column: columnName(c), message: `the row has ${row.cells.length} cells; ${quantityLabel[c.quantity]} is missing` });
        return;
      }
      const x = readNumber(cell, decimalComma);
      if (typeof x !== 'number') {
        errors.push({ line: row.line, column: columnName(c), message: x.error === 'empty' ? 'empty cell' : `"${cell.trim().slice(0, 20)}" is not a number` });
        return;
      }
      values[k][r] = x * c.factor;
    });
  }
  if (errors.length) return { ok: false, errors: errors.slice(0, MAX_ISSUES) };

  const time = values[columns.indexOf(find('time') as DriveColumn)];
  const speedCol = find('speed') as DriveColumn;
  const speed = values[columns.indexOf(speedCol)];
  for (let r = 1; r < body.length; r++) {
    if (!(time[r] > time[r - 1])) {
      return { ok: false, errors: [{ line: body[r].line, column: columnName(find('time') as DriveColumn), message: 'time must rise from row to row' }] };
    }
  }
  for (let r = 0; r < body.length; r++) {
    if (speed[r] < 0) return { ok: false, errors: [{ line: body[r].line, column: columnName(speedCol), message: 'speed cannot be negative' }] };
  }

  const steps = Array.from({ length: body.length - 1 }, (_, i) => time[i + 1] - time[i]).sort((a, b) => a - b);
  const dt = steps[steps.length >> 1];
  const rate = 1 / dt;
  if (rate < MIN_RATE || rate > MAX_RATE) {
    return { ok: false, errors: [{ line: body[1].line, column: columnName(find('time') as DriveColumn), message: `the time step gives ${rate.toPrecision(3)} samples per second; ${MIN_RATE} to ${MAX_RATE} are accepted` }] };
  }
  const uneven = steps.filter((s) => Math.abs(s - dt) > STEP_SPREAD * dt).length;
  if (uneven) warnings.push({ message: `${uneven} time steps differ from the median step (${(dt * 1000).toPrecision(3)} ms) by more than ${STEP_SPREAD * 100} %; the signals were interpolated onto an even grid` });

  const n = Math.floor((time[body.length - 1] - time[0]) / dt + 1e-6) + 1;
  const grid = (src: Float64Array) => resampleOnGrid(time, src, dt, n);
  const channels: Partial<Record<DriveChannel, number[]>> = {};
  for (const c of signals) channels[c.quantity as DriveChannel] = grid(values[columns.indexOf(c)]);
  const speedOnGrid = grid(speed);
  const distance = speedOnGrid.reduce((s, v, i) => (i === 0 ? 0 : s + 0.5 * (v + speedOnGrid[i - 1]) * dt), 0);
  const duration = (n - 1) * dt;
  if (distance <= 0) return { ok: false, errors: [{ column: columnName(speedCol), message: 'the car does not move in this drive' }] };
  return {
    ok: true,
    data: { dt, speed: speedOnGrid, channels },
    summary: {
      rows: body.length,
      samples: n,
      duration,
      rate,
      distance,
      meanSpeed: distance / duration,
      columns: columns.map((c) => ({ header: c.header, quantity: c.quantity, unit: c.unit })),
      warnings,
    },
  };
}

/** Linear interpolation of (t, x) onto t0 + i·dt, i < n. */
function resampleOnGrid(t: Float64Array, x: Float64Array, dt: number, n: number): number[] {
  const out = new Array<number>(n);
  let j = 0;
  for (let i = 0; i < n; i++) {
    const ti = t[0] + i * dt;
    while (j < t.length - 2 && t[j + 1] < ti) j++;
    const u = Math.min(1, Math.max(0, (ti - t[j]) / (t[j + 1] - t[j])));
    out[i] = x[j] + u * (x[j + 1] - x[j]);
  }
  return out;
}
