import { z } from 'zod';
import { plainLine, plainLineMessage } from './fields.ts';
import { RevisionMessage } from './setup-record.ts';
import { Setup } from './setup.ts';

/**
 * A measured drive: one corner's signals logged on the car, with the vehicle speed, put on an
 * even time grid. SI inside: s, m/s, m/s², m. Travel is positive in compression, accelerations
 * positive upward, as in the model.
 */

/** Signals a drive may carry beside time and speed (at least one is needed to fit anything). */
export const driveChannels = ['bodyAccel', 'wheelAccel', 'damperTravel', 'wheelTravel'] as const;
export const DriveChannel = z.enum(driveChannels);
export type DriveChannel = z.infer<typeof DriveChannel>;

/** Samples on an even grid: sample i is at t = i·dt from the first row of the file. */
export const DriveData = z.object({
  /** s. */
  dt: z.number().positive(),
  /** Vehicle speed, m/s. */
  speed: z.array(z.number()),
  channels: z.partialRecord(DriveChannel, z.array(z.number())),
});
export type DriveData = z.infer<typeof DriveData>;

/** A problem in the file, with the CSV line and column where it is. */
export const DriveIssue = z.object({
  line: z.number().int().positive().optional(),
  column: z.string().optional(),
  message: z.string(),
});
export type DriveIssue = z.infer<typeof DriveIssue>;

/** What the file held, kept beside it: unit read per column and a few figures. */
export const DriveSummary = z.object({
  rows: z.number().int().nonnegative(),
  samples: z.number().int().nonnegative(),
  duration: z.number().nonnegative(),
  /** Samples per second after resampling, Hz. */
  rate: z.number().positive(),
  /** Distance driven, m. */
  distance: z.number().nonnegative(),
  meanSpeed: z.number().nonnegative(),
  columns: z.array(z.object({ header: z.string(), quantity: z.enum(['time', 'speed', ...driveChannels]), unit: z.string() })),
  warnings: z.array(DriveIssue),
});
export type DriveSummary = z.infer<typeof DriveSummary>;

/** Largest drive file accepted, bytes (a minute of five signals at 1 kHz is about 4 MB). */
export const DRIVE_MAX_BYTES = 8 * 1024 * 1024;
/** Most data rows read from a drive file. */
export const DRIVE_MAX_ROWS = 200_000;

export const DriveUploadFields = z.object({
  note: z.string().trim().max(200, 'At most 200 characters').regex(plainLine, plainLineMessage).optional(),
});
export type DriveUploadFields = z.infer<typeof DriveUploadFields>;

export const DriveItem = z.object({
  id: z.string(),
  setupId: z.string(),
  filename: z.string(),
  bytes: z.number().int().nonnegative(),
  note: z.string().nullable(),
  uploadedBy: z.object({ id: z.string(), name: z.string() }),
  createdAt: z.string(),
  producedRevision: z.object({ id: z.string(), number: z.number().int() }).nullable(),
  summary: DriveSummary,
});
export type DriveItem = z.infer<typeof DriveItem>;

export const DrivesResponse = z.object({ drives: z.array(DriveItem) });
export type DrivesResponse = z.infer<typeof DrivesResponse>;

export const DriveDetail = DriveItem.extend({ data: DriveData });
export type DriveDetail = z.infer<typeof DriveDetail>;

/**
 * POST …/drives/:driveId/apply — saves a fitted corner as the next revision. The server adds the
 * drive's file name and id to the message, so every fitted revision cites its drive.
 */
export const ApplyDriveFitInput = z.object({
  setup: Setup,
  message: RevisionMessage,
  basedOn: z.number().int().positive().optional(),
});
export type ApplyDriveFitInput = z.infer<typeof ApplyDriveFitInput>;

export const ApplyDriveFitResult = z.object({ drive: DriveItem, revision: z.object({ id: z.string(), number: z.number().int().positive() }) });
export type ApplyDriveFitResult = z.infer<typeof ApplyDriveFitResult>;
