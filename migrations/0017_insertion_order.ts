import { type Kysely, PostgresAdapter, sql } from 'kysely';

// Lists that show rows newest first break ties between rows stamped in the same millisecond by
// the order they were inserted in. SQLite has that order already (the implicit rowid); PostgreSQL
// has none, so there these tables get a `seq` column filled from a sequence (existing rows are
// numbered as the table holds them). On SQLite this migration changes nothing. Frozen once committed.

const tables = ['audit_log', 'outbox_message', 'run', 'target_sheet_event'];

export async function up(db: Kysely<any>): Promise<void> {
  if (!(db.getExecutor().adapter instanceof PostgresAdapter)) return;
  for (const table of tables) await sql`alter table ${sql.table(table)} add column seq bigserial`.execute(db);
}

export async function down(db: Kysely<any>): Promise<void> {
  if (!(db.getExecutor().adapter instanceof PostgresAdapter)) return;
  for (const table of tables) await sql`alter table ${sql.table(table)} drop column seq`.execute(db);
}
