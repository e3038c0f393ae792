import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage } from './fields.ts';
import { IsoClass, Road, type RoadKind } from './road.ts';
import { PersonRef } from './setup-record.ts';

/**
 * A road saved in a workspace's library, as the API sends and takes it. The road itself is the
 * `Road` document (shared/schemas/road.ts); this file adds who, when, where it came from and the
 * figures shown beside it.
 */

export const roadSources = ['defined', 'measured'] as const;
/** `defined`: typed in from parameters; `measured`: uploaded as a profile CSV. */
export const RoadSource = z.enum(roadSources);
export type RoadSource = z.infer<typeof RoadSource>;

export const RoadName = z.string().trim().min(1, 'Required').max(120, 'At most 120 characters').regex(plainLine, plainLineMessage);

/** The ISO 8608 class and waviness fitted to the road's displacement PSD. */
export const RoadIsoFigures = z.object({
  className: IsoClass,
  /** Gd(n0) at n0 = 0.1 cycle/m, m³. */
  gdn0: z.number().positive(),
  /** Fitted exponent w of Gd(n) = Gd(n0)·(n/n0)^−w. */
  waviness: z.number(),
  /** Spatial band the fit used, cycle/m. */
  nMin: z.number().positive(),
  nMax: z.number().positive(),
});
export type RoadIsoFigures = z.infer<typeof RoadIsoFigures>;

/** Figures kept with a road for lists and its page. Distances in m. */
export const RoadFigures = z.object({
  /** Length of the profile (ISO: its period; events: the stretch previewed), m; null for a time-defined sweep. */
  length: z.number().nonnegative().nullable(),
  /** Grid step of a gridded profile (ISO, measured), m; null for closed-form shapes. */
  spacing: z.number().positive().nullable(),
  /** Raw points of a measured profile. */
  points: z.number().int().nonnegative().nullable(),
  /** ISO 8608 fit for random and measured roads; null for events and sines. */
  iso: RoadIsoFigures.nullable(),
  /** Why there is no ISO fit when one was tried (e.g. profile too short). */
  note: z.string().nullable(),
});
export type RoadFigures = z.infer<typeof RoadFigures>;

/** Every road kind, in the order the library offers them. */
export const roadKinds = ['iso8608', 'measured', 'sine', 'sweep', 'bump', 'pothole', 'kerb'] as const satisfies readonly RoadKind[];
export const RoadKindName = z.enum(roadKinds);

/** A road as listed: no definition (a measured profile can hold many points). */
export const RoadListItem = z.object({
  id: Id,
  name: z.string(),
  kind: RoadKindName,
  source: RoadSource,
  figures: RoadFigures,
  createdBy: PersonRef,
  createdAt: IsoDateTime,
  changedBy: PersonRef,
  changedAt: IsoDateTime,
});
export type RoadListItem = z.infer<typeof RoadListItem>;

/** GET /roads/:roadId — the road with its definition. */
export const RoadDetail = RoadListItem.extend({ definition: Road });
export type RoadDetail = z.infer<typeof RoadDetail>;

/** GET /roads — most recently changed first. */
export const RoadsResponse = z.object({ roads: z.array(RoadListItem) });
export type RoadsResponse = z.infer<typeof RoadsResponse>;

/** POST /roads — a road from its definition; the name defaults to the definition's own. */
export const CreateRoadInput = z.object({ name: RoadName, definition: Road });
export type CreateRoadInput = z.infer<typeof CreateRoadInput>;

/** PUT /roads/:roadId — rename and/or replace the definition (a measured road keeps its kind). */
export const UpdateRoadInput = z
  .object({ name: RoadName.optional(), definition: Road.optional() })
  .refine((u) => u.name !== undefined || u.definition !== undefined, { message: 'Nothing to change: give a name or a definition' });
export type UpdateRoadInput = z.infer<typeof UpdateRoadInput>;

/** How elevations in a measured CSV are scaled: from the header (`elevation [mm]`), or as given. */
export const ElevationUnit = z.enum(['m', 'mm']);
export type ElevationUnit = z.infer<typeof ElevationUnit>;

const blankToUndefined = (v: unknown) => (v === '' || v === null ? undefined : v);

/**
 * Form fields of POST /roads/measured (multipart, beside the `file`). Strings from the form are
 * coerced; blank fields mean "not given".
 */
export const MeasuredUploadFields = z.object({
  name: RoadName,
  /** Units of the columns; when given they win over units in the header. The elevation unit must come from one or the other. */
  distanceUnit: z.preprocess(blankToUndefined, ElevationUnit.optional()),
  elevationUnit: z.preprocess(blankToUndefined, ElevationUnit.optional()),
  detrend: z.preprocess(blankToUndefined, z.enum(['none', 'mean', 'linear']).optional()),
  /** Resampling step, m. */
  spacing: z.preprocess(blankToUndefined, z.coerce.number().positive().max(10).optional()),
});
export type MeasuredUploadFields = z.infer<typeof MeasuredUploadFields>;
