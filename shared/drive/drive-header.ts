import { readHeaderCell } from '../dyno/csv-header.ts';
import type { DriveChannel } from '../schemas/drive.ts';

/** What a drive column holds. */
export type DriveQuantity = 'time' | 'speed' | DriveChannel;

/** Units accepted per family, each with its factor to SI. */
const timeUnits: Record<string, number> = { s: 1, sec: 1, ms: 1e-3 };
const speedUnits: Record<string, number> = { 'm/s': 1, 'km/h': 1 / 3.6, kph: 1 / 3.6, mph: 0.44704 };
// Standard gravity for accelerations logged in g (the value the model uses, docs/model.md §1).
const accelUnits: Record<string, number> = { 'm/s^2': 1, 'm/s2': 1, 'm/s²': 1, 'm s-2': 1, g: 9.81 };
const travelUnits: Record<string, number> = { m: 1, mm: 1e-3, in: 0.0254 };

const unitsOf: Record<DriveQuantity, Record<string, number>> = {
  time: timeUnits,
  speed: speedUnits,
  bodyAccel: accelUnits,
  wheelAccel: accelUnits,
  damperTravel: travelUnits,
  wheelTravel: travelUnits,
};

/** Names each quantity goes by (lower case, separators folded to spaces). */
const names: Record<DriveQuantity, string[]> = {
  time: ['time', 't'],
  speed: ['speed', 'vehicle speed', 'car speed', 'road speed', 'ground speed'],
  bodyAccel: ['body accel', 'body acceleration', 'sprung accel', 'sprung acceleration', 'body acc'],
  wheelAccel: ['wheel accel', 'wheel acceleration', 'unsprung accel', 'unsprung acceleration', 'hub accel', 'hub acceleration', 'wheel acc'],
  damperTravel: ['damper travel', 'damper position', 'damper stroke', 'damper displacement'],
  wheelTravel: ['wheel travel', 'suspension travel', 'wheel position', 'wheel displacement'],
};

export interface DriveColumn {
  index: number;
  header: string;
  quantity: DriveQuantity;
  unit: string;
  /** Multiplies a reading into SI. */
  factor: number;
}

export type HeaderRead = { ok: true; column: DriveColumn } | { ok: false; message: string } | { ok: true; column: null };

/** One header cell: a known quantity with a unit it accepts, an unknown column (ignored), or an error. */
export function readDriveHeader(raw: string, index: number): HeaderRead {
  const cell = readHeaderCell(raw);
  const quantity = (Object.keys(names) as DriveQuantity[]).find((q) => names[q].includes(cell.name));
  if (!quantity) return { ok: true, column: null };
  const accepted = unitsOf[quantity];
  const list = Object.keys(accepted).filter((u) => !['sec', 'kph', 'm/s2', 'm/s²', 'm s-2'].includes(u)).join(', ');
  if (cell.unitText === undefined || cell.unitText === '') {
    return { ok: false, message: `give the unit in the header, e.g. "${cell.raw} [${Object.keys(accepted)[0]}]" (accepted: ${list})` };
  }
  const key = cell.unitText.trim().toLowerCase().replace(/\s+/g, ' ');
  const factor = accepted[key === 'km/hr' ? 'km/h' : key];
  if (factor === undefined) return { ok: false, message: `unit "${cell.unitText}" is not accepted for ${quantityLabel[quantity]}; use ${list}` };
  return { ok: true, column: { index, header: cell.raw, quantity, unit: cell.unitText.trim(), factor } };
}

export const quantityLabel: Record<DriveQuantity, string> = {
  time: 'time',
  speed: 'vehicle speed',
  bodyAccel: 'body acceleration',
  wheelAccel: 'wheel acceleration',
  damperTravel: 'damper travel',
  wheelTravel: 'wheel travel',
};
