import type { Setup } from '../../../../shared/schemas/setup.ts';
import { DEFAULT_UNIT_PREFERENCES } from '../../../../shared/schemas/unit-preferences.ts';
import { type DisplayUnit, units } from '../../../lib/format.ts';
import { chosenUnits, type ChosenUnits, type QuantityKind } from '../../../lib/units/unit-table.ts';
import { rodDiameter, stopCoefficient } from './setup-units.ts';

/** One difference between two revisions, in the order the setup page lists fields. */
export interface DiffRow {
  path: string;
  label: string;
  /** Display unit of both values; absent for words. */
  unit?: DisplayUnit;
  before: number | string | undefined;
  after: number | string | undefined;
}

export interface Described {
  label: string;
  unit?: DisplayUnit;
  order: number;
}

/** Scalar fields in page order, with their display units: fixed, or the kind whose unit the person chooses. */
const scalarFields: Array<[string, string, DisplayUnit | QuantityKind | undefined]> = [
  ['name', 'Name', undefined],
  ['sprungMass', 'Sprung mass', units.kg],
  ['unsprungMass', 'Unsprung mass', units.kg],
  ['springRate', 'Spring rate', 'rate'],
  ['motionRatio', 'Motion ratio', units.ratio],
  ['tyreRate', 'Tyre rate', 'rate'],
  ['tyreDamping', 'Tyre damping', units.Nspm],
  ['tyreFootprint', 'Tyre footprint', 'length'],
  ['tyreRadius', 'Tyre rolling radius', 'length'],
  ['damper.gas.force', 'Gas force', units.N],
  ['damper.gas.pressure', 'Gas pressure', units.bar],
  ['damper.gas.rodArea', 'Rod diameter', rodDiameter],
  ['damper.gas.polytropic.volume', 'Gas volume', units.cm3],
  ['damper.gas.polytropic.exponent', 'Polytropic exponent', units.ratio],
  ['damper.control.law.kind', 'Control law', undefined],
  ['damper.control.law.mode', 'Control mode', undefined],
  ['damper.control.law.gain', 'Control gain', units.Nspm],
  ['damper.control.law.skyGain', 'Skyhook gain', units.Nspm],
  ['damper.control.law.groundGain', 'Groundhook gain', units.Nspm],
  ['damper.control.law.blend', 'Skyhook share', units.ratio],
  ['damper.control.responseTime', 'Valve response time', units.ms],
  ['damper.control.bounds', 'Control bounds', undefined],
  ['topMount.rate', 'Top mount rate', 'rate'],
  ['topMount.damping', 'Top mount damping', units.Nspm],
  ['friction.breakaway', 'Strut friction breakaway', units.N],
  ['friction.smoothingSpeed', 'Friction smoothing speed', 'damperVelocity'],
  ['bumpStop.clearance', 'Bump stop clearance', 'length'],
  ['bumpStop.law.kind', 'Bump stop law', undefined],
  ['reboundStop.clearance', 'Rebound stop clearance', 'length'],
  ['reboundStop.law.kind', 'Rebound stop law', undefined],
  ['stroke.compression', 'Stroke, compression', 'length'],
  ['stroke.extension', 'Stroke, extension', 'length'],
  ['notes', 'Notes', undefined],
];
const scalarIndex = new Map(scalarFields.map(([path, label, unit], i) => [path, { label, unit, order: i * 1000 }]));
const orderOf = (path: string) => scalarIndex.get(path)?.order ?? Number.MAX_SAFE_INTEGER;

const directionWord = { compression: 'Compression', rebound: 'Rebound' } as const;
const stopWord = { bumpStop: 'Bump stop', reboundStop: 'Rebound stop' } as const;

/** The units of the default preference, for callers outside a person's choice. */
const defaultUnits = chosenUnits({ ...DEFAULT_UNIT_PREFERENCES });

