import type { Kysely } from 'kysely';

// A study run on the team's workers (Redis queue): one row per study, its state and counters.
// The points themselves go to study_point, keyed by (study_id, idx), so a retried chunk never
// writes a point twice. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('study_fleet_run')
    .addColumn('study_id', 'text', (c) => c.primaryKey().references('study.id').onDelete('cascade'))
    .addColumn('workspace_id', 'text', (c) => c.notNull())
    .addColumn('generation', 'integer', (c) => c.notNull())
    .addColumn('state', 'text', (c) => c.notNull())
    .addColumn('chunk_units', 'integer', (c) => c.notNull())
    .addColumn('chunks', 'integer', (c) => c.notNull())
    .addColumn('units_total', 'integer', (c) => c.notNull())
    .addColumn('units_done', 'integer', (c) => c.notNull())
    .addColumn('runs_total', 'integer', (c) => c.notNull())
    .addColumn('runs_done', 'integer', (c) => c.notNull())
    .addColumn('runs_at_start', 'integer', (c) => c.notNull())
    .addColumn('error', 'text')
    .addColumn('started_by', 'text', (c) => c.notNull())
    .addColumn('started_at', 'text', (c) => c.notNull())
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .addColumn('finished_at', 'text')
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('study_fleet_run').execute();
}
