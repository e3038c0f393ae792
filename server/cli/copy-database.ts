import SQLite from 'better-sqlite3';
import { sql } from 'kysely';
import { openDatabase } from '../db/database.ts';
import { migrateToLatest } from '../db/migrator.ts';

export interface CopiedTable {
  table: string;
  rows: number;
}

const BATCH_ROWS = 500;
/** PostgreSQL takes at most 65 535 parameters in one statement. */
const MAX_PARAMETERS = 60_000;

interface ForeignKey {
  table: string;
  from: string;
}

/**
 * The tables of the SQLite file in an order that inserts every referenced row before the rows
 * that refer to it (read from SQLite's own foreign-key list, so a new migration needs no change
 * here). A column referring to its own table is returned apart: it is filled in a second pass.
 */
function tablesInOrder(source: SQLite.Database): { order: string[]; selfRefs: Map<string, string[]> } {
  const tables = source
    .prepare<[], { name: string }>(`select name from sqlite_master where type = 'table' and name not like 'sqlite_%' and name not like 'kysely_%'`)
    .all()
    .map((t) => t.name);
  const deps = new Map<string, Set<string>>();
  const selfRefs = new Map<string, string[]>();
  for (const table of tables) {
    const fks = source.prepare<[], ForeignKey>(`select "table", "from" from pragma_foreign_key_list('${table}')`).all();
    deps.set(table, new Set(fks.filter((f) => f.table !== table).map((f) => f.table)));
    const own = fks.filter((f) => f.table === table).map((f) => f.from);
    if (own.length) selfRefs.set(table, own);
  }
  const order: string[] = [];
  const placed = new Set<string>();
  while (order.length < tables.length) {
    const ready = tables.filter((t) => !placed.has(t) && [...deps.get(t)!].every((d) => placed.has(d)));
    if (!ready.length) throw new Error(`foreign keys form a cycle among: ${tables.filter((t) => !placed.has(t)).join(', ')}`);
    for (const t of ready.sort()) {
      order.push(t);
      placed.add(t);
    }
  }
  return { order, selfRefs };
}

/**
 * `npm run db:copy -- --to postgres://…`: copies every table of the SQLite database at `from`
 * into the PostgreSQL database at `to`, which must be empty (it is migrated to the same
 * version first). Rows go in their insertion order (so PostgreSQL's `seq` columns keep it),
 * in batches, all in one transaction: a failed copy leaves the target as empty as it was.
 * Afterwards every table's row count is compared; a difference is an error.
 */
export async function copySqliteToPostgres(from: string, to: string): Promise<CopiedTable[]> {
  const source = new SQLite(from, { fileMustExist: true, readonly: true });
  const sourceDb = openDatabase(from);
  const target = openDatabase(to);
  try {
    const sourceMigration = await migrateToLatest(sourceDb);
    if (sourceMigration.error) throw new Error(`the SQLite database could not be brought up to date: ${String(sourceMigration.error)}`);
    const targetMigration = await migrateToLatest(target);
    if (targetMigration.error) throw new Error(`the PostgreSQL database could not be migrated: ${String(targetMigration.error)}`);
    const { order, selfRefs } = tablesInOrder(source);

    for (const table of order) {
      const { rows } = await sql<{ n: number }>`select count(*) as n from ${sql.table(table)}`.execute(target);
      if (Number(rows[0].n) > 0) throw new Error(`the target is not empty: table ${table} has ${rows[0].n} rows; copy into a new, empty database`);
    }

    const copied: CopiedTable[] = [];
    await target.transaction().execute(async (trx) => {
      for (const table of order) {
        const own = selfRefs.get(table) ?? [];
        const columns = source.prepare(`select * from "${table}" limit 0`).columns().map((c) => c.name);
        const perBatch = Math.max(1, Math.min(BATCH_ROWS, Math.floor(MAX_PARAMETERS / columns.length)));
        const later: Record<string, unknown>[] = [];
        let batch: Record<string, unknown>[] = [];
        let count = 0;
        const flush = async () => {
          if (batch.length) await trx.insertInto(table as never).values(batch as never).execute();
          batch = [];
        };
        for (let row of source.prepare(`select * from "${table}" order by rowid`).iterate() as IterableIterator<Record<string, unknown>>) {
          if (own.some((c) => row[c] !== null)) {
            later.push(Object.fromEntries(['id', ...own].map((c) => [c, row[c]])));
            row = { ...row, ...Object.fromEntries(own.map((c) => [c, null])) };
          }
          batch.push(row);
          count++;
          if (batch.length >= perBatch) await flush();
        }
        await flush();
        for (const ref of later) {
          const { id, ...refs } = ref;
          await trx
            .updateTable(table as never)
            .set(refs as never)
            .where('id' as never, '=', id as never)
            .execute();
        }
        copied.push({ table, rows: count });
      }
    });

    for (const { table, rows } of copied) {
      const { rows: counted } = await sql<{ n: number }>`select count(*) as n from ${sql.table(table)}`.execute(target);
      if (Number(counted[0].n) !== rows) throw new Error(`table ${table}: ${rows} rows read but ${counted[0].n} in the target`);
    }
    return copied;
  } finally {
    source.close();
    await sourceDb.destroy();
    await target.destroy();
  }
}
