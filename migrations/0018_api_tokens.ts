import type { Kysely } from 'kysely';

// Personal API tokens for scripts: one person, one workspace, a scope ('read' | 'write'), an
// expiry. Only the SHA-256 of the token is stored. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('api_token')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('user_id', 'text', (c) => c.notNull().references('user.id').onDelete('cascade'))
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('scope', 'text', (c) => c.notNull())
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text', (c) => c.notNull())
    .addColumn('last_used_at', 'text')
    .addColumn('revoked_at', 'text')
    .execute();
  await db.schema.createIndex('api_token_user_idx').on('api_token').columns(['user_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('api_token').execute();
}
