import { type Kysely, sql } from 'kysely';

// Who may read a message the local mail sink caught: its envelope recipients (one row each,
// lower-cased) and the workspace the message is about (null for account mail such as a
// password reset). The outbox shows a caller their own mail and, to a workspace's admins, the
// mail about that workspace. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('outbox_message').addColumn('workspace_id', 'text').execute();
  await db.schema
    .createTable('outbox_recipient')
    .addColumn('message_id', 'text', (c) => c.notNull().references('outbox_message.id').onDelete('cascade'))
    .addColumn('address', 'text', (c) => c.notNull())
    .addPrimaryKeyConstraint('outbox_recipient_pk', ['message_id', 'address'])
    .execute();
  await db.schema.createIndex('outbox_recipient_address_idx').on('outbox_recipient').column('address').execute();
  await db.schema.createIndex('outbox_message_workspace_idx').on('outbox_message').column('workspace_id').execute();
  // Earlier messages were sent to one plain address each; anything else stays visible to nobody.
  await sql`insert into outbox_recipient (message_id, address)
    select id, lower(trim(to_address)) from outbox_message
    where to_address <> '' and to_address not like '%,%' and to_address not like '%<%'`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('outbox_recipient').execute();
  await db.schema.dropIndex('outbox_message_workspace_idx').execute();
  await db.schema.alterTable('outbox_message').dropColumn('workspace_id').execute();
}
