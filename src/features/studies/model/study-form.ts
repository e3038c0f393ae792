import type { IsoClass } from '../../../../shared/schemas/road.ts';
import type { StudyDefinitionInput, StudyFigureKey, StudyParameter } from '../../../../shared/schemas/study.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import { centredRange } from '../../../../shared/study/centred-range.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';
import { defaultStudyDisplay, type StudyDisplay } from './display.ts';

/**
 * The study form's values, in the units the form shows (the person's chosen units for rates,
 * speeds and lengths, % for shares), and their conversion to a definition for the shared schema. Field names follow the schema's
 * paths wherever they can, so its messages land on the right field.
 */
export interface AxisValues {
  parameter: StudyParameter;
  from: number;
  to: number;
  steps: number;
  spacing: 'linear' | 'log';
}

export interface StudyFormValues {
  name: string;
  setupId: string;
  /** Revision number as the select holds it. */
  revision: string;
  twoAxes: boolean;
  /** Parameters swept beyond the second (0–2), when a second is swept. */
  moreAxes: number;
  /** Always four, the unused ones kept so a parameter comes back as it was left. */
  axes: AxisValues[];
  /** Road seeds per point (1: the road's own only). */
  seeds: number;
  /** `library:<roadId>` or `iso:<class>` (a generated ISO 8608 road); seed blank keeps the road's own. */
  roads: { choice: string; seed: string }[];
  /** In the chosen road-speed unit, separated by commas or spaces. */
  speeds: string;
  duration: number;
  aggregate: 'mean' | 'worst';
  objectives: { figure: StudyFigureKey; weight: number }[];
  comfortFigure: StudyFigureKey;
  gripFigure: StudyFigureKey;
  /** %, blank for no limit. */
  maxStrokeUsed: string;
  /** %, blank for no limit. */
  maxLiftOff: string;
  /** N, blank for no limit. */
  minTyreLoad: string;
  /** Static body sag in the chosen length unit, blank for no limit. */
  minSag: string;
  maxSag: string;
}

/**
 * A range to start from when a parameter is picked before the base setup has loaded (SI); once
 * it has, ranges are centred on the base's own value (shared/study/centred-range.ts).
 */
const parameterDefaults: Record<StudyParameter, { from: number; to: number; steps: number }> = {
  damperScale: { from: 0.6, to: 1.6, steps: 6 },
  compressionScale: { from: 0.6, to: 1.6, steps: 6 },
  reboundScale: { from: 0.6, to: 1.6, steps: 6 },
  targetBodyDampingRatio: { from: 0.15, to: 0.45, steps: 7 },
  springRate: { from: 14000, to: 42000, steps: 8 },
  tyreRate: { from: 160000, to: 280000, steps: 5 },
  unsprungMass: { from: 28, to: 48, steps: 5 },
  gasForce: { from: 0, to: 400, steps: 5 },
  mountRate: { from: 500000, to: 3000000, steps: 6 },
  frictionBreakaway: { from: 0, to: 200, steps: 5 },
  skyGain: { from: 0, to: 4000, steps: 5 },
  groundGain: { from: 0, to: 4000, steps: 5 },
  controlBlend: { from: 0, to: 1, steps: 5 },
  controlOn: { from: 0, to: 1, steps: 2 },
  speed: { from: 10, to: 35, steps: 6 },
};

/** The road speed a new study runs at, m/s (72 km/h). */
const DEFAULT_SPEED = 20;

/** An SI value as a form field shows it: six figures, so no float noise reaches the fields. */
const shownIn = (unit: { fromSI: (si: number) => number }, si: number) => Number(unit.fromSI(si).toPrecision(6));

export const axisDefaults = (parameter: StudyParameter, d: StudyDisplay = defaultStudyDisplay): AxisValues => ({ parameter, ...startingRange(parameter, undefined, d), spacing: 'linear' });

/** The starting range of a parameter in display units: centred on the base setup when it is known. */
export function startingRange(parameter: StudyParameter, base: Setup | undefined, d: StudyDisplay = defaultStudyDisplay): { from: number; to: number; steps: number } {
  const range = (base && centredRange(parameter, base)) || parameterDefaults[parameter];
  const unit = d.parameterUnit(parameter);
  return { from: shownIn(unit, range.from), to: shownIn(unit, range.to), steps: range.steps };
}

export function defaultFormValues(firstRoad: string, d: StudyDisplay = defaultStudyDisplay): StudyFormValues {
  return {
    name: 'Damping against spring rate',
    setupId: '',
    revision: '',
    twoAxes: true,
    moreAxes: 0,
    axes: [axisDefaults('damperScale', d), axisDefaults('springRate', d), axisDefaults('tyreRate', d), axisDefaults('unsprungMass', d)],
    seeds: 1,
    roads: [{ choice: firstRoad, seed: '' }],
    // three figures: 72 km/h, 20 m/s, 44.7 mph
    speeds: String(Number(d.units.speed.fromSI(DEFAULT_SPEED).toPrecision(3))),
    duration: 60,
    aggregate: 'mean',
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 1 },
      { figure: 'tyreLoadRatio', weight: 1 },
    ],
    comfortFigure: 'bodyAccelWkRms',
    gripFigure: 'tyreLoadRatio',
    maxStrokeUsed: '90',
    maxLiftOff: '1',
    minTyreLoad: '',
    minSag: '',
    maxSag: '',
  };
}

