import type { Setup } from '../schemas/setup.ts';
import type { FitParameterKey } from '../schemas/drive-fit.ts';

/**
 * What the drive fit can identify. Each entry reads its value from a setup and writes a new one;
 * a new part of the corner (a top-mount rate, say) joins the fit by one more entry here and its
 * key in `fitParameterKeys` (shared/schemas/drive-fit.ts).
 */
export interface FitParameter {
  key: FitParameterKey;
  label: string;
  /** SI unit of the value ('' for a plain factor). */
  unit: string;
  read(setup: Setup): number;
  write(setup: Setup, value: number): Setup;
  /**
   * A mass or a force-making element. Scaling every one of these by the same factor gives the
   * same motion over a given road, so a fit must leave at least one of them fixed.
   */
  scalesWithMotion: boolean;
  /** Assumed by the road estimate from wheel signals, so it cannot be fitted against that road. */
  inRoadEstimate: boolean;
}

type Table = Setup['damper']['compression'];
const scaleTable = (table: Table, k: number): Table => table.map(([v, f]) => [v, f * k]) as Table;

export const fitParameters: readonly FitParameter[] = [
  {
    key: 'sprungMass',
    label: 'Sprung mass',
    unit: 'kg',
    read: (s) => s.sprungMass,
    write: (s, v) => ({ ...s, sprungMass: v as Setup['sprungMass'] }),
    scalesWithMotion: true,
    inRoadEstimate: true,
  },
  {
    key: 'unsprungMass',
    label: 'Unsprung mass',
    unit: 'kg',
    read: (s) => s.unsprungMass,
    write: (s, v) => ({ ...s, unsprungMass: v as Setup['unsprungMass'] }),
    scalesWithMotion: true,
    inRoadEstimate: true,
  },
  {
    key: 'springRate',
    label: 'Spring rate',
    unit: 'N/m',
    read: (s) => s.springRate,
    write: (s, v) => ({ ...s, springRate: v as Setup['springRate'] }),
    scalesWithMotion: true,
    inRoadEstimate: false,
  },
  {
    key: 'tyreRate',
    label: 'Tyre rate',
    unit: 'N/m',
    read: (s) => s.tyreRate,
    write: (s, v) => ({ ...s, tyreRate: v as Setup['tyreRate'] }),
    scalesWithMotion: true,
    inRoadEstimate: true,
  },
  {
    key: 'compressionScale',
    label: 'Damper compression scale',
    unit: '',
    // The scale is relative to the curves the fit started from: they are written scaled.
    read: () => 1,
    write: (s, k) => ({ ...s, damper: { ...s.damper, compression: scaleTable(s.damper.compression, k) } }),
    scalesWithMotion: true,
    inRoadEstimate: false,
  },
  {
    key: 'reboundScale',
    label: 'Damper rebound scale',
    unit: '',
    read: () => 1,
    write: (s, k) => ({ ...s, damper: { ...s.damper, rebound: scaleTable(s.damper.rebound, k) } }),
    scalesWithMotion: true,
    inRoadEstimate: false,
  },
];

export const fitParameterOf = (key: FitParameterKey): FitParameter => {
  const p = fitParameters.find((q) => q.key === key);
  if (!p) throw new Error(`no fit parameter ${key}`);
  return p;
};

/** Writes the values (in the order of `keys`) into a copy of the setup. */
export function applyParameters(setup: Setup, keys: readonly FitParameterKey[], values: readonly number[]): Setup {
  return keys.reduce((s, key, i) => fitParameterOf(key).write(s, values[i]), setup);
}

/**
 * Top-level setup fields a drive fit may change: those any parameter's `write` touches. The
 * server accepts a fitted corner only when nothing else differs from the revision it came from.
 */
export function fieldsAFitChanges(setup: Setup): Set<string> {
  const out = new Set<string>();
  for (const p of fitParameters) {
    const moved = p.write(setup, p.read(setup) * 1.01) as Record<string, unknown>;
    for (const key of Object.keys(moved)) if (moved[key] !== (setup as Record<string, unknown>)[key]) out.add(key);
  }
  return out;
}
