import type { Insertable } from 'kysely';

export type ShareObjectTypeColumn = 'setup_revision' | 'study';

/** A read-only link to one object. Only the SHA-256 of the token is kept; the token is shown once. */
export interface ShareLinkTable {
  id: string;
  workspace_id: string;
  object_type: ShareObjectTypeColumn;
  object_id: string;
  token_hash: string;
  created_by: string;
  created_at: string;
  expires_at: string | null;
  revoked_at: string | null;
}
export type NewShareLinkRow = Insertable<ShareLinkTable>;
