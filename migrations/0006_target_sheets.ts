import { type Kysely, sql } from 'kysely';

// Damper target sheets, their status history, and dyno conformity checks against them.
// `document` holds the editable body (directions with points and bands, gas force, notes) as
// JSON. A released sheet never changes again except for `superseded_by_id`, set once when a new
// sheet replaces it. A check keeps the uploaded texts as they came (`content`, JSON list of
// {label, filename, text}) and what was found (`result`). Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('target_sheet')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('number', 'text', (c) => c.notNull())
    .addColumn('setup_id', 'text', (c) => c.notNull().references('setup.id').onDelete('cascade'))
    .addColumn('revision_number', 'integer', (c) => c.notNull().check(sql`revision_number > 0`))
    .addColumn('document', 'text', (c) => c.notNull())
    .addColumn('status', 'text', (c) => c.notNull().check(sql`status in ('draft', 'in_review', 'released', 'returned')`))
    .addColumn('return_reason', 'text')
    .addColumn('author_id', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('submitted_at', 'text')
    .addColumn('decided_by', 'text', (c) => c.references('user.id'))
    .addColumn('decided_at', 'text')
    .addColumn('released_at', 'text')
    .addColumn('supersedes_id', 'text', (c) => c.references('target_sheet.id').onDelete('set null'))
    .addColumn('superseded_by_id', 'text', (c) => c.references('target_sheet.id').onDelete('set null'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('target_sheet_number_idx').on('target_sheet').columns(['workspace_id', 'number']).unique().execute();
  await db.schema.createIndex('target_sheet_workspace_idx').on('target_sheet').columns(['workspace_id', 'updated_at']).execute();

  // Every change of status, for the sheet's history (the audit log says the same in words).
  await db.schema
    .createTable('target_sheet_event')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('sheet_id', 'text', (c) => c.notNull().references('target_sheet.id').onDelete('cascade'))
    .addColumn('from_status', 'text')
    .addColumn('to_status', 'text', (c) => c.notNull())
    .addColumn('actor_id', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('reason', 'text')
    .addColumn('at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('target_sheet_event_sheet_idx').on('target_sheet_event').columns(['sheet_id', 'at']).execute();

  await db.schema
    .createTable('dyno_check')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('sheet_id', 'text', (c) => c.notNull().references('target_sheet.id').onDelete('cascade'))
    .addColumn('filename', 'text', (c) => c.notNull())
    .addColumn('content', 'text', (c) => c.notNull())
    .addColumn('result', 'text', (c) => c.notNull())
    .addColumn('uploaded_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('dyno_check_sheet_idx').on('dyno_check').columns(['sheet_id', 'created_at']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable('dyno_check').execute();
  await db.schema.dropTable('target_sheet_event').execute();
  await db.schema.dropTable('target_sheet').execute();
}
