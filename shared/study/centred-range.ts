import type { Setup } from '../schemas/setup.ts';
import { studyParameterRange, type StudyParameter } from '../schemas/study.ts';
import { staticGasForce } from '../sim/damper-gas.ts';
import { classicBodyDampingRatio } from './apply-point.ts';

/** A starting range for a sweep, SI, with an odd number of steps so the base value is one of them. */
export interface CentredRange {
  from: number;
  to: number;
  steps: number;
}

/**
 * Half-width of the starting range as a share of the base value (common practice for a first
 * look: wide enough to see a trend, narrow enough that the model's assumptions still hold).
 */
const spread: Record<Exclude<StudyParameter, 'speed'>, number> = {
  damperScale: 0.5,
  compressionScale: 0.5,
  reboundScale: 0.5,
  targetBodyDampingRatio: 0.5,
  springRate: 0.3,
  tyreRate: 0.2,
  unsprungMass: 0.2,
  gasForce: 1,
  mountRate: 0.5,
  frictionBreakaway: 1,
  skyGain: 0.5,
  groundGain: 0.5,
  controlBlend: 0.5,
  controlOn: 1,
};

/** One significant figure, so the steps read cleanly and the centre stays exactly the base value. */
const roundHalf = (x: number) => (x > 0 ? Number(x.toPrecision(1)) : 0);

/** The base setup's own value of a parameter (scales are 1 for the base). */
export function baseValue(parameter: Exclude<StudyParameter, 'speed'>, base: Setup): number {
  switch (parameter) {
    case 'damperScale':
    case 'compressionScale':
    case 'reboundScale':
      return 1;
    case 'targetBodyDampingRatio':
      return classicBodyDampingRatio(base);
    case 'springRate':
      return base.springRate;
    case 'tyreRate':
      return base.tyreRate;
    case 'unsprungMass':
      return base.unsprungMass;
    case 'gasForce':
      return staticGasForce(base.damper.gas);
    case 'mountRate':
      return base.topMount?.rate ?? 0;
    case 'frictionBreakaway':
      return base.friction?.breakaway ?? 0;
    case 'skyGain':
    case 'groundGain':
    case 'controlBlend':
      return controlValue(parameter, base);
    case 'controlOn':
      return base.damper.control ? 1 : 0;
  }
}

/**
 * A range centred on the base setup's value: base ± spread·base (the half-width rounded to one
 * significant figure), five steps so the middle one is the base, kept inside the schema's limits.
 * A zero gas force starts from 0 to 400 N. Speed belongs to the run: undefined.
 */
export function centredRange(parameter: StudyParameter, base: Setup): CentredRange | undefined {
  if (parameter === 'speed') return undefined;
  const limits = studyParameterRange[parameter];
  const centre = baseValue(parameter, base);
  if (parameter === 'gasForce' && centre === 0) return { from: 0, to: 400, steps: 5 };
  if (centre === 0 && startWhenAbsent[parameter]) return startWhenAbsent[parameter];
  if (parameter === 'controlBlend') return { from: 0, to: 1, steps: 5 };
  if (parameter === 'controlOn') return { from: 0, to: 1, steps: 2 };
  const half = roundHalf(spread[parameter] * centre);
  return { from: Math.max(limits.min, centre - half), to: Math.min(limits.max, centre + half), steps: 5 };
}

/** Where a sweep starts when the base has none of the part (SI). */
const startWhenAbsent: Partial<Record<StudyParameter, CentredRange>> = {
  mountRate: { from: 5e5, to: 3e6, steps: 6 },
  frictionBreakaway: { from: 0, to: 200, steps: 5 },
  skyGain: { from: 0, to: 4000, steps: 5 },
  groundGain: { from: 0, to: 4000, steps: 5 },
};

function controlValue(parameter: 'skyGain' | 'groundGain' | 'controlBlend', base: Setup): number {
  const law = base.damper.control?.law;
  if (!law) return 0;
  if (parameter === 'controlBlend') return law.kind === 'blend' ? law.blend : law.kind === 'skyhook' ? 1 : 0;
  if (law.kind === 'blend') return parameter === 'skyGain' ? law.skyGain : law.groundGain;
  return (parameter === 'skyGain') === (law.kind === 'skyhook') ? law.gain : 0;
}
