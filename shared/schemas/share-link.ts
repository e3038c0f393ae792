import { z } from 'zod';
import { Id, IsoDateTime } from './fields.ts';
import { ModalResult } from './modal.ts';
import { PersonRef } from './setup-record.ts';
import { Setup } from './setup.ts';
import { SharedStudy } from './study-record.ts';

/**
 * Read-only share links. A link names exactly one object (a setup revision, or a study); its
 * token is random (32 bytes, base64url), stored only as a SHA-256 and shown once.
 */

export const shareObjectTypes = ['setup_revision', 'study'] as const;
export const ShareObjectType = z.enum(shareObjectTypes);
export type ShareObjectType = z.infer<typeof ShareObjectType>;

/** A token as it appears in `/shared/:token` (43 base64url characters for 32 bytes). */
export const ShareToken = z.string().regex(/^[A-Za-z0-9_-]{43,128}$/, 'Not a share link token');

/** POST /share-links. `expiresAt` in the future, or null/absent for a link that lasts until revoked. */
export const CreateShareLinkInput = z.object({
  objectType: ShareObjectType,
  objectId: Id,
  expiresAt: IsoDateTime.nullable().optional(),
});
export type CreateShareLinkInput = z.infer<typeof CreateShareLinkInput>;

export const ShareLinkState = z.enum(['active', 'expired', 'revoked']);
export type ShareLinkState = z.infer<typeof ShareLinkState>;

export const ShareLink = z.object({
  id: Id,
  objectType: ShareObjectType,
  objectId: Id,
  /** What the link opens, in words ("Brume Pipit front · revision 3"). */
  label: z.string(),
  /** For setup revisions: the setup and revision number, so a setup page can list its links. */
  setupId: Id.nullable(),
  revisionNumber: z.number().int().positive().nullable(),
  createdBy: PersonRef,
  createdAt: IsoDateTime,
  expiresAt: IsoDateTime.nullable(),
  revokedAt: IsoDateTime.nullable(),
  state: ShareLinkState,
});
export type ShareLink = z.infer<typeof ShareLink>;

/** Answer to POST /share-links: the token is in this answer and nowhere else, ever. */
export const CreatedShareLink = z.object({ link: ShareLink, token: ShareToken, path: z.string() });
export type CreatedShareLink = z.infer<typeof CreatedShareLink>;

/** GET /share-links?setupId= — newest first. */
export const ShareLinksResponse = z.object({ links: z.array(ShareLink) });
export type ShareLinksResponse = z.infer<typeof ShareLinksResponse>;

export const ShareLinksQuery = z.object({ setupId: Id.optional() });
export type ShareLinksQuery = z.infer<typeof ShareLinksQuery>;

/** GET /api/shared/:token for a setup revision: everything the public page shows, nothing more. */
export const SharedSetupRevision = z.object({
  readOnly: z.literal(true),
  objectType: z.literal('setup_revision'),
  workspaceName: z.string(),
  sharedBy: z.string(),
  sharedAt: IsoDateTime,
  expiresAt: IsoDateTime.nullable(),
  setupName: z.string(),
  revision: z.object({ number: z.number().int().positive(), message: z.string(), createdAt: IsoDateTime, authorName: z.string() }),
  document: Setup,
  /** null when the linear analysis cannot resolve the corner (see `analyseSetup` on the server). */
  modal: ModalResult.nullable(),
  /** Wheel rate used by the analysis, N/m. */
  wheelRate: z.number(),
});
export type SharedSetupRevision = z.infer<typeof SharedSetupRevision>;

/** Every kind of shared object (the study view is in study-record.ts). */
export const SharedObject = z.discriminatedUnion('objectType', [SharedSetupRevision, SharedStudy]);
export type SharedObject = z.infer<typeof SharedObject>;

/** POST /api/shared/:token/copy */
export const CopySharedInput = z.object({ workspaceId: Id });
export type CopySharedInput = z.infer<typeof CopySharedInput>;

/** Answer to POST /api/shared/:token/copy: the new object in the chosen workspace. */
export const CopiedShared = z.object({ objectType: ShareObjectType, workspaceId: Id, id: Id, name: z.string() });
export type CopiedShared = z.infer<typeof CopiedShared>;
