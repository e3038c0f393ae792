import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage, plainText, plainTextMessage } from './fields.ts';
import { Setup } from './setup.ts';

/**
 * A stored corner setup and its revisions, as the API sends and takes them. The corner itself
 * is the `Setup` document (shared/schemas/setup.ts); this file adds who, when, which revision
 * and how setups are grouped into vehicles.
 */

export const corners = ['front', 'rear'] as const;
export const Corner = z.enum(corners);
export type Corner = z.infer<typeof Corner>;

export const PersonRef = z.object({ id: Id, name: z.string() });
export type PersonRef = z.infer<typeof PersonRef>;

/** Name of a setup in lists and on its page. */
export const SetupName = z.string().trim().min(1, 'Required').max(120, 'At most 120 characters').regex(plainLine, plainLineMessage);

/** What a revision says about itself ("softer rebound above 0.3 m/s"). */
export const RevisionMessage = z.string().trim().max(500, 'At most 500 characters').regex(plainText, plainTextMessage);

/** One saved revision without its document. Numbers count 1, 2, 3… per setup. */
export const RevisionSummary = z.object({
  id: Id,
  number: z.number().int().positive(),
  message: z.string(),
  author: PersonRef,
  createdAt: IsoDateTime,
  /** 'import', 'restore:<n>', 'copy:<share link id>', 'dyno-fit:<file id>', 'study:<id>'; null for a plain save. */
  source: z.string().nullable(),
});
export type RevisionSummary = z.infer<typeof RevisionSummary>;

/** One revision with its document, exactly as it was saved. */
export const SetupRevision = RevisionSummary.extend({ setupId: Id, document: Setup });
export type SetupRevision = z.infer<typeof SetupRevision>;

/** Linear figures of the latest revision, for lists (modal analysis of the simulation core). */
export const CornerFigures = z.object({
  /** Body mode natural frequency |λ|/2π, Hz. */
  bodyHz: z.number(),
  /** Wheel-hop natural frequency, Hz. */
  wheelHopHz: z.number(),
  bodyDampingRatio: z.number(),
  /** Wheel rate springRate·MR² (plus the gas rate at static), N/m. */
  wheelRate: z.number(),
});
export type CornerFigures = z.infer<typeof CornerFigures>;

export const VehicleRef = z.object({ id: Id, name: z.string() });
export type VehicleRef = z.infer<typeof VehicleRef>;

/** A setup as listed: its latest revision number and who changed it last. */
export const SetupSummary = z.object({
  id: Id,
  name: z.string(),
  vehicle: VehicleRef.nullable(),
  corner: Corner.nullable(),
  latestRevision: z.number().int().positive(),
  latestMessage: z.string(),
  createdAt: IsoDateTime,
  createdBy: PersonRef,
  changedAt: IsoDateTime,
  changedBy: PersonRef,
  archivedAt: IsoDateTime.nullable(),
  figures: CornerFigures.nullable(),
});
export type SetupSummary = z.infer<typeof SetupSummary>;

/** GET /setups/:setupId — the setup and its latest revision. */
export const SetupDetail = SetupSummary.extend({ revision: SetupRevision });
export type SetupDetail = z.infer<typeof SetupDetail>;

/** GET /setups — newest change first. */
export const SetupsResponse = z.object({ setups: z.array(SetupSummary) });
export type SetupsResponse = z.infer<typeof SetupsResponse>;

/** Query of GET /setups: archived setups are left out unless asked for. */
export const SetupsQuery = z.object({ archived: z.enum(['exclude', 'include', 'only']).default('exclude') });
export type SetupsQuery = z.infer<typeof SetupsQuery>;

/** Revisions per page of GET /setups/:setupId/revisions, unless the caller asks for fewer. */
export const REVISIONS_PAGE = 100;

/** GET /setups/:setupId/revisions?limit=&before= — a page, newest first, older than `before`. */
export const RevisionsQuery = z.object({
  limit: z.coerce.number().int().min(1).max(500).default(REVISIONS_PAGE),
  /** Only revisions numbered below this one (the previous page's `nextBefore`). */
  before: z.coerce.number().int().min(2).optional(),
});
export type RevisionsQuery = z.infer<typeof RevisionsQuery>;

/** A page of revisions, newest first; `nextBefore` fetches the next older page (null: none left). */
export const RevisionsResponse = z.object({ revisions: z.array(RevisionSummary), nextBefore: z.number().int().nullable() });
export type RevisionsResponse = z.infer<typeof RevisionsResponse>;

/** POST /setups — a new setup with its first revision; the setup takes the document's name. */
export const CreateSetupInput = z.object({
  setup: Setup,
  vehicleId: Id.nullable().optional(),
  corner: Corner.nullable().optional(),
  message: RevisionMessage.optional(),
});
export type CreateSetupInput = z.infer<typeof CreateSetupInput>;

/**
 * POST /setups/:setupId/revisions — save the draft as the next revision. `basedOn` is the
 * revision the draft was edited from; when someone saved in between, the server refuses (409)
 * rather than silently stacking one edit on another.
 */
export const SaveRevisionInput = z.object({
  setup: Setup,
  message: RevisionMessage.pipe(z.string().min(1, 'Say in a few words what changed')),
  basedOn: z.number().int().positive().optional(),
});
export type SaveRevisionInput = z.infer<typeof SaveRevisionInput>;

/** POST /setups/:setupId/revisions/:number/restore — the old document becomes the next revision. */
export const RestoreRevisionInput = z.object({ message: RevisionMessage.optional() });
export type RestoreRevisionInput = z.infer<typeof RestoreRevisionInput>;

/** PATCH /setups/:setupId — the setup's own facts; never its revisions. */
export const UpdateSetupInput = z
  .object({
    name: SetupName.optional(),
    vehicleId: Id.nullable().optional(),
    corner: Corner.nullable().optional(),
    archived: z.boolean().optional(),
  })
  .refine((v) => Object.values(v).some((x) => x !== undefined), { message: 'Nothing to change', path: [] });
export type UpdateSetupInput = z.infer<typeof UpdateSetupInput>;

/** Query of POST /setups/import: the body is the setup file itself; these place it. */
export const ImportSetupQuery = z.object({
  vehicleId: Id.optional(),
  corner: Corner.optional(),
});
export type ImportSetupQuery = z.infer<typeof ImportSetupQuery>;

/** File name of an exported revision: "brume-pipit-front-r3.setup.json". */
export function setupFileName(name: string, revision: number): string {
  const stem = name
    .normalize('NFKD')
    .replace(/[^\w\s-]/g, '')
    .trim()
    .toLowerCase()
    .replace(/[\s_-]+/g, '-')
    .slice(0, 60);
  return `${stem || 'setup'}-r${revision}.setup.json`;
}
