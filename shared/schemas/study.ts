import { z } from 'zod';
import { Id, plainLine, plainLineMessage } from './fields.ts';
import { Road } from './road.ts';

/**
 * A study: the base setup revision swept over one or two parameters, each point run over every
 * road at every speed, judged by weighted figures within limits. SI units throughout.
 */

export const studyParameters = [
  'damperScale',
  'compressionScale',
  'reboundScale',
  'targetBodyDampingRatio',
  'springRate',
  'tyreRate',
  'unsprungMass',
  'gasForce',
  'mountRate',
  'frictionBreakaway',
  'skyGain',
  'groundGain',
  'controlBlend',
  'controlOn',
  'speed',
] as const;
/**
 * What a sweep axis changes (see shared/study/apply-point.ts): `damperScale`,
 * `compressionScale`, `reboundScale` multiply curve forces (×); `targetBodyDampingRatio` scales
 * the whole damper to that classic body damping ratio; `springRate` (N/m at the spring),
 * `tyreRate` (N/m), `unsprungMass` (kg), `gasForce` (N, static) replace the setup's value;
 * `mountRate` (N/m) sets the top mount's rate (adding an undamped mount), `frictionBreakaway`
 * (N) the strut friction (adding it at 5 mm/s smoothing; 0 removes it); `skyGain`,
 * `groundGain` (N·s/m) and `controlBlend` (0–1) set the controlled damper's law, which the
 * base setup must have; `controlOn` below 0.5 takes the control off (the damper runs passive on
 * its soft tables), so a 0–1 axis of two steps puts passive and controlled points on one chart;
 * `speed` (m/s) replaces the study's speed list.
 */
export const StudyParameter = z.enum(studyParameters);
export type StudyParameter = z.infer<typeof StudyParameter>;

/** Allowed sweep range per parameter (inclusive); the schema checks `from` and `to` against it. */
export const studyParameterRange: Record<StudyParameter, { min: number; max: number }> = {
  damperScale: { min: 0.05, max: 10 },
  compressionScale: { min: 0.05, max: 10 },
  reboundScale: { min: 0.05, max: 10 },
  targetBodyDampingRatio: { min: 0.01, max: 3 },
  springRate: { min: 100, max: 1e7 },
  tyreRate: { min: 1000, max: 1e8 },
  unsprungMass: { min: 1, max: 1000 },
  gasForce: { min: 0, max: 1e5 },
  mountRate: { min: 1e3, max: 1e9 },
  frictionBreakaway: { min: 0, max: 1e4 },
  skyGain: { min: 0, max: 1e6 },
  groundGain: { min: 0, max: 1e6 },
  controlBlend: { min: 0, max: 1 },
  controlOn: { min: 0, max: 1 },
  speed: { min: 0.5, max: 100 },
};

/**
 * One swept parameter: `steps` values from `from` to `to`, both ends included (`steps` = 1 gives
 * `from` alone). `linear` spaces them evenly; `log` evenly in ratio (needs both ends above 0).
 * `from` may exceed `to` (a falling sweep).
 */
export const SweepAxis = z
  .object({
    parameter: StudyParameter,
    from: z.number(),
    to: z.number(),
    steps: z.number().int().min(1).max(100),
    spacing: z.enum(['linear', 'log']).default('linear'),
  })
  .superRefine((a, ctx) => {
    const r = studyParameterRange[a.parameter];
    for (const end of ['from', 'to'] as const) {
      if (a[end] < r.min || a[end] > r.max) ctx.addIssue({ code: 'custom', path: [end], message: `${a.parameter} must lie between ${r.min} and ${r.max}` });
    }
    if (a.spacing === 'log' && !(a.from > 0 && a.to > 0)) ctx.addIssue({ code: 'custom', path: ['spacing'], message: 'log spacing needs both ends above 0' });
  });
export type SweepAxis = z.infer<typeof SweepAxis>;

