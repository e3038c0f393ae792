import type { Kysely } from 'kysely';

// An account proves its address by a mailed link before it may accept invitations or read mail
// sent to that address in the demo outbox. Accounts made before this are taken as verified (they
// signed up when no proof was asked, or joined by an invitation mailed to them). Only the SHA-256
// of a verification token is stored. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('user').addColumn('email_verified_at', 'text').execute();
  await db.updateTable('user').set((eb) => ({ email_verified_at: eb.ref('created_at') })).execute();
  await db.schema
    .createTable('email_verification')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('user_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('used_at', 'text')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('email_verification').execute();
  await db.schema.alterTable('user').dropColumn('email_verified_at').execute();
}
