import { isoClasses, type Road, type RoadKind } from '../../../../shared/schemas/road.ts';

/**
 * The fields of each road kind as the editor shows them, with the unit a person types and the
 * factor to SI. Lengths along the road in m, heights in mm, frequencies in Hz.
 */
export interface FieldSpec {
  key: string;
  label: string;
  unit?: string;
  /** Multiply what is typed by this to get SI. */
  toSI?: number;
  optional?: boolean;
  hint?: string;
  options?: readonly string[];
}

const mm = { unit: 'mm', toSI: 1e-3 };
const m = { unit: 'm', toSI: 1 };

export const roadFields: Record<Exclude<RoadKind, 'measured'>, FieldSpec[]> & { measured: FieldSpec[] } = {
  iso8608: [
    { key: 'class', label: 'ISO 8608 class', options: isoClasses },
    { key: 'seed', label: 'Seed', hint: 'same seed, same road on every machine' },
    { key: 'waviness', label: 'Waviness w', optional: true, hint: 'default 2' },
    { key: 'nMin', label: 'Lowest spatial frequency', unit: 'cycle/m', toSI: 1, optional: true, hint: 'default 0.011' },
    { key: 'nMax', label: 'Highest spatial frequency', unit: 'cycle/m', toSI: 1, optional: true, hint: 'default 2.83' },
    { key: 'length', label: 'Period', ...m, optional: true, hint: 'default 1024 m' },
    { key: 'amplitudes', label: 'Harmonic amplitudes', options: ['fixed', 'random'], hint: 'random (Rayleigh): seeds differ in roughness as real roads do' },
  ],
  sine: [
    { key: 'amplitude', label: 'Amplitude (peak)', ...mm },
    { key: 'wavelength', label: 'Wavelength', ...m },
  ],
  sweep: [
    { key: 'amplitude', label: 'Amplitude (peak)', ...mm, optional: true, hint: 'give this or the velocity amplitude' },
    { key: 'velocityAmplitude', label: 'Velocity amplitude', unit: 'mm/s', toSI: 1e-3, optional: true },
    { key: 'startFrequency', label: 'Start frequency', unit: 'Hz', toSI: 1 },
    { key: 'endFrequency', label: 'End frequency', unit: 'Hz', toSI: 1 },
    { key: 'duration', label: 'Duration', unit: 's', toSI: 1 },
    { key: 'law', label: 'Frequency change', options: ['log', 'linear'] },
  ],
  bump: [
    { key: 'height', label: 'Height', ...mm },
    { key: 'length', label: 'Length along the road', ...m },
    { key: 'at', label: 'Starts at', ...m },
  ],
  pothole: [
    { key: 'depth', label: 'Depth', ...mm },
    { key: 'length', label: 'Length along the road', ...m },
    { key: 'at', label: 'Starts at', ...m },
  ],
  kerb: [
    { key: 'height', label: 'Step (up +, down −)', ...mm },
    { key: 'rampLength', label: 'Ramp length', ...m },
    { key: 'at', label: 'Foot of the ramp at', ...m },
  ],
  measured: [
    { key: 'detrend', label: 'Remove before use', options: ['linear', 'mean', 'none'], hint: 'linear: a straight line through the profile' },
    { key: 'spacing', label: 'Resampling step', ...m, optional: true, hint: 'default: the median spacing of the points' },
  ],
};

export const defaultRoads: Record<Exclude<RoadKind, 'measured'>, Record<string, string>> = {
  iso8608: { class: 'C', seed: '1', waviness: '', nMin: '', nMax: '', length: '', amplitudes: 'fixed' },
  sine: { amplitude: '10', wavelength: '8' },
  sweep: { amplitude: '5', velocityAmplitude: '', startFrequency: '0.5', endFrequency: '20', duration: '30', law: 'log' },
  bump: { height: '50', length: '0.6', at: '10' },
  pothole: { depth: '40', length: '0.5', at: '10' },
  kerb: { height: '80', rampLength: '0.05', at: '5' },
};

const shown = (x: number, spec: FieldSpec) => Number((x / (spec.toSI ?? 1)).toPrecision(6)).toString();

/** A road's fields as text in the units shown. */
export function textsOf(road: Road): Record<string, string> {
  const out: Record<string, string> = {};
  for (const spec of roadFields[road.kind]) {
    const v = (road as Record<string, unknown>)[spec.key];
    out[spec.key] = v === undefined ? '' : typeof v === 'number' && !spec.options ? shown(v, spec) : String(v);
  }
  return out;
}

/**
 * The texts as a road candidate in SI, for the road schema to judge. Blank optional fields are
 * left out; a blank required field becomes NaN so the schema names it.
 */
export function candidateOf(kind: RoadKind, texts: Record<string, string>, keep: Partial<Road> = {}): Record<string, unknown> {
  const out: Record<string, unknown> = { ...keep, kind };
  for (const spec of roadFields[kind]) {
    const t = (texts[spec.key] ?? '').trim();
    if (spec.options) {
      if (t) out[spec.key] = t;
      continue;
    }
    if (t === '') {
      if (!spec.optional) out[spec.key] = Number.NaN;
      continue;
    }
    const x = Number(t.replace(',', '.'));
    out[spec.key] = spec.key === 'seed' ? x : x * (spec.toSI ?? 1);
  }
  return out;
}
