import { z } from 'zod';

/**
 * Damper dyno measurements after parsing: always SI (m/s, N, m, s) and always in the project's
 * sign convention: compression positive (piston moving in, force resisting compression). Peak
 * points are stored per direction as magnitudes, like the damper curves of a setup.
 */

export const dynoDirections = ['compression', 'rebound'] as const;
/** Which way the piston moves: in (compression) or out (rebound, extension). */
export const DynoDirection = z.enum(dynoDirections);
export type DynoDirection = z.infer<typeof DynoDirection>;

/** One measured point of one direction: piston speed magnitude m/s and the force magnitude N. */
export const DynoPoint = z.object({
  /** Piston speed, m/s, ≥ 0. */
  velocity: z.number().nonnegative(),
  /** Force in the direction's own sense, N (a small negative value is possible at low speed). */
  force: z.number(),
});
export type DynoPoint = z.infer<typeof DynoPoint>;

/** Peak (velocity, force) points per direction, each list sorted by rising velocity. */
export const DynoPeakPoints = z.object({
  compression: z.array(DynoPoint),
  rebound: z.array(DynoPoint),
});
export type DynoPeakPoints = z.infer<typeof DynoPeakPoints>;

/**
 * A raw dyno record. Equal-length columns, time strictly rising. Displacement and velocity are
 * positive in compression (rod going in); force is positive when it resists compression.
 */
export const DynoTimeSeries = z
  .object({
    /** s */
    time: z.array(z.number()),
    /** Rod position, m, compression positive (any zero). */
    displacement: z.array(z.number()),
    /** Rod force, N, compression positive. */
    force: z.array(z.number()),
    /** Piston velocity m/s when the file had its own column; otherwise derived later. */
    velocity: z.array(z.number()).optional(),
  })
  .refine(
    (s) =>
      s.displacement.length === s.time.length &&
      s.force.length === s.time.length &&
      (s.velocity === undefined || s.velocity.length === s.time.length),
    'all columns must have the same length',
  );
export type DynoTimeSeries = z.infer<typeof DynoTimeSeries>;

/** Units a dyno file may be written in: SI, and the inch-pound units some dyno benches still print. */
export const VelocityUnit = z.enum(['m/s', 'mm/s', 'in/s']);
export type VelocityUnit = z.infer<typeof VelocityUnit>;
export const ForceUnit = z.enum(['N', 'kN', 'lbf']);
export type ForceUnit = z.infer<typeof ForceUnit>;
export const DisplacementUnit = z.enum(['m', 'mm', 'in']);
export type DisplacementUnit = z.infer<typeof DisplacementUnit>;
export const TimeUnit = z.enum(['s', 'ms']);
export type TimeUnit = z.infer<typeof TimeUnit>;

/**
 * How a file's signs read: `compression-positive` (rod going in / force resisting that is
 * positive) or `extension-positive` (the reverse; values are negated on reading).
 */
export const SignConvention = z.enum(['compression-positive', 'extension-positive']);
export type SignConvention = z.infer<typeof SignConvention>;

/** Rows a dyno file may hold (data rows, not counting the header or comments). */
export const DYNO_MAX_ROWS = 200_000;

/**
 * What the uploader says about a file. Units apply only to columns whose header names none
 * (`velocity [mm/s]`, `force (kN)` win over these); a header unit that disagrees with an
 * explicitly given option is used and reported as a warning.
 */
export const DynoParseOptions = z.object({
  velocityUnit: VelocityUnit.default('m/s'),
  forceUnit: ForceUnit.default('N'),
  displacementUnit: DisplacementUnit.default('m'),
  timeUnit: TimeUnit.default('s'),
  /** Sign convention of displacement and velocity columns. */
  motionSign: SignConvention.default('compression-positive'),
  /** Sign convention of the force column. */
  forceSign: SignConvention.default('compression-positive'),
  /**
   * Static gas force to take out of the readings, N (≥ 0). A gas charge pushes the rod out, so
   * it reads as a compression-positive offset; it is subtracted before directions are split.
   */
  gasForce: z.number().nonnegative().max(1e5).default(0),
  maxRows: z.number().int().positive().max(DYNO_MAX_ROWS).default(DYNO_MAX_ROWS),
});
export type DynoParseOptions = z.infer<typeof DynoParseOptions>;

/** A problem found in a file. `line` is 1-based over the raw text (the header is usually line 1). */
export const DynoIssue = z.object({
  line: z.number().int().nonnegative().optional(),
  message: z.string(),
});
export type DynoIssue = z.infer<typeof DynoIssue>;

/** Where a unit came from: the column header, the uploader's option, or the SI default. */
export const UnitSource = z.enum(['header', 'option', 'default']);
export type UnitSource = z.infer<typeof UnitSource>;

/** Units the file was read in (everything in `data` is SI regardless). */
export const DynoUnitsUsed = z.object({
  velocity: z.object({ unit: VelocityUnit, source: UnitSource }).optional(),
  force: z.object({ unit: ForceUnit, source: UnitSource }),
  displacement: z.object({ unit: DisplacementUnit, source: UnitSource }).optional(),
  time: z.object({ unit: TimeUnit, source: UnitSource }).optional(),
});
export type DynoUnitsUsed = z.infer<typeof DynoUnitsUsed>;