const optionalNumber = (text: string, toSI: (shown: number) => number = (n) => n): number | undefined => {
  const t = text.trim();
  if (t === '') return undefined;
  const n = Number(t.replace(',', '.'));
  return Number.isFinite(n) ? toSI(n) : Number.NaN;
};

/**
 * The definition the form describes, ready for `StudyDefinition.safeParse`. `revisionId` maps
 * the chosen revision number to its id (undefined while the list loads); `d` the units the
 * form's numbers are in.
 */
/** How many parameters the form sweeps (1–4). */
export const sweptAxisCount = (v: Pick<StudyFormValues, 'twoAxes' | 'moreAxes'>): number => (v.twoAxes ? 2 + Math.max(0, Math.min(2, Number(v.moreAxes) || 0)) : 1);

export function formToDefinition(v: StudyFormValues, revisionId: (n: number) => string | undefined, d: StudyDisplay = defaultStudyDisplay): StudyDefinitionInput {
  const speedToSI = (n: number) => siFromShown(d.units.speed, n);
  const lengthToSI = (n: number) => siFromShown(d.units.length, n);
  const axes = v.axes.slice(0, sweptAxisCount(v)).map((a) => ({
    parameter: a.parameter,
    from: siFromShown(d.parameterUnit(a.parameter), Number(a.from)),
    to: siFromShown(d.parameterUnit(a.parameter), Number(a.to)),
    steps: Number(a.steps),
    spacing: a.spacing,
  }));
  const sweptSpeed = axes.some((a) => a.parameter === 'speed');
  const speeds = sweptSpeed ? [] : v.speeds.split(/[\s,;]+/).filter(Boolean).map((s) => speedToSI(Number(s)));
  const roads = v.roads.map((r) => {
    const seed = optionalNumber(r.seed);
    const extra = seed === undefined ? {} : { seed };
    if (r.choice.startsWith('iso:')) {
      const cls = r.choice.slice(4) as IsoClass;
      return { source: 'inline' as const, road: { kind: 'iso8608' as const, name: `ISO 8608 class ${cls}`, class: cls, seed: 7 }, ...extra };
    }
    return { source: 'library' as const, roadId: r.choice.replace(/^library:/, ''), ...extra };
  });
  const constraints: StudyDefinitionInput['constraints'] = {};
  const stroke = optionalNumber(v.maxStrokeUsed, (n) => n / 100);
  const lift = optionalNumber(v.maxLiftOff, (n) => n / 100);
  const load = optionalNumber(v.minTyreLoad);
  if (stroke !== undefined) constraints.maxStrokeUsed = stroke;
  if (lift !== undefined) constraints.maxLiftOffFraction = lift;
  if (load !== undefined) constraints.minTyreLoad = load;
  const minSag = optionalNumber(v.minSag, lengthToSI);
  const maxSag = optionalNumber(v.maxSag, lengthToSI);
  if (minSag !== undefined) constraints.minStaticSag = minSag;
  if (maxSag !== undefined) constraints.maxStaticSag = maxSag;
  return {
    name: v.name,
    base: { setupId: v.setupId, revisionId: revisionId(Number(v.revision)) ?? '' },
    axes,
    roads,
    speeds,
    duration: Number(v.duration),
    seeds: Number(v.seeds ?? 1),
    aggregate: v.aggregate,
    objectives: v.objectives.map((o) => ({ figure: o.figure, weight: Number(o.weight) })),
    comfortFigure: v.comfortFigure,
    gripFigure: v.gripFigure,
    constraints,
  };
}

/** The form field a schema issue path belongs to. */
export function fieldOfIssue(path: readonly PropertyKey[]): string {
  const [head, ...rest] = path.map(String);
  if (head === 'base') return rest[0] === 'setupId' ? 'setupId' : 'revision';
  if (head === 'roads') return rest.length ? `roads.${rest[0]}.${rest[1] === 'seed' ? 'seed' : 'choice'}` : 'roads';
  if (head === 'constraints') {
    const byLimit: Record<string, string> = { maxStrokeUsed: 'maxStrokeUsed', maxLiftOffFraction: 'maxLiftOff', minTyreLoad: 'minTyreLoad', minStaticSag: 'minSag', maxStaticSag: 'maxSag' };
    return byLimit[rest[0]] ?? 'minTyreLoad';
  }
  if (head === 'speeds' || head === 'settleTime') return head === 'speeds' ? 'speeds' : 'duration';
  if (head === 'axes') return rest.length >= 2 ? `axes.${rest[0]}.${rest[1]}` : rest.length === 1 ? `axes.${rest[0]}.steps` : 'axes.0.steps';
  if (head === 'objectives') return rest.length >= 2 ? `objectives.${rest[0]}.${rest[1]}` : 'objectives';
  return [head, ...rest].join('.');
}
