import { insertionOrder } from '../db/dialect.ts';
import type { Queryable } from '../db/database.ts';
import type { NewAuditLogRow } from './audit.tables.ts';

export async function insertAuditEntry(db: Queryable, row: NewAuditLogRow): Promise<void> {
  await db.insertInto('audit_log').values(row).execute();
}

/** Newest first (insertion order breaks ties within a millisecond), with the actor's name; `before` pages backwards by timestamp. */
export function listAuditEntries(db: Queryable, workspaceId: string, limit: number, before?: string) {
  let q = db
    .selectFrom('audit_log')
    .innerJoin('user', 'user.id', 'audit_log.actor_id')
    .select([
      'audit_log.id',
      'audit_log.at',
      'audit_log.actor_id',
      'user.name as actor_name',
      'audit_log.action',
      'audit_log.entity_type',
      'audit_log.entity_id',
      'audit_log.summary',
    ])
    .where('audit_log.workspace_id', '=', workspaceId);
  if (before) q = q.where('audit_log.at', '<', before);
  return q.orderBy('audit_log.at', 'desc').orderBy(insertionOrder(db, 'audit_log'), 'desc').limit(limit).execute();
}
