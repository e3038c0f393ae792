import { sql } from 'kysely';
import type { Queryable } from '../db/database.ts';
import type { NewOutboxMessageRow, OutboxMessageRow } from '../db/outbox-message-table.ts';

export async function insertOutboxMessage(db: Queryable, row: NewOutboxMessageRow): Promise<void> {
  await db.insertInto('outbox_message').values(row).execute();
}

export function listOutboxMessages(db: Queryable, limit: number): Promise<OutboxMessageRow[]> {
  return db.selectFrom('outbox_message').selectAll().orderBy('received_at', 'desc').orderBy(sql`rowid`, 'desc').limit(limit).execute();
}
