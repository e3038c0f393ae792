import { type Kysely, PostgresAdapter, sql } from 'kysely';

// The road list shows each road's kind. It was read out of the stored definition document, which
// for a measured road is megabytes of points that the database parsed on every list. The kind now
// has its own column, filled from the document once here. Frozen once committed.

export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('road').addColumn('kind', 'text', (c) => c.notNull().defaultTo('')).execute();
  const kindOf = db.getExecutor().adapter instanceof PostgresAdapter ? sql`(definition::json ->> 'kind')` : sql`json_extract(definition, '$.kind')`;
  await sql`update road set kind = ${kindOf}`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable('road').dropColumn('kind').execute();
}
