import type { Metrics } from '../schemas/metrics.ts';
import type { Setup } from '../schemas/setup.ts';
import type { StudyFigureKey, StudyFigures } from '../schemas/study.ts';
import { linearCorner } from '../sim/quarter-car.ts';

/** Which chart family a figure belongs to; `comfort` and `grip` feed the trade-off chart. */
export type FigureFamily = 'comfort' | 'grip' | 'travel' | 'damper';

export interface FigureInfo {
  /** Words for tables, charts and explanations. */
  label: string;
  /** SI unit ('' for ratios). */
  unit: string;
  /** `min`: lower is better; `max`: higher is better. "Worst" aggregation follows it. */
  goal: 'min' | 'max';
  family: FigureFamily;
}

/**
 * Words, units and sense of every study figure. Damper power and energy are neither good nor
 * bad in themselves; they are treated as lower-is-better so "worst" means the most dissipated.
 */
export const studyFigureInfo: Record<StudyFigureKey, FigureInfo> = {
  bodyAccelRms: { label: 'body acceleration RMS', unit: 'm/s²', goal: 'min', family: 'comfort' },
  bodyAccelPeak: { label: 'peak body acceleration', unit: 'm/s²', goal: 'min', family: 'comfort' },
  bodyAccelCrest: { label: 'body acceleration crest factor', unit: '', goal: 'min', family: 'comfort' },
  bodyAccelWkRms: { label: 'Wk-weighted body acceleration', unit: 'm/s²', goal: 'min', family: 'comfort' },
  vdv: { label: 'vibration dose value', unit: 'm/s^1.75', goal: 'min', family: 'comfort' },
  mtvv: { label: 'MTVV (largest 1 s running RMS)', unit: 'm/s²', goal: 'min', family: 'comfort' },
  tyreLoadRms: { label: 'dynamic tyre load RMS', unit: 'N', goal: 'min', family: 'grip' },
  tyreLoadRatio: { label: 'tyre load variation', unit: '', goal: 'min', family: 'grip' },
  tyreLoadMin: { label: 'minimum tyre load', unit: 'N', goal: 'max', family: 'grip' },
  liftOffFraction: { label: 'time off the road', unit: '', goal: 'min', family: 'grip' },
  travelRms: { label: 'suspension travel RMS', unit: 'm', goal: 'min', family: 'travel' },
  travelMaxCompression: { label: 'largest compression', unit: 'm', goal: 'min', family: 'travel' },
  travelMaxExtension: { label: 'largest extension', unit: 'm', goal: 'min', family: 'travel' },
  strokeUsedCompression: { label: 'compression stroke used', unit: '', goal: 'min', family: 'travel' },
  strokeUsedExtension: { label: 'extension stroke used', unit: '', goal: 'min', family: 'travel' },
  strokeUsed: { label: 'stroke used', unit: '', goal: 'min', family: 'travel' },
  bumpStopTime: { label: 'time on the bump stop', unit: 's', goal: 'min', family: 'travel' },
  reboundStopTime: { label: 'time on the rebound stop', unit: 's', goal: 'min', family: 'travel' },
  damperVelocityRms: { label: 'damper speed RMS', unit: 'm/s', goal: 'min', family: 'damper' },
  damperPowerMean: { label: 'mean damper power', unit: 'W', goal: 'min', family: 'damper' },
  damperEnergy: { label: 'damper energy', unit: 'J', goal: 'min', family: 'damper' },
  staticSag: { label: 'static sag', unit: 'm', goal: 'min', family: 'travel' },
  endOfStrokeDepth: { label: 'travel past the end of stroke', unit: 'm', goal: 'min', family: 'travel' },
  // neither good nor bad in itself: higher-is-better only so "worst" picks the least damped run
  bodyDampingRatioOnRoad: { label: 'body damping ratio on the road', unit: '', goal: 'max', family: 'damper' },
};

/**
 * The body damping ratio the damper actually gave on a road: the energy-equivalent coefficient
 * of the run (ΣF·v / Σv² at the damper) taken to the wheel, over 2·√(wheel rate · sprung mass),
 * the same classic form as the modal figures use for the table's slope.
 */
function bodyDampingRatioFrom(setup: Setup, coefficient: number): number {
  const c = linearCorner(setup, { coefficient, compression: coefficient, rebound: coefficient, definition: 'energy-equivalent on the road' });
  return c.wheelDamping / (2 * Math.sqrt(c.wheelRate * c.sprungMass));
}

/**
 * The single-number figures of one run's metrics, plus `strokeUsed` (the larger way, when a
 * stroke is given), the deepest travel past either end of the stroke, and, given the corner at
 * rest, its static sag; given the setup and the run's on-road damping, the damping ratio it gave.
 */
export function figuresFromMetrics(m: Metrics, statics?: { bodySag: number }, setup?: Setup): StudyFigures {
  const f: StudyFigures = {
    bodyAccelRms: m.bodyAccelRms,
    bodyAccelPeak: m.bodyAccelPeak,
    bodyAccelCrest: m.bodyAccelCrest,
    bodyAccelWkRms: m.bodyAccelWkRms,
    vdv: m.vdv,
    tyreLoadRms: m.tyreLoadRms,
    tyreLoadRatio: m.tyreLoadRatio,
    tyreLoadMin: m.tyreLoadMin,
    liftOffFraction: m.liftOffFraction,
    travelRms: m.travelRms,
    travelMaxCompression: m.travelMaxCompression,
    travelMaxExtension: m.travelMaxExtension,
    bumpStopTime: m.bumpStopTime,
    reboundStopTime: m.reboundStopTime,
    damperVelocityRms: m.damperVelocityRms,
    damperPowerMean: m.damperPowerMean,
    damperEnergy: m.damperEnergy,
  };
  if (m.mtvv !== undefined) f.mtvv = m.mtvv;
  if (statics) f.staticSag = statics.bodySag;
  if (m.strokeUsedCompression !== undefined) f.strokeUsedCompression = m.strokeUsedCompression;
  if (m.strokeUsedExtension !== undefined) f.strokeUsedExtension = m.strokeUsedExtension;
  if (m.strokeUsedCompression !== undefined || m.strokeUsedExtension !== undefined) {
    f.strokeUsed = Math.max(m.strokeUsedCompression ?? 0, m.strokeUsedExtension ?? 0);
  }
  if (m.endOfStrokeDepthCompression !== undefined || m.endOfStrokeDepthExtension !== undefined) {
    f.endOfStrokeDepth = Math.max(m.endOfStrokeDepthCompression ?? 0, m.endOfStrokeDepthExtension ?? 0);
  }
  if (setup && m.damperEquivalentOnRoad !== undefined) f.bodyDampingRatioOnRoad = bodyDampingRatioFrom(setup, m.damperEquivalentOnRoad);
  return f;
}
