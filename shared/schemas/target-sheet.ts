import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage, plainText, plainTextMessage } from './fields.ts';
import { DynoPeakPoints, DynoUnitsUsed, ForceUnit, SignConvention, VelocityUnit } from './dyno.ts';
import { DynoUploadFields } from './dyno-file.ts';
import { PersonRef } from './setup-record.ts';

/**
 * Damper target sheets: the forces a damper must make at chosen piston speeds, per direction,
 * with a tolerance band, and the checks of measured dampers against them. SI units (m/s, N).
 */

export const targetSheetStatuses = ['draft', 'in_review', 'released', 'returned'] as const;
/** draft → in_review → released (final) or returned (with a reason) → draft. */
export const TargetSheetStatus = z.enum(targetSheetStatuses);
export type TargetSheetStatus = z.infer<typeof TargetSheetStatus>;

/**
 * `TS-<workspace code>-<year>-<sequence>`, e.g. `TS-TBMW-2026-0007` (see
 * shared/target-sheet/sheet-number.ts).
 */
export const SheetNumber = z.string().regex(/^TS-[A-Z0-9]{2,6}-\d{4}-\d{4,6}$/, 'a sheet number reads like TS-ABCD-2026-0001');
export type SheetNumber = z.infer<typeof SheetNumber>;

/** One reference point: the force to make at a piston speed and how far it may stray. */
export const TargetPoint = z.object({
  /** Piston speed, m/s. */
  velocity: z.number().positive().max(20),
  /** Target force magnitude in this direction, N. */
  force: z.number().nonnegative().max(1e6),
  /** Band half-width as a percentage of the force (10 means ±10 %). */
  tolPct: z.number().min(0).max(100),
  /** Smallest band half-width, N: governs at low force where a percentage is too tight. */
  floorN: z.number().nonnegative().max(1e5),
});
export type TargetPoint = z.infer<typeof TargetPoint>;

/** Reference points of one direction, speeds strictly rising. */
export const TargetPoints = z
  .array(TargetPoint)
  .min(1)
  .max(32)
  .superRefine((pts, ctx) => {
    for (let i = 1; i < pts.length; i++) {
      if (!(pts[i].velocity > pts[i - 1].velocity)) {
        ctx.addIssue({ code: 'custom', path: [i, 'velocity'], message: `speeds must rise from point to point (${pts[i].velocity} m/s after ${pts[i - 1].velocity} m/s)` });
      }
    }
  });
export type TargetPoints = z.infer<typeof TargetPoints>;

/** The editable body of a sheet (what a draft save sends). */
export const TargetSheetContent = z.object({
  compression: TargetPoints,
  rebound: TargetPoints,
  /** Static gas force of the damper, N (stated on the sheet; the targets exclude it). */
  gasForce: z.number().nonnegative().max(1e5),
  notes: z.string().max(4000).regex(plainText, plainTextMessage),
});
export type TargetSheetContent = z.infer<typeof TargetSheetContent>;

/** Another sheet named by id and number (for supersession links). */
export const SheetRef = z.object({ id: Id, number: SheetNumber });
export type SheetRef = z.infer<typeof SheetRef>;

export const TargetSheet = TargetSheetContent.extend({
  id: Id,
  number: SheetNumber,
  workspaceId: Id,
  /** The setup revision the targets were taken from. */
  setupId: Id,
  setupRevision: z.number().int().positive(),
  setupName: z.string(),
  status: TargetSheetStatus,
  /** Why a lead sent it back; set while `returned`, kept (for the record) after reopening. */
  returnReason: z.string().nullable(),
  author: PersonRef,
  /** The lead or admin who released or returned it last. */
  approver: PersonRef.nullable(),
  createdAt: IsoDateTime,
  updatedAt: IsoDateTime,
  submittedAt: IsoDateTime.nullable(),
  /** When it was released or returned. */
  decidedAt: IsoDateTime.nullable(),
  /** The released sheet this one replaces. */
  supersedes: SheetRef.nullable(),
  /** The sheet that replaced this one (set on a released sheet when its replacement is released; nothing else changes). */
  supersededBy: SheetRef.nullable(),
  /** What the releasing lead wrote at release (null before release, or when left blank). */
  releaseComment: z.string().nullable(),
});
export type TargetSheet = z.infer<typeof TargetSheet>;

