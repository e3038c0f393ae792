import { randomUUID } from 'node:crypto';
import type { AuditQuery, AuditResponse } from '../../shared/schemas/audit.ts';
import type { Queryable } from '../db/database.ts';
import { insertAuditEntry, listAuditEntries } from './audit.repository.ts';

export interface AuditEvent {
  /** Null for account-level events that belong to no workspace. */
  workspaceId: string | null;
  actorId: string;
  /** Dotted `<entity>.<what happened>`, e.g. `member.role_changed`, `setup.revised`. */
  action: string;
  entityType: string;
  entityId: string;
  /** One plain sentence an admin can read without looking anything up. */
  summary: string;
  at: Date;
}

/**
 * Writes one audit entry. Call it with the transaction that makes the change, so the change
 * and its entry are saved together or not at all.
 */
export async function recordAudit(db: Queryable, event: AuditEvent): Promise<void> {
  await insertAuditEntry(db, {
    id: randomUUID(),
    workspace_id: event.workspaceId,
    actor_id: event.actorId,
    action: event.action,
    entity_type: event.entityType,
    entity_id: event.entityId,
    summary: event.summary,
    at: event.at.toISOString(),
  });
}

export async function listAudit(db: Queryable, workspaceId: string, query: AuditQuery): Promise<AuditResponse> {
  const rows = await listAuditEntries(db, workspaceId, query.limit, query.before ? new Date(query.before).toISOString() : undefined);
  return {
    entries: rows.map((r) => ({
      id: r.id,
      at: r.at,
      actor: { id: r.actor_id, name: r.actor_name },
      action: r.action,
      entityType: r.entity_type,
      entityId: r.entity_id,
      summary: r.summary,
    })),
  };
}
