import type { SharedObject } from '../../shared/schemas/share-link.ts';
import type { Actor } from '../core/actor.ts';
import type { Outcome } from '../core/outcome.ts';
import type { Queryable } from '../db/database.ts';
import type { ShareLinkViewRow } from './share-links.repository.ts';

/** How a link's object is described, shown and copied. Each shareable kind supplies one. */
export interface ShareableKind {
  /** Words and position of an object of `workspaceId`; undefined when it is not there (no link can be made). */
  describe(db: Queryable, workspaceId: string, objectId: string): Promise<{ label: string; setupId: string | null; revisionNumber: number | null } | undefined>;
  /** What the public page shows; undefined when the object is gone. */
  view(db: Queryable, link: ShareLinkViewRow): Promise<SharedObject | undefined>;
  /** A new object in `workspaceId` made from the shared one, in the caller's transaction. */
  copy(trx: Queryable, link: ShareLinkViewRow, workspaceId: string, actor: Actor, now: Date): Promise<Outcome<{ id: string; name: string }>>;
}