/** A change of status, as asked for (POST …/transition). */
export const TargetSheetTransitionInput = z.object({
  to: TargetSheetStatus,
  /** Required when returning a sheet. */
  reason: z.string().trim().max(2000).regex(plainText, plainTextMessage).optional(),
});
export type TargetSheetTransitionInput = z.infer<typeof TargetSheetTransitionInput>;

/** One entry of a sheet's history. */
export const TargetSheetEvent = z.object({
  from: TargetSheetStatus.nullable(),
  to: TargetSheetStatus,
  by: PersonRef,
  at: IsoDateTime,
  reason: z.string().nullable(),
});
export type TargetSheetEvent = z.infer<typeof TargetSheetEvent>;

/** Why a point passed or failed. */
export const PointVerdict = z.enum(['within', 'below', 'above', 'not-measured']);
export type PointVerdict = z.infer<typeof PointVerdict>;

/** One reference point checked against a measured damper. */
export const PointCheck = z.object({
  velocity: z.number().positive(),
  target: z.number(),
  /** Band edges, N (lower may fall below 0 where the floor governs). */
  lower: z.number(),
  upper: z.number(),
  /** Measured force interpolated at this speed, N; null when the speed was not measured. */
  measured: z.number().nullable(),
  /** measured − target, N. */
  deviation: z.number().nullable(),
  /** 100·deviation/target; null when not measured or the target is 0. */
  deviationPct: z.number().nullable(),
  pass: z.boolean(),
  verdict: PointVerdict,
});
export type PointCheck = z.infer<typeof PointCheck>;

export const DirectionCheck = z.object({ points: z.array(PointCheck), pass: z.boolean() });
export type DirectionCheck = z.infer<typeof DirectionCheck>;

/** One physical damper checked against a sheet. */
export const DamperCheck = z.object({
  /** Serial or name of the measured unit. */
  label: z.string().min(1).max(120).regex(plainLine, plainLineMessage),
  compression: DirectionCheck,
  rebound: DirectionCheck,
  pass: z.boolean(),
});
export type DamperCheck = z.infer<typeof DamperCheck>;

/** All dampers of one upload against one sheet. */
export const ConformityReport = z.object({
  dampers: z.array(DamperCheck).min(1),
  /** `pass` only when every point of every damper passes. */
  verdict: z.enum(['pass', 'fail']),
  passed: z.number().int().nonnegative(),
  failed: z.number().int().nonnegative(),
  /** How measured forces were read at the reference speeds, for the UI. */
  method: z.string(),
});
export type ConformityReport = z.infer<typeof ConformityReport>;

/** A stored conformity check (listed per sheet). */
export const ConformityRecord = z.object({
  id: Id,
  sheetId: Id,
  createdAt: IsoDateTime,
  createdBy: PersonRef,
  fileNames: z.array(z.string()),
  report: ConformityReport,
});
export type ConformityRecord = z.infer<typeof ConformityRecord>;

/** GET …/target-sheets — newest change first. */
export const TargetSheetsResponse = z.object({ sheets: z.array(TargetSheet) });
export type TargetSheetsResponse = z.infer<typeof TargetSheetsResponse>;

/**
 * A sheet with its history of status changes (oldest first) and, while it is not released, the
 * released sheet of the same setup that releasing it would supersede (null when there is none).
 */
export const TargetSheetDetail = z.object({ sheet: TargetSheet, history: z.array(TargetSheetEvent), replaces: TargetSheet.nullable() });
export type TargetSheetDetail = z.infer<typeof TargetSheetDetail>;

/**
 * Answer to a status change: the sheet, its history, who was e-mailed and, on release, the
 * caution that released targets change parts fitted to vehicles.
 */
export const TargetSheetTransitionResult = TargetSheetDetail.extend({
  /** How many people the change was e-mailed to. */
  notified: z.number().int().nonnegative(),
  notice: z.string().nullable(),
});
export type TargetSheetTransitionResult = z.infer<typeof TargetSheetTransitionResult>;

const ReferenceSpeeds = z
  .array(z.number().positive().max(20))
  .min(1, 'Give at least one reference speed')
  .max(32, 'At most 32 reference speeds')
  .refine((v) => new Set(v).size === v.length, 'Each reference speed once');

