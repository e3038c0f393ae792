import { type Kysely, PostgresAdapter, sql } from 'kysely';

// Corner setups and their revisions, vehicles that group a front and a rear corner, and
// read-only share links. A revision's `document` is the JSON of the setup schema exactly as
// exported; revisions are immutable, which a trigger enforces below the application.
// Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable('vehicle')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('notes', 'text', (c) => c.notNull().defaultTo(''))
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .execute();
  await db.schema.createIndex('vehicle_workspace_idx').on('vehicle').column('workspace_id').execute();

  await db.schema
    .createTable('setup')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('name', 'text', (c) => c.notNull())
    .addColumn('vehicle_id', 'text', (c) => c.references('vehicle.id').onDelete('set null'))
    .addColumn('corner', 'text', (c) => c.check(sql`corner in ('front', 'rear')`))
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    // Who last changed the setup: a new revision, a rename, a regrouping or archiving.
    .addColumn('updated_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('updated_at', 'text', (c) => c.notNull())
    .addColumn('archived_at', 'text')
    .execute();
  await db.schema.createIndex('setup_workspace_idx').on('setup').columns(['workspace_id', 'updated_at']).execute();
  // One live setup per corner of a vehicle; archived setups keep their grouping for the record.
  await sql`create unique index setup_vehicle_corner_uq on setup (vehicle_id, corner) where vehicle_id is not null and corner is not null and archived_at is null`.execute(db);

  await db.schema
    .createTable('setup_revision')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('setup_id', 'text', (c) => c.notNull().references('setup.id').onDelete('cascade'))
    .addColumn('number', 'integer', (c) => c.notNull().check(sql`number >= 1`))
    .addColumn('document', 'text', (c) => c.notNull())
    .addColumn('message', 'text', (c) => c.notNull())
    .addColumn('author_id', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('source', 'text')
    .addUniqueConstraint('setup_revision_number_uq', ['setup_id', 'number'])
    .execute();
  if (db.getExecutor().adapter instanceof PostgresAdapter) {
    await sql`create function setup_revision_immutable() returns trigger language plpgsql as $$
      begin raise exception 'setup revisions are immutable: save a new revision instead'; end $$`.execute(db);
    await sql`create trigger setup_revision_immutable before update on setup_revision for each row execute function setup_revision_immutable()`.execute(db);
  } else {
    await sql`create trigger setup_revision_immutable before update on setup_revision begin select raise(abort, 'setup revisions are immutable: save a new revision instead'); end`.execute(db);
  }

  await db.schema
    .createTable('share_link')
    .addColumn('id', 'text', (c) => c.primaryKey())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('object_type', 'text', (c) => c.notNull().check(sql`object_type in ('setup_revision', 'study')`))
    .addColumn('object_id', 'text', (c) => c.notNull())
    .addColumn('token_hash', 'text', (c) => c.notNull().unique())
    .addColumn('created_by', 'text', (c) => c.notNull().references('user.id'))
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addColumn('expires_at', 'text')
    .addColumn('revoked_at', 'text')
    .execute();
  await db.schema.createIndex('share_link_workspace_idx').on('share_link').columns(['workspace_id', 'created_at']).execute();
  await db.schema.createIndex('share_link_object_idx').on('share_link').columns(['object_type', 'object_id']).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  if (db.getExecutor().adapter instanceof PostgresAdapter) {
    await sql`drop trigger if exists setup_revision_immutable on setup_revision`.execute(db);
    await sql`drop function if exists setup_revision_immutable()`.execute(db);
  } else {
    await sql`drop trigger if exists setup_revision_immutable`.execute(db);
  }
  for (const table of ['share_link', 'setup_revision', 'setup', 'vehicle']) {
    await db.schema.dropTable(table).execute();
  }
}
