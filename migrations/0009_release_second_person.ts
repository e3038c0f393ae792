import type { Kysely } from 'kysely';

// A workspace setting: a target sheet is released only by a lead other than the one who wrote
// or submitted it (0 = off, 1 = on; off for every existing workspace). Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('workspace').addColumn('release_needs_second_person', 'integer', (c) => c.notNull().defaultTo(0)).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('workspace').dropColumn('release_needs_second_person').execute();
}
