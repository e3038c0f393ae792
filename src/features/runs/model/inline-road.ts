import { isoClasses, Road, type RoadKind } from '../../../../shared/schemas/road.ts';

/**
 * Roads typed straight into the run form, in the units people think in (mm for heights, m for
 * lengths), turned into an SI `Road` and checked with the shared schema.
 */

export type InlineKind = Exclude<RoadKind, 'measured'>;

export interface InlineField {
  name: string;
  label: string;
  unit: string;
  /** Shown value → SI. */
  toSI: (shown: number) => number;
  initial: string;
  /** Whole numbers only (seed). */
  integer?: boolean;
}

const mm = (name: string, label: string, initial: string): InlineField => ({ name, label, unit: 'mm', toSI: (v) => v / 1000, initial });
const m = (name: string, label: string, initial: string): InlineField => ({ name, label, unit: 'm', toSI: (v) => v, initial });
const plain = (name: string, label: string, unit: string, initial: string, integer = false): InlineField => ({ name, label, unit, toSI: (v) => v, initial, integer });

export const inlineKinds: { kind: InlineKind; label: string; fields: InlineField[] }[] = [
  { kind: 'iso8608', label: 'ISO 8608 random road', fields: [plain('seed', 'Seed', '', '7', true)] },
  { kind: 'sine', label: 'Sine', fields: [mm('amplitude', 'Amplitude', '10'), m('wavelength', 'Wavelength', '8')] },
  {
    kind: 'sweep',
    label: 'Swept sine (time)',
    fields: [mm('amplitude', 'Amplitude', '5'), plain('startFrequency', 'From', 'Hz', '0.5'), plain('endFrequency', 'To', 'Hz', '25'), plain('duration', 'Over', 's', '18')],
  },
  { kind: 'bump', label: 'Half-sine bump', fields: [mm('height', 'Height', '60'), m('length', 'Length', '0.8'), m('at', 'At', '20')] },
  { kind: 'pothole', label: 'Pothole', fields: [mm('depth', 'Depth', '50'), m('length', 'Length', '0.6'), m('at', 'At', '20')] },
  { kind: 'kerb', label: 'Kerb step', fields: [mm('height', 'Step (+ up)', '80'), m('rampLength', 'Ramp', '0.1'), m('at', 'At', '20')] },
];

export const fieldsOf = (kind: InlineKind) => inlineKinds.find((k) => k.kind === kind)!.fields;

export function initialValues(kind: InlineKind): Record<string, string> {
  return Object.fromEntries(fieldsOf(kind).map((f) => [f.name, f.initial]));
}

export type InlineRoadOutcome = { ok: true; road: Road } | { ok: false; errors: Record<string, string> };

/** Builds the road; `isoClass` is used for ISO roads. Errors are keyed by field name. */
export function buildInlineRoad(kind: InlineKind, values: Record<string, string>, isoClass: string): InlineRoadOutcome {
  const errors: Record<string, string> = {};
  const doc: Record<string, unknown> = { kind };
  for (const f of fieldsOf(kind)) {
    const text = (values[f.name] ?? '').trim().replace(',', '.');
    const n = Number(text);
    if (text === '' || !Number.isFinite(n)) errors[f.name] = 'Enter a number';
    else if (f.integer && !Number.isInteger(n)) errors[f.name] = 'Enter a whole number';
    else doc[f.name] = f.toSI(n);
  }
  if (kind === 'iso8608') {
    if (!(isoClasses as readonly string[]).includes(isoClass)) errors.class = 'Pick a class';
    doc.class = isoClass;
  }
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const parsed = Road.safeParse(doc);
  if (parsed.success) return { ok: true, road: parsed.data };
  for (const issue of parsed.error.issues) {
    const key = String(issue.path[0] ?? 'road');
    errors[key] ??= issue.message;
  }
  return { ok: false, errors };
}
