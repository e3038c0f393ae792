import { type Kysely, sql } from 'kysely';

// Platform tables: people, workspaces and who belongs where, one-time tokens, the audit log and
// the local mail sink's store. Timestamps are ISO-8601 text (UTC, `toISOString()`), which sorts
// correctly as text. Frozen once committed: later changes go in 0002+ files.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('user')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('email', 'text', (c) => c.notNull().unique())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('password_hash', 'text', (c) => c.notNull())
    .addColumn('session_version', 'integer', (c) => c.notNull().defaultTo(0))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();

  await db.schema
    .createTable('workspace')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();

  await db.schema
    .createTable('membership')
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('user_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('role', 'text', (c) => c.notNull().check(sql`role in ('viewer', 'engineer', 'lead', 'admin')`))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addPrimaryKeyConstraint('membership_pk', ['workspace_id', 'user_id'])
    .execute();
  await db.schema.createIndex('membership_user_idx').on('membership').column('user_id').execute();

  await db.schema
    .createTable('invitation')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('email', 'text', (c) => c.notNull())
    .addColumn('role', 'text', (c) => c.notNull().check(sql`role in ('viewer', 'engineer', 'lead', 'admin')`))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('invited_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('accepted_at', 'text')
    .execute();
  await db.schema.createIndex('invitation_workspace_idx').on('invitation').column('workspace_id').execute();

  await db.schema
    .createTable('password_reset')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('user_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('used_at', 'text')
    .execute();

  await db.schema
    .createTable('audit_log')
    .addColumn('id', 'text', (c) => c.primaryKey())
    // Null for account-level events (password change) that belong to no workspace.
    .addColumn('workspace_id', 'text', (c) => c.references('workspace.id').onDelete('cascade'))
    .addColumn('actor_id', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('action', 'text', (c) => c.notNull())
    .addColumn('entity_type', 'text', (c) => c.notNull())
    .addColumn('entity_id', 'text', (c) => c.notNull())
    .addColumn('summary', 'text', (c) => c.notNull())
    .addColumn('at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('audit_log_workspace_at_idx').on('audit_log').columns(['workspace_id', 'at']).execute();

  await db.schema
    .createTable('outbox_message')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('received_at', 'text', (c) => c.notNull())
    .addColumn('from_address', 'text', (c) => c.notNull())
    .addColumn('to_address', 'text', (c) => c.notNull())
    .addColumn('subject', 'text', (c) => c.notNull())
    .addColumn('text_body', 'text', (c) => c.notNull())
    .addColumn('html_body', 'text')
    .execute();
  await db.schema.createIndex('outbox_message_received_idx').on('outbox_message').column('received_at').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ['outbox_message', 'audit_log', 'password_reset', 'invitation', 'membership', 'workspace', 'user']) {
    await db.schema.dropTable(table).execute();
  }
}
