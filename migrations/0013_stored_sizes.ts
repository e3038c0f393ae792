import { type Kysely, sql } from 'kysely';

// The stored size of bulky rows, kept beside them, so the upload quota is a sum of small numbers
// instead of a read of every stored file on each upload. Frozen once committed.

// octet_length: bytes of the UTF-8 text, the same figure on SQLite (3.43+) and PostgreSQL.
const tables = [
  { table: 'dyno_check', size: sql`octet_length(content)` },
  { table: 'road', size: sql`octet_length(definition)` },
  { table: 'road_version', size: sql`octet_length(definition)` },
  { table: 'study', size: sql`octet_length(definition) + octet_length(base_document) + octet_length(roads)` },
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