/** Label, display unit (in the person's units `u`) and page position of any leaf path of a setup document. */
export function describePath(path: string, u: ChosenUnits = defaultUnits): Described {
  const scalar = scalarIndex.get(path);
  if (scalar) return { ...scalar, unit: typeof scalar.unit === 'string' ? u[scalar.unit] : scalar.unit };
  let m = /^damper\.(compression|rebound)\.(\d+)\.([01])$/.exec(path);
  if (m) {
    const dir = m[1] as keyof typeof directionWord;
    const i = Number(m[2]);
    // curves sit between the gas and the stops, compression first
    const order = orderOf('damper.gas.force') - 500 + (dir === 'rebound' ? 250 : 0) + i * 2 + Number(m[3]);
    return m[3] === '0' ? { label: `${directionWord[dir]} point ${i + 1}, speed`, unit: u.damperVelocity, order } : { label: `${directionWord[dir]} point ${i + 1}, force`, unit: units.N, order };
  }
  m = /^damper\.control\.firm\.(compression|rebound)\.(\d+)\.([01])$/.exec(path);
  if (m) {
    const dir = m[1] as keyof typeof directionWord;
    const i = Number(m[2]);
    const order = orderOf('damper.control.law.kind') - 500 + (dir === 'rebound' ? 250 : 0) + i * 2 + Number(m[3]);
    const what = `Firm ${directionWord[dir].toLowerCase()} point ${i + 1}`;
    return m[3] === '0' ? { label: `${what}, speed`, unit: u.damperVelocity, order } : { label: `${what}, force`, unit: units.N, order };
  }
  m = /^(bumpStop|reboundStop)\.law\.points\.(\d+)\.([01])$/.exec(path);
  if (m) {
    const stop = m[1] as keyof typeof stopWord;
    const order = orderOf(`${stop}.law.kind`) + 10 + Number(m[2]) * 2 + Number(m[3]);
    return m[3] === '0' ? { label: `${stopWord[stop]} point ${Number(m[2]) + 1}, deflection`, unit: u.length, order } : { label: `${stopWord[stop]} point ${Number(m[2]) + 1}, force`, unit: units.N, order };
  }
  m = /^(bumpStop|reboundStop)\.law\.coefficients\.(\d+)$/.exec(path);
  if (m) {
    const k = Number(m[2]) + 1;
    return { label: `${stopWord[m[1] as keyof typeof stopWord]} coefficient c${k}`, unit: stopCoefficient(k), order: orderOf(`${m[1]}.law.kind`) + 10 + k };
  }
  return { label: path, order: Number.MAX_SAFE_INTEGER };
}

/** Every leaf of a document as `dotted.path → value` (tuples by index). */
export function flatten(value: unknown, prefix = '', out = new Map<string, number | string>()): Map<string, number | string> {
  if (typeof value === 'number' || typeof value === 'string') out.set(prefix, value);
  else if (Array.isArray(value)) value.forEach((v, i) => flatten(v, prefix ? `${prefix}.${i}` : String(i), out));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) flatten(v, prefix ? `${prefix}.${k}` : k, out);
  return out;
}

/**
 * Field-by-field difference from revision A to revision B: a row for every leaf that differs,
 * appears or disappears (a curve point added, a stop removed), in page order, each with the unit
 * the person reads it in.
 */
export function diffSetups(a: Setup, b: Setup, u: ChosenUnits = defaultUnits): DiffRow[] {
  const fa = flatten(a);
  const fb = flatten(b);
  const paths = [...new Set([...fa.keys(), ...fb.keys()])].filter((p) => fa.get(p) !== fb.get(p));
  return paths
    .map((path) => ({ path, ...describePath(path, u), before: fa.get(path), after: fb.get(path) }))
    .sort((x, y) => x.order - y.order || x.path.localeCompare(y.path))
    .map(({ order: _order, ...row }) => row);
}

/** A document as labelled rows in page order (for read-only sheets), curve points left out. */
export function sheetRows(setup: Setup, u: ChosenUnits = defaultUnits): Array<{ path: string; label: string; unit?: DisplayUnit; value: number | string }> {
  return [...flatten(setup)]
    .filter(([path]) => path !== 'name' && path !== 'notes' && !/^damper\.(compression|rebound)\./.test(path))
    .map(([path, value]) => ({ path, ...describePath(path, u), value }))
    .sort((x, y) => x.order - y.order || x.path.localeCompare(y.path))
    .map(({ order: _order, ...row }) => row);
}
