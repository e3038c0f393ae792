import type { Insertable } from 'kysely';

export interface AuditLogTable {
  id: string;
  /** Null for account-level events that belong to no workspace. */
  workspace_id: string | null;
  actor_id: string;
  action: string;
  entity_type: string;
  entity_id: string;
  summary: string;
  at: string;
}
export type NewAuditLogRow = Insertable<AuditLogTable>;
