import type { Kysely } from 'kysely';

// Each person's display units (damper velocity, rates, speed, length) as JSON text; null means
// the defaults. Stored values elsewhere stay SI. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('user').addColumn('unit_preferences', 'text').execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('user').dropColumn('unit_preferences').execute();
}
