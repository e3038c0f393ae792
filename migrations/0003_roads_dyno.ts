import { type Kysely, sql } from 'kysely';

// The road library (defined and measured road profiles) and damper dyno files uploaded against
// a setup. A road's `definition` is the JSON of the road schema; `summary` holds the figures
// shown in lists (length, sampling, fitted ISO 8608 class, waviness). A dyno file keeps the
// uploaded text as it came, the options it was read with and what the parser found, and links
// to the setup revision its fit produced. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('road')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('definition', 'text', (c) => c.notNull())
    .addColumn('source', 'text', (c) => c.notNull().check(sql`source in ('defined', 'measured')`))
    .addColumn('summary', 'text', (c) => c.notNull())
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('updated_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('road_workspace_idx').on('road').columns(['workspace_id', 'updated_at']).execute();

  await db.schema
    .createTable('dyno_file')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('setup_id', 'text', (c) => c.notNull().references('setup.id').onDelete('cascade'))
    .addColumn('produced_revision_id', 'text', (c) => c.references('setup_revision.id').onDelete('set null'))
    .addColumn('filename', 'text', (c) => c.notNull())
    .addColumn('bytes', 'integer', (c) => c.notNull())
    .addColumn('content', 'text', (c) => c.notNull())
    .addColumn('options', 'text', (c) => c.notNull())
    .addColumn('summary', 'text', (c) => c.notNull())
    .addColumn('uploaded_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('dyno_file_setup_idx').on('dyno_file').columns(['setup_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('dyno_file').execute();
  await db.schema.dropTable('road').execute();
}
