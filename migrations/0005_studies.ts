import { type Kysely, sql } from 'kysely';

// Studies: a sweep of one or two parameters around a setup revision, run in the browser. The
// study keeps its definition, the base revision's document and the resolved roads as they
// were when it was made, so running it again gives the same results after the library
// changes. Each finished point is one study_point row: its swept values, the figures of every
// run (road × speed), the aggregated figures and objectives, and why it breaks a limit.
// Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('study')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('definition', 'text', (c) => c.notNull())
    .addColumn('base_setup_id', 'text', (c) => c.references('setup.id').onDelete('set null'))
    .addColumn('base_revision_id', 'text', (c) => c.references('setup_revision.id').onDelete('set null'))
    .addColumn('base_revision_number', 'integer', (c) => c.notNull().check(sql`base_revision_number >= 1`))
    .addColumn('base_document', 'text', (c) => c.notNull())
    .addColumn('roads', 'text', (c) => c.notNull())
    .addColumn('planned_points', 'integer', (c) => c.notNull())
    .addColumn('planned_runs', 'integer', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().check(sql`status in ('draft', 'complete', 'partial')`))
    // JSON summary of the last finished run (counts, who, when, best compromise, trade-off front).
    .addColumn('results', 'text')
    .addColumn('baseline_point_index', 'integer', (c) => c.check(sql`baseline_point_index >= 0`))
    .addColumn('chosen_by', 'text', (c) => c.references('user.id'))
    .addColumn('chosen_at', 'text')
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .addCheckConstraint('study_baseline_chosen', sql`(baseline_point_index is null) = (chosen_by is null) and (chosen_by is null) = (chosen_at is null)`)
    .execute();
  await db.schema.createIndex('study_workspace_idx').on('study').columns(['workspace_id', 'updated_at']).execute();

  await db.schema
    .createTable('study_point')
    .addColumn('study_id', 'text', (c) => c.notNull().references('study.id').onDelete('cascade'))
    // Sweep order; −1 is the unchanged base setup over the same roads and speeds.
    .addColumn('idx', 'integer', (c) => c.notNull().check(sql`idx >= -1`))
    .addColumn('params', 'text', (c) => c.notNull())
    // Figures of every run: JSON array of {roadIndex, speed, figures | null, error?}.
    .addColumn('metrics', 'text', (c) => c.notNull())
    .addColumn('figures', 'text', (c) => c.notNull())
    .addColumn('objectives', 'text', (c) => c.notNull())
    .addColumn('feasible', 'integer', (c) => c.notNull().check(sql`feasible in (0, 1)`))
    .addColumn('reasons', 'text', (c) => c.notNull())
    .addPrimaryKeyConstraint('study_point_pk', ['study_id', 'idx'])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('study_point').execute();
  await db.schema.dropTable('study').execute();
}