/** POST …/target-sheets — targets read off one revision's damper curve. */
export const CreateTargetSheetInput = z.object({
  setupId: Id,
  revision: z.number().int().positive(),
  /** Reference piston speeds, m/s; the shared default spread when left out. */
  speeds: ReferenceSpeeds.optional(),
  /** Band for every point (editable per point afterwards). */
  tolPct: z.number().min(0).max(100).optional(),
  floorN: z.number().nonnegative().max(1e5).optional(),
});
export type CreateTargetSheetInput = z.infer<typeof CreateTargetSheetInput>;

/** POST …/:sheetId/release — the lead's comment is stored on the sheet, in its history and in the audit log. */
export const ReleaseTargetSheetInput = z.object({
  comment: z.string().trim().max(2000, 'At most 2000 characters').regex(plainText, plainTextMessage).optional(),
});
export type ReleaseTargetSheetInput = z.infer<typeof ReleaseTargetSheetInput>;

/** POST …/:sheetId/return */
export const ReturnTargetSheetInput = z.object({
  reason: z.string().trim().min(1, 'Say why the sheet is sent back').max(2000, 'At most 2000 characters').regex(plainText, plainTextMessage),
});
export type ReturnTargetSheetInput = z.infer<typeof ReturnTargetSheetInput>;

/**
 * POST …/:sheetId/supersede — a new draft meant to replace a released sheet; the released sheet
 * stays in force until the draft is released. The targets are read from `revision` of the same
 * setup (its latest revision when left out) at the sheet's speeds and bands; naming the released
 * sheet's own revision copies its targets as they stand.
 */
export const SupersedeTargetSheetInput = z.object({ revision: z.number().int().positive().optional() });
export type SupersedeTargetSheetInput = z.infer<typeof SupersedeTargetSheetInput>;

/** One measured damper of a stored check: its label, file and the peak points read from it. */
export const MeasuredDamper = z.object({
  label: z.string(),
  fileName: z.string(),
  peaks: DynoPeakPoints,
  warnings: z.array(z.string()),
  /** The units the file was read in (checks kept before these were recorded have none). */
  units: DynoUnitsUsed.optional(),
});
export type MeasuredDamper = z.infer<typeof MeasuredDamper>;

/** A stored check with the measured points behind it (for the band plot). */
export const ConformityRecordDetail = ConformityRecord.extend({
  measured: z.array(MeasuredDamper),
  /** The sheet's status when the check was made (a check of a draft is not a release check). */
  sheetStatus: TargetSheetStatus,
});
export type ConformityRecordDetail = z.infer<typeof ConformityRecordDetail>;

/** GET …/:sheetId/checks — newest first. */
export const ConformityChecksResponse = z.object({ checks: z.array(ConformityRecordDetail) });
export type ConformityChecksResponse = z.infer<typeof ConformityChecksResponse>;

/** Most dyno files in one conformity upload (one file per physical damper). */
export const DYNO_CHECK_MAX_FILES = 12;

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);

const listOf = (v: unknown) => (v === undefined ? [] : Array.isArray(v) ? v : [v]);
/** A field repeated once per file, in file order; a blank entry means "not given for this file". */
const perFile = <T extends z.ZodType>(t: T) => z.preprocess(listOf, z.array(z.preprocess(blankToUndefined, t.optional()))).optional();

/**
 * Form fields beside the `file` parts of POST …/:sheetId/checks (multipart text). The reading
 * options apply to every file; `label` is repeated once per file in the same order (a blank or
 * missing label takes the file name without its extension). Dampers measured on different
 * benches come in different units and signs: `fileVelocityUnit`, `fileForceUnit` and `fileSign`
 * (the sign convention of motion and force) are repeated per file the same way and win over the
 * batch-wide option for their file (a unit in a column header still wins over both).
 */
export const DynoCheckFields = DynoUploadFields.extend({
  label: z.preprocess(listOf, z.array(z.preprocess(blankToUndefined, z.string().trim().max(120, 'A damper label has at most 120 characters').regex(plainLine, plainLineMessage).optional()))),
  fileVelocityUnit: perFile(VelocityUnit),
  fileForceUnit: perFile(ForceUnit),
  fileSign: perFile(SignConvention),
});
export type DynoCheckFields = z.infer<typeof DynoCheckFields>;
