import { type Kysely, PostgresAdapter, sql } from 'kysely';

// Saved runs: what was driven (setup revision, road JSON with its seed, speed, duration, the full
// request), the figures as the browser computed them (JSON), and thinned traces as raw Float32
// bytes (column after column, little-endian). A run belongs to the revision it ran; deleting the
// setup deletes its runs, deleting a library road only unlinks it (the road JSON stays).
// Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  // 'double precision' is SQLite's REAL; binary columns are BLOB there and bytea on PostgreSQL.
  const binary = db.getExecutor().adapter instanceof PostgresAdapter ? 'bytea' : 'blob';
  await db.schema
    .createTable('run')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('setup_id', 'text', (c) => c.notNull().references('setup.id').onDelete('cascade'))
    .addColumn('revision_id', 'text', (c) => c.notNull().references('setup_revision.id').onDelete('cascade'))
    .addColumn('road_id', 'text', (c) => c.references('road.id').onDelete('set null'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('road', 'text', (c) => c.notNull())
    .addColumn('speed', 'double precision', (c) => c.notNull().check(sql`speed > 0`))
    .addColumn('duration', 'double precision', (c) => c.notNull().check(sql`duration > 0`))
    .addColumn('seed', 'integer')
    .addColumn('request', 'text', (c) => c.notNull())
    .addColumn('metrics', 'text', (c) => c.notNull())
    .addColumn('modal', 'text', (c) => c.notNull())
    // The rest of the run result: road summary, statics, linear corner, settle time, timing.
    .addColumn('result', 'text', (c) => c.notNull())
    // {"method","fullLength","length"} of the traces blob.
    .addColumn('trace_info', 'text', (c) => c.notNull())
    .addColumn('traces', binary, (c) => c.notNull())
    .addColumn('spectra_length', 'integer')
    .addColumn('spectra', binary)
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('run_workspace_idx').on('run').columns(['workspace_id', 'created_at']).execute();
  await db.schema.createIndex('run_setup_idx').on('run').columns(['setup_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('run').execute();
}