/** Layouts the parser recognises; reported so the UI can say what it understood. */
export const DynoLayout = z.enum([
  /** direction, velocity, force */
  'direction-column',
  /** velocity, compression force, rebound force */
  'force-per-direction',
  /** signed velocity, signed force */
  'signed',
  /** time, displacement, force (optionally velocity) */
  'time-series',
]);
export type DynoLayout = z.infer<typeof DynoLayout>;

const success = {
  ok: z.literal(true),
  layout: DynoLayout,
  units: DynoUnitsUsed,
  /** Data rows read. */
  rows: z.number().int().nonnegative(),
  warnings: z.array(DynoIssue),
};

export const DynoParseSuccess = z.discriminatedUnion('kind', [
  z.object({ ...success, kind: z.literal('peaks'), data: DynoPeakPoints }),
  z.object({ ...success, kind: z.literal('series'), data: DynoTimeSeries }),
]);
export type DynoParseSuccess = z.infer<typeof DynoParseSuccess>;

export const DynoParseFailure = z.object({
  ok: z.literal(false),
  /** At least one; capped, the last may say how many more were found. */
  errors: z.array(DynoIssue).min(1),
});
export type DynoParseFailure = z.infer<typeof DynoParseFailure>;

export const DynoParseResult = z.union([DynoParseSuccess, DynoParseFailure]);
export type DynoParseResult = z.infer<typeof DynoParseResult>;

/** One half-cycle of a raw record: a stretch where the piston moves one way. */
export const DynoHalfCycle = z.object({
  direction: DynoDirection,
  /** First and last sample index of the stretch (inclusive). */
  start: z.number().int().nonnegative(),
  end: z.number().int().nonnegative(),
  /** Sample with the highest piston speed. */
  peakIndex: z.number().int().nonnegative(),
  /** Peak piston speed, m/s (magnitude). */
  velocity: z.number().nonnegative(),
  /** Force at that speed in the direction's sense, N. */
  force: z.number(),
});
export type DynoHalfCycle = z.infer<typeof DynoHalfCycle>;

/** Force-velocity loop for plotting (thinned to at most a few thousand samples). */
export const DynoLoop = z.object({
  time: z.array(z.number()),
  displacement: z.array(z.number()),
  /** m/s, compression positive. */
  velocity: z.array(z.number()),
  /** N, compression positive. */
  force: z.array(z.number()),
});
export type DynoLoop = z.infer<typeof DynoLoop>;

/** What a raw record gives: the loop, its half-cycles and the peak points per direction. */
export const DynoSeriesAnalysis = z.object({
  /** `file`: the record had a velocity column; otherwise the derivative method used. */
  velocitySource: z.enum(['file', 'central-difference']),
  /** Half-width of the central difference in samples (0 when the file gave velocity). */
  halfWindow: z.number().int().nonnegative(),
  method: z.enum(['peak-per-half-cycle', 'velocity-bins']),
  loop: DynoLoop,
  halfCycles: z.array(DynoHalfCycle),
  peaks: DynoPeakPoints,
  warnings: z.array(z.string()),
});
export type DynoSeriesAnalysis = z.infer<typeof DynoSeriesAnalysis>;

/** How well one measured point sits on the fitted table. */
export const DynoFitResidual = z.object({
  /** m/s */
  velocity: z.number().nonnegative(),
  /** N */
  measured: z.number(),
  /** Table force at that speed, N. */
  fitted: z.number(),
  /** measured − fitted, N. */
  residual: z.number(),
  /** 100·residual/|measured|; null when the measured force is 0. */
  residualPct: z.number().nullable(),
});
export type DynoFitResidual = z.infer<typeof DynoFitResidual>;

/** A fitted table for one direction (see `shared/dyno/fit-curve.ts`). */
export const DynoDirectionFit = z.discriminatedUnion('ok', [
  z.object({
    ok: z.literal(true),
    /** `[velocity m/s, force N]` at the chosen knots; the origin is implied. A valid `DamperCurve`. */
    table: z.array(z.tuple([z.number(), z.number()])),
    residuals: z.array(DynoFitResidual),
    /** RMS of the residuals, N. */
    rmsResidual: z.number().nonnegative(),
    /** RMS of the residuals in %, over points with a non-zero measured force. */
    rmsResidualPct: z.number().nonnegative().nullable(),
    maxAbsResidual: z.number().nonnegative(),
    /** Knots whose force was held equal to the knot below so force never falls with speed. */
    heldKnots: z.array(z.number()),
    notes: z.array(z.string()),
  }),
  z.object({ ok: z.literal(false), message: z.string() }),
]);
export type DynoDirectionFit = z.infer<typeof DynoDirectionFit>;

export const DynoFit = z.object({ compression: DynoDirectionFit, rebound: DynoDirectionFit });
export type DynoFit = z.infer<typeof DynoFit>;