/** A road written out in full (also what a study shared by link shows: no library ids). */
export const InlineStudyRoad = z.object({
  source: z.literal('inline'),
  road: Road,
  name: z.string().max(120).regex(plainLine, plainLineMessage).optional(),
  seed: z.number().int().min(0).max(4294967295).optional(),
});

/** A road of the study: one from the workspace library, or written out in full. */
export const StudyRoad = z.discriminatedUnion('source', [
  z.object({
    source: z.literal('library'),
    roadId: Id,
    /** Shown in charts and tables; the library name when saved. */
    name: z.string().max(120).regex(plainLine, plainLineMessage).optional(),
    /** Replaces an ISO 8608 road's own seed for this study. */
    seed: z.number().int().min(0).max(4294967295).optional(),
  }),
  InlineStudyRoad,
]);
export type StudyRoad = z.infer<typeof StudyRoad>;

export const studyFigureKeys = [
  'bodyAccelRms',
  'bodyAccelPeak',
  'bodyAccelCrest',
  'bodyAccelWkRms',
  'vdv',
  'mtvv',
  'tyreLoadRms',
  'tyreLoadRatio',
  'tyreLoadMin',
  'liftOffFraction',
  'travelRms',
  'travelMaxCompression',
  'travelMaxExtension',
  'strokeUsedCompression',
  'strokeUsedExtension',
  'strokeUsed',
  'bumpStopTime',
  'reboundStopTime',
  'damperVelocityRms',
  'damperPowerMean',
  'damperEnergy',
  'staticSag',
  'endOfStrokeDepth',
  'bodyDampingRatioOnRoad',
] as const;
/**
 * Single-number figures of a run a study keeps and can judge by: the scalar `Metrics` of the run
 * plus `strokeUsed` = the larger of the compression and extension stroke used, and `staticSag`,
 * how far the body sits down at rest (spring and tyre, m): the ride height a point costs;
 * `endOfStrokeDepth`, how far travel went past either end of the stroke into the hard limit (m,
 * 0 when it never reached it), and `bodyDampingRatioOnRoad`, the body damping ratio from the
 * damping the damper gave on that road (ΣF·v / Σv²) rather than from its table's 0–0.3 m/s slope.
 */
export const StudyFigureKey = z.enum(studyFigureKeys);
export type StudyFigureKey = z.infer<typeof StudyFigureKey>;

/** Figures of one run or of one point after aggregation (absent: not available, e.g. no stroke given). */
export const StudyFigures = z.partialRecord(StudyFigureKey, z.number());
export type StudyFigures = z.infer<typeof StudyFigures>;

/** A figure to judge by and its weight in the best compromise (0 = shown, not weighed). */
export const StudyObjective = z.object({
  figure: StudyFigureKey,
  weight: z.number().min(0).max(100),
});
export type StudyObjective = z.infer<typeof StudyObjective>;

/** Limits a point must meet on every road and speed to be feasible. All optional. */
export const StudyConstraints = z.object({
  /** Largest share of the available stroke used, either way (1 = all of it). */
  maxStrokeUsed: z.number().positive().max(2).optional(),
  /** Largest share of time with the wheel off the road. */
  maxLiftOffFraction: z.number().min(0).max(1).optional(),
  /** Smallest tyre contact force allowed, N. */
  minTyreLoad: z.number().nonnegative().max(1e6).optional(),
  /** Least static sag of the body (spring and tyre), m: a floor on how far the corner may rise. */
  minStaticSag: z.number().nonnegative().max(2).optional(),
  /** Most static sag of the body, m: a ceiling on how far the corner may sink. */
  maxStaticSag: z.number().positive().max(2).optional(),
});
export type StudyConstraints = z.infer<typeof StudyConstraints>;

/** Runs one study may ask for (points × roads × speeds). */
export const STUDY_MAX_RUNS = 20_000;

