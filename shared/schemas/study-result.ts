import { z } from 'zod';
import { StudyFigureKey, StudyFigures, StudyParameter } from './study.ts';

/**
 * What a study produces: per point, the figures of every run (road × speed), the aggregated
 * figures and objectives, and whether the point meets the limits (with the reasons when not).
 */

/** Swept values of one point, by parameter (SI; scales are plain factors). Empty for the base. */
export const StudyPointValues = z.partialRecord(StudyParameter, z.number());
export type StudyPointValues = z.infer<typeof StudyPointValues>;

/** One run of a point: which road and speed, and its figures or why it failed. */
export const StudyRunOutcome = z.object({
  /** Index into the definition's `roads`. */
  roadIndex: z.number().int().nonnegative(),
  /** m/s */
  speed: z.number().positive(),
  /** Which of the study's road seeds (0: the road's own, the default); absent in a one-seed study. */
  seedIndex: z.number().int().min(0).max(49).optional(),
  /** null when the run failed. */
  figures: StudyFigures.nullable(),
  error: z.string().optional(),
});
export type StudyRunOutcome = z.infer<typeof StudyRunOutcome>;

export const studyViolationKinds = ['maxStrokeUsed', 'maxLiftOffFraction', 'minTyreLoad', 'minStaticSag', 'maxStaticSag', 'notCheckable', 'runFailed', 'setupInvalid'] as const;
export const StudyViolationKind = z.enum(studyViolationKinds);
export type StudyViolationKind = z.infer<typeof StudyViolationKind>;

/** Why a point is not feasible. `roadIndex`/`speed` name the run (null when it is the point's setup). */
export const StudyViolation = z.object({
  kind: StudyViolationKind,
  /** The limit and the run's value (shares as fractions, loads in N, sag in m); null when not numeric. */
  limit: z.number().nullable(),
  value: z.number().nullable(),
  roadIndex: z.number().int().nonnegative().nullable(),
  speed: z.number().nullable(),
  message: z.string(),
});
export type StudyViolation = z.infer<typeof StudyViolation>;

/** How one figure of a point scatters over the study's road seeds. */
export const FigureSpread = z.object({
  /** Sample standard deviation over the seeds (n − 1). */
  sd: z.number(),
  min: z.number(),
  max: z.number(),
  /** Seeds it was taken over (those whose runs all gave the figure). */
  n: z.number().int().positive(),
});
export type FigureSpread = z.infer<typeof FigureSpread>;

export const StudyPointResult = z.object({
  /** Position in sweep order; −1 for the unchanged base setup. */
  index: z.number().int().min(-1),
  values: StudyPointValues,
  runs: z.array(StudyRunOutcome),
  /**
   * Figures combined over the point's successful runs (mean or worst, per the definition). Over
   * several seeds: combined per seed, then the mean over the seeds.
   */
  figures: StudyFigures,
  /** Over several seeds: each figure's spread across them (absent in a one-seed study). */
  spread: z.partialRecord(StudyFigureKey, FigureSpread).optional(),
  /** Aggregated value of each objective, in the definition's order; null when missing. */
  objectives: z.array(z.number().nullable()),
  feasible: z.boolean(),
  violations: z.array(StudyViolation),
});
export type StudyPointResult = z.infer<typeof StudyPointResult>;

/** A study's results so far. `cancelled` keeps the points that finished. */
export const StudyResults = z.object({
  status: z.enum(['running', 'complete', 'cancelled']),
  totalRuns: z.number().int().nonnegative(),
  doneRuns: z.number().int().nonnegative(),
  points: z.array(StudyPointResult),
  /** The base setup over the same roads and speeds; null when speed is swept. */
  base: StudyPointResult.nullable(),
});
export type StudyResults = z.infer<typeof StudyResults>;

/** The best compromise as stored with a study (see shared/study/best-compromise.ts). */
export const StudyCompromise = z.discriminatedUnion('ok', [
  z.object({
    ok: z.literal(true),
    /** Index of the winning point in `points`. */
    winner: z.number().int().nonnegative(),
    score: z.number(),
    scores: z.array(z.number().nullable()),
    ranges: z.array(z.object({ objective: z.number().int(), min: z.number(), max: z.number() })),
    tiedWith: z.array(z.number().int()),
    front: z.array(z.number().int()),
    neighbours: z.array(
      z.object({
        index: z.number().int(),
        deltas: z.array(z.object({ objective: z.number().int(), winner: z.number(), other: z.number(), pct: z.number().nullable() })),
        sentence: z.string(),
      }),
    ),
    explanation: z.array(z.string()),
  }),
  z.object({ ok: z.literal(false), reason: z.enum(['no-points', 'no-feasible-point', 'no-weight']), explanation: z.array(z.string()) }),
]);
export type StudyCompromise = z.infer<typeof StudyCompromise>;

/** Comfort against grip for the chart: one entry per point, and the front through them. */
export const StudyTradeOff = z.object({
  comfortFigure: StudyFigureKey,
  gripFigure: StudyFigureKey,
  /**
   * Indices (into `points`) of the non-dominated feasible points, ordered along the comfort axis.
   * The base setup competes for the front too: a point it beats on both figures is not on it.
   */
  front: z.array(z.number().int()),
  /** Whether the base setup is on the front; absent when there is no base (speed swept) or on older summaries. */
  baseOnFront: z.boolean().optional(),
});
export type StudyTradeOff = z.infer<typeof StudyTradeOff>;
