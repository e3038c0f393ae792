import type { RoadInput } from '../../shared/schemas/road.ts';
import { mPerSToKmh } from '../../shared/units.ts';

/**
 * File names of what the product exports (CSV and PNG): which setup, revision, road and speed,
 * then what the file holds — `front-left-r3_iso-C_60kmh_body-accel.csv`. Only ASCII letters,
 * digits, `-` and `_`, so the name survives every file system, mail client and shell; `_`
 * separates the parts, `-` joins words inside one.
 */

/** Lower-case words joined by `-`; accents dropped, anything else a separator. */
export function safeWords(text: string, max = 60): string {
  return text
    .normalize('NFKD')
    .replace(/[\u0300-\u036f]/g, '')
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-+|-+$/g, '')
    .slice(0, max)
    .replace(/-+$/, '');
}

/** The road part: an ISO 8608 road by its class ("iso-C"), any other by its name or its kind. */
function roadPart(road: RoadInput): string {
  if (road.kind === 'iso8608') return `iso-${road.class}`;
  return safeWords(road.name ?? '', 30) || road.kind;
}

export interface ExportSubject {
  setupName: string;
  revision?: number;
  road?: RoadInput;
  /** m/s */
  speed?: number;
}

/** "front-left-r3_iso-C_60kmh": the parts of a file name that say which run it came from. */
export function exportStem(subject: ExportSubject): string {
  const setup = `${safeWords(subject.setupName, 48) || 'setup'}${subject.revision ? `-r${subject.revision}` : ''}`;
  const parts = [setup];
  if (subject.road) parts.push(roadPart(subject.road));
  if (subject.speed !== undefined) parts.push(`${Math.round(mPerSToKmh(subject.speed))}kmh`);
  return parts.join('_');
}

/** `<stem>_<what>.<ext>`; the stem may be empty (a chart outside any run). */
export function exportFileName(stem: string, what: string, ext: 'csv' | 'png'): string {
  const tail = safeWords(what, 60) || 'export';
  return `${stem ? `${stem}_` : ''}${tail}.${ext}`;
}
