import type { ShareObjectType, SharedObject } from '../../shared/schemas/share-link.ts';
import type { Queryable } from '../db/database.ts';
import { findRevisionById } from '../setups/setups.repository.ts';
import type { ShareLinkViewRow } from './share-links.repository.ts';
import { analyseSetup, parseStoredSetup } from '../setups/corner-figures.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { type Actor, insertNewSetup } from '../setups/setups.service.ts';
import { studyShare } from './study-share.service.ts';

/** How a link's object is described, shown and copied. Each shareable kind supplies one. */
export interface ShareableKind {
  /** Words and position of an object of `workspaceId`; undefined when it is not there (no link can be made). */
  describe(db: Queryable, workspaceId: string, objectId: string): Promise<{ label: string; setupId: string | null; revisionNumber: number | null } | undefined>;
  /** What the public page shows; undefined when the object is gone. */
  view(db: Queryable, link: ShareLinkViewRow): Promise<SharedObject | undefined>;
  /** A new object in `workspaceId` made from the shared one, in the caller's transaction. */
  copy(trx: Queryable, link: ShareLinkViewRow, workspaceId: string, actor: Actor, now: Date): Promise<Outcome<{ id: string; name: string }>>;
}

const setupRevision: ShareableKind = {
  async describe(db, workspaceId, objectId) {
    const r = await findRevisionById(db, objectId);
    if (!r || r.workspace_id !== workspaceId) return undefined;
    return { label: `${r.setup_name} · revision ${r.number}`, setupId: r.setup_id, revisionNumber: r.number };
  },

  async view(db, link) {
    const r = await findRevisionById(db, link.object_id);
    if (!r || r.workspace_id !== link.workspace_id) return undefined;
    const document = parseStoredSetup(r.document, `of revision ${r.id}`);
    const { modal, wheelRate } = analyseSetup(document);
    return {
      readOnly: true,
      objectType: 'setup_revision',
      workspaceName: link.workspace_name,
      sharedBy: link.created_by_name,
      sharedAt: link.created_at,
      expiresAt: link.expires_at,
      setupName: r.setup_name,
      revision: { number: r.number, message: r.message, createdAt: r.created_at, authorName: r.author_name },
      document,
      modal,
      wheelRate,
    };
  },

  async copy(trx, link, workspaceId, actor, now) {
    const r = await findRevisionById(trx, link.object_id);
    if (!r || r.workspace_id !== link.workspace_id) return fail('gone', 'What this link pointed to is no longer there.');
    const document = parseStoredSetup(r.document, `of revision ${r.id}`);
    const created = await insertNewSetup(
      trx,
      { workspaceId },
      actor,
      { document, message: `Copied from revision ${r.number} shared from ${link.workspace_name}` },
      { source: `copy:${link.id}`, action: 'setup.copied', verb: 'copied in, from a shared link,' },
      now,
    );
    return created.ok ? ok({ id: created.value.id, name: created.value.name }) : created;
  },
};

/** Kinds that can be shared today; a study joins by adding its entry. */
export const shareableKinds: Partial<Record<ShareObjectType, ShareableKind>> = { setup_revision: setupRevision, study: studyShare };
