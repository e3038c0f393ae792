import type { Kysely } from 'kysely';

// Measured drives: a corner's signals logged on the car, kept against a setup for fitting the
// model to them. `content` is the file as received, `data` the signals read from it (JSON, SI, on
// an even time grid), `bytes` the stored size counted in the upload quota. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('drive')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('setup_id', 'text', (c) => c.notNull().references('setup.id').onDelete('cascade'))
    .addColumn('produced_revision_id', 'text', (c) => c.references('setup_revision.id').onDelete('set null'))
    .addColumn('filename', 'text', (c) => c.notNull())
    .addColumn('note', 'text')
    .addColumn('bytes', 'integer', (c) => c.notNull())
    .addColumn('content', 'text', (c) => c.notNull())
    .addColumn('summary', 'text', (c) => c.notNull())
    .addColumn('data', 'text', (c) => c.notNull())
    .addColumn('uploaded_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('drive_setup_idx').on('drive').columns(['setup_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('drive').execute();
}
