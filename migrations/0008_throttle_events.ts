import type { Kysely } from 'kysely';

// Counted actions for limits that must hold across server processes and restarts (invitations
// sent, password changes, failed sign-ins per account): one row per action, keyed by what the
// limit counts ("invite:user:<id>", "signin:account:<email>", …). Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('throttle_event')
    .addColumn('key', 'text', (c) => c.notNull())
    .addColumn('at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('throttle_event_key_at_idx').on('throttle_event').columns(['key', 'at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('throttle_event').execute();
}
