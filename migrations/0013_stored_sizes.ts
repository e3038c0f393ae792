import { type Kysely, sql } from 'kysely';

// The stored size of bulky rows, kept beside them, so the upload quota is a sum of small numbers
// instead of a read of every stored file on each upload. Frozen once committed.

const tables = [
  { table: 'dyno_check', size: sql`length(cast(content as blob))` },
  { table: 'road', size: sql`length(cast(definition as blob))` },
  { table: 'road_version', size: sql`length(cast(definition as blob))` },
  { table: 'study', size: sql`length(cast(definition as blob)) + length(cast(base_document as blob)) + length(cast(roads as blob))` },
];

export async function up(db: Kysely<any>): Promise<void> {
  for (const { table, size } of tables) {
    await db.schema.alterTable(table).addColumn('bytes', 'integer', (c) => c.notNull().defaultTo(0)).execute();
    await sql`update ${sql.table(table)} set bytes = ${size}`.execute(db);
  }
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const { table } of tables) await db.schema.alterTable(table).dropColumn('bytes').execute();
}
