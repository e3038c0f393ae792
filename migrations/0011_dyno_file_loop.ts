import type { Kysely } from 'kysely';

// The force-velocity loop of a raw dyno record, kept when the file is read at upload so that
// opening the file never reads it again (JSON of the thinned loop; null for peak tables and for
// files kept before this column, which are filled in the first time they are opened).
// Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('dyno_file').addColumn('loop', 'text').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('dyno_file').dropColumn('loop').execute();
}
