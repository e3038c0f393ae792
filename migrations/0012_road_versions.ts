import type { Kysely } from 'kysely';

// Studies refer to library roads by id and version instead of keeping a copy of each. A road's
// `version` rises when its definition changes; a version some study still refers to is kept in
// `road_version` when it is replaced or the road is removed. `study.road_refs` holds, per road of
// the definition, `{ roadId, version }` (null for a road typed into the study); studies saved before
// this keep their copies in `study.roads` and have no refs. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('road').addColumn('version', 'integer', (c) => c.notNull().defaultTo(1)).execute();
  await db.schema
    .createTable('road_version')
    .addColumn('road_id', 'text', (c) => c.notNull())
    .addColumn('version', 'integer', (c) => c.notNull())
    .addColumn('workspace_id', 'text', (c) => c.notNull().references('workspace.id').onDelete('cascade'))
    .addColumn('definition', 'text', (c) => c.notNull())
    .addColumn('created_at', 'text', (c) => c.notNull())
    .addPrimaryKeyConstraint('road_version_pk', ['road_id', 'version'])
    .execute();
  await db.schema.alterTable('study').addColumn('road_refs', 'text').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('study').dropColumn('road_refs').execute();
  await db.schema.dropTable('road_version').execute();
  await db.schema.alterTable('road').dropColumn('version').execute();
}
