import { type Kysely, sql } from 'kysely';

// At most one released target sheet in force per setup. A sheet supersedes the one in force when
// it is released (no longer when its replacement is drafted), and the release may carry the
// lead's comment. Existing data is brought in line first:
// - a released sheet marked superseded by a sheet that is not released is in force again;
// - where a setup still has several released sheets in force, the newest release stays in force
//   and each older one is marked superseded by it.
// Then a partial unique index keeps it so. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('target_sheet').addColumn('release_comment', 'text').execute();

  await sql`
    UPDATE target_sheet SET superseded_by_id = NULL
    WHERE superseded_by_id IS NOT NULL
      AND NOT EXISTS (SELECT 1 FROM target_sheet n WHERE n.id = target_sheet.superseded_by_id AND n.status = 'released')
  `.execute(db);

  await sql`
    UPDATE target_sheet SET superseded_by_id = (
      SELECT n.id FROM target_sheet n
      WHERE n.setup_id = target_sheet.setup_id AND n.status = 'released' AND n.superseded_by_id IS NULL
      ORDER BY n.released_at DESC, n.number DESC LIMIT 1
    )
    WHERE status = 'released' AND superseded_by_id IS NULL
      AND EXISTS (
        SELECT 1 FROM target_sheet n
        WHERE n.setup_id = target_sheet.setup_id AND n.status = 'released' AND n.superseded_by_id IS NULL
          AND (n.released_at > target_sheet.released_at OR (n.released_at = target_sheet.released_at AND n.number > target_sheet.number))
      )
  `.execute(db);

  await db.schema
    .createIndex('target_sheet_one_in_force')
    .on('target_sheet')
    .column('setup_id')
    .unique()
    .where(sql.ref('status'), '=', 'released')
    .where(sql.ref('superseded_by_id'), 'is', null)
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropIndex('target_sheet_one_in_force').execute();
  await db.schema.alterTable('target_sheet').dropColumn('release_comment').execute();
}
