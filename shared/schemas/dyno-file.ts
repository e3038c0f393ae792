import { z } from 'zod';
import { DisplacementUnit, DynoDirection, DynoFit, DynoIssue, DynoLayout, DynoLoop, DynoParseOptions, DynoPeakPoints, DynoUnitsUsed, ForceUnit, SignConvention, TimeUnit, VelocityUnit } from './dyno.ts';
import { Id, IsoDateTime } from './fields.ts';
import { PersonRef, RevisionMessage } from './setup-record.ts';

/**
 * A damper dyno file uploaded against a setup, as the API sends and takes it. What the parser
 * reads (`shared/dyno/`) is in shared/schemas/dyno.ts; this adds who, when, the options used and
 * the revision a fit produced.
 */

/** Largest dyno file accepted, bytes. */
export const DYNO_MAX_BYTES = 2 * 1024 * 1024;

const blankToUndefined = (v: unknown) => (v === null || (typeof v === 'string' && v.trim() === '') ? undefined : v);
const optional = <T extends z.ZodType>(t: T) => z.preprocess(blankToUndefined, t.optional());

/**
 * Form fields beside the `file` of POST …/dyno-files (multipart, so everything arrives as text).
 * Units apply to columns whose header names none; blank means "not given".
 */
export const DynoUploadFields = z.object({
  velocityUnit: optional(VelocityUnit),
  forceUnit: optional(ForceUnit),
  displacementUnit: optional(DisplacementUnit),
  timeUnit: optional(TimeUnit),
  motionSign: optional(SignConvention),
  forceSign: optional(SignConvention),
  /** Static gas force to take out of the readings, N. */
  gasForce: optional(z.coerce.number().nonnegative().max(1e5)),
});
export type DynoUploadFields = z.infer<typeof DynoUploadFields>;

/** Raw-record figures kept beside the derived peak points. */
export const DynoSeriesFigures = z.object({
  velocitySource: z.enum(['file', 'central-difference']),
  halfWindow: z.number().int().nonnegative(),
  method: z.enum(['peak-per-half-cycle', 'velocity-bins']),
  /** Complete strokes found. */
  halfCycles: z.number().int().nonnegative(),
  /** Length of the record, s. */
  duration: z.number().nonnegative(),
  /** Highest piston speed in the record, m/s. */
  peakSpeed: z.number().nonnegative(),
  warnings: z.array(z.string()),
});
export type DynoSeriesFigures = z.infer<typeof DynoSeriesFigures>;

/** What the file's own preamble says about the gas force in its readings (shared/dyno/gas-declaration.ts). */
export const DynoGasDeclaration = z.object({ says: z.enum(['included', 'removed']), line: z.number().int().positive(), text: z.string() });
export type DynoGasDeclaration = z.infer<typeof DynoGasDeclaration>;

/** What the server found in a file when it was uploaded (SI, compression positive). */
export const DynoFileSummary = z.object({
  kind: z.enum(['peaks', 'series']),
  layout: DynoLayout,
  units: DynoUnitsUsed,
  rows: z.number().int().nonnegative(),
  warnings: z.array(DynoIssue),
  /** Peak points per direction: read from the file, or derived from a raw record. */
  peaks: DynoPeakPoints,
  series: DynoSeriesFigures.nullable(),
  /** null when the preamble says nothing (and for files stored before this was read). */
  gasDeclaration: DynoGasDeclaration.nullable().default(null),
});
export type DynoFileSummary = z.infer<typeof DynoFileSummary>;

export const RevisionRef = z.object({ id: Id, number: z.number().int().positive() });
export type RevisionRef = z.infer<typeof RevisionRef>;

export const DynoFileItem = z.object({
  id: Id,
  setupId: Id,
  filename: z.string(),
  bytes: z.number().int().nonnegative(),
  uploadedBy: PersonRef,
  createdAt: IsoDateTime,
  /** The revision the last applied fit of this file produced. */
  producedRevision: RevisionRef.nullable(),
  options: DynoParseOptions,
  summary: DynoFileSummary,
});
export type DynoFileItem = z.infer<typeof DynoFileItem>;

/** GET …/dyno-files/:id — with the force-velocity loop of a raw record (thinned for plotting). */
export const DynoFileDetail = DynoFileItem.extend({ loop: DynoLoop.nullable() });
export type DynoFileDetail = z.infer<typeof DynoFileDetail>;

/** GET …/dyno-files — newest first. */
export const DynoFilesResponse = z.object({ files: z.array(DynoFileItem) });
export type DynoFilesResponse = z.infer<typeof DynoFilesResponse>;

const Knots = z.array(z.number().positive().max(20)).min(1).max(64);

/**
 * POST …/dyno-files/:id/apply — fit the chosen directions at the chosen speeds (m/s) and save
 * the setup's latest revision with those curves replaced as a new revision.
 */
export const ApplyDynoFitInput = z.object({
  knots: z.union([Knots, z.object({ compression: Knots, rebound: Knots })]),
  directions: z
    .array(DynoDirection)
    .min(1, 'Choose compression, rebound or both')
    .refine((d) => new Set(d).size === d.length, 'Each direction once'),
  message: RevisionMessage.pipe(z.string().min(1, 'Say in a few words what changed')),
  weighting: z.enum(['absolute', 'relative']).optional(),
  /** The revision the user looked at; a newer one refuses the save (409). */
  basedOn: z.number().int().positive().optional(),
});
export type ApplyDynoFitInput = z.infer<typeof ApplyDynoFitInput>;

export const ApplyDynoFitResult = z.object({ file: DynoFileItem, revision: RevisionRef, fit: DynoFit });
export type ApplyDynoFitResult = z.infer<typeof ApplyDynoFitResult>;