const studyDefinitionFields = {
  name: z.string().trim().min(1).max(120).regex(plainLine, plainLineMessage),
  /** The setup revision every point starts from. */
  base: z.object({ setupId: Id, revisionId: Id }),
  axes: z.array(SweepAxis).min(1).max(2),
  roads: z.array(StudyRoad).min(1).max(8),
  /** Vehicle speeds, m/s; must be empty when `speed` is a swept axis. */
  speeds: z.array(z.number().min(0.5).max(100)).max(8),
  /** Simulated time per run, s. */
  duration: z.number().min(1).max(600).default(60),
  /** Start of the analysed part, s; default as for single runs. */
  settleTime: z.number().nonnegative().max(600).optional(),
  /** How figures combine over roads and speeds: their mean, or the worst of them. */
  aggregate: z.enum(['mean', 'worst']).default('mean'),
  objectives: z.array(StudyObjective).min(1).max(6),
  /** The figures on the comfort and grip axes of the trade-off chart (and its Pareto front). */
  comfortFigure: StudyFigureKey.default('bodyAccelWkRms'),
  gripFigure: StudyFigureKey.default('tyreLoadRatio'),
  constraints: StudyConstraints.default({}),
};

/**
 * What a study shared by link shows of its definition: everything but the base setup's ids, with
 * every road written out.
 */
export const PublicStudyDefinition = z.object({ ...studyDefinitionFields, roads: z.array(InlineStudyRoad).min(1).max(8) }).omit({ base: true });
export type PublicStudyDefinition = z.infer<typeof PublicStudyDefinition>;

export const StudyDefinition = z
  .object(studyDefinitionFields)
  .superRefine((d, ctx) => {
    const params = d.axes.map((a) => a.parameter);
    if (params.length === 2 && params[0] === params[1]) ctx.addIssue({ code: 'custom', path: ['axes', 1, 'parameter'], message: 'the two axes must sweep different parameters' });
    if (params.includes('damperScale') && params.includes('targetBodyDampingRatio')) {
      ctx.addIssue({ code: 'custom', path: ['axes'], message: 'damper scale and target damping ratio both set the damper level; sweep one of them' });
    }
    const sweptSpeed = params.includes('speed');
    if (sweptSpeed && d.speeds.length > 0) ctx.addIssue({ code: 'custom', path: ['speeds'], message: 'speed is swept: leave the speed list empty' });
    if (!sweptSpeed && d.speeds.length === 0) ctx.addIssue({ code: 'custom', path: ['speeds'], message: 'give at least one speed' });
    const figures = d.objectives.map((o) => o.figure);
    if (new Set(figures).size !== figures.length) ctx.addIssue({ code: 'custom', path: ['objectives'], message: 'each figure may be judged once' });
    if (!d.objectives.some((o) => o.weight > 0)) ctx.addIssue({ code: 'custom', path: ['objectives'], message: 'give at least one figure a weight above 0' });
    const points = d.axes.reduce((n, a) => n * a.steps, 1);
    const runs = points * d.roads.length * Math.max(1, d.speeds.length);
    if (runs > STUDY_MAX_RUNS) ctx.addIssue({ code: 'custom', path: ['axes'], message: `${runs} runs asked for; at most ${STUDY_MAX_RUNS}` });
    const c = d.constraints;
    if (c.minStaticSag !== undefined && c.maxStaticSag !== undefined && c.minStaticSag > c.maxStaticSag) {
      ctx.addIssue({ code: 'custom', path: ['constraints', 'maxStaticSag'], message: 'the most static sag must not be below the least' });
    }
    if (d.settleTime !== undefined && d.settleTime >= d.duration) ctx.addIssue({ code: 'custom', path: ['settleTime'], message: 'settleTime must be shorter than the run' });
  });
export type StudyDefinition = z.infer<typeof StudyDefinition>;
export type StudyDefinitionInput = z.input<typeof StudyDefinition>;
