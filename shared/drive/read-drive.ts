import type { DriveIssue, DriveSummary } from '../schemas/drive.ts';
import { parseDriveCsv } from './parse-drive-csv.ts';

export type DriveReadResult = { ok: true; summary: DriveSummary; dataJson: string } | { ok: false; errors: DriveIssue[] };

/** Seven significant digits: finer than any logger resolves, and a third of the text of full doubles. */
const keep = (x: number) => Number(x.toPrecision(7));

/** A drive file read the way the server keeps it: its summary and its signals as JSON text. */
export function readDrive(text: string): DriveReadResult {
  const parsed = parseDriveCsv(text);
  if (!parsed.ok) return parsed;
  const { data } = parsed;
  const channels = Object.fromEntries(Object.entries(data.channels).map(([k, v]) => [k, v.map(keep)]));
  // Text, not the object: a string crosses back to the request thread in one copy.
  return { ok: true, summary: parsed.summary, dataJson: JSON.stringify({ dt: data.dt, speed: data.speed.map(keep), channels }) };
}
