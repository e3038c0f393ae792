import pg from 'pg';
import { CompiledQuery, type DatabaseConnection, Kysely, PostgresDialect, PostgresDriver, type TransactionSettings } from 'kysely';
import type { Database } from './database.ts';

// Counts and sums come back from PostgreSQL as int8/numeric, which `pg` hands over as strings to
// keep precision; every such value here (row counts, byte totals) fits a double, and the code
// above the repositories expects numbers as SQLite gives them.
pg.types.setTypeParser(pg.types.builtins.INT8, (v) => Number(v));
pg.types.setTypeParser(pg.types.builtins.NUMERIC, (v) => Number(v));

/**
 * One advisory-lock key held by every transaction. SQLite runs one writing transaction at a time
 * for the whole file, and the services were written to that rule (read a count or the latest
 * revision, then write); taking this lock at `begin` gives the same rule on PostgreSQL across
 * every server process, while plain reads outside transactions still run side by side.
 */
const WRITE_LOCK_KEY = 7_345_021;

class SerialWriteDriver extends PostgresDriver {
  override async beginTransaction(connection: DatabaseConnection, settings: TransactionSettings): Promise<void> {
    await super.beginTransaction(connection, settings);
    await connection.executeQuery(CompiledQuery.raw(`select pg_advisory_xact_lock(${WRITE_LOCK_KEY})`));
  }
}

class SerialWriteDialect extends PostgresDialect {
  constructor(private readonly poolConfig: { pool: pg.Pool }) {
    super(poolConfig);
  }

  override createDriver(): PostgresDriver {
    return new SerialWriteDriver(this.poolConfig);
  }
}

/** The URL with any password replaced, for logs and messages. */
export const withoutPassword = (target: string): string => target.replace(/^(postgres(?:ql)?:\/\/[^:/@]+):[^@]*@/i, '$1:***@');

export const isPostgresUrl = (target: string): boolean => /^postgres(ql)?:\/\//i.test(target);

/** Connects to the PostgreSQL database at `url` (nothing is sent until the first query). */
export function openPostgres(url: string, poolSize = 10): Kysely<Database> {
  const pool = new pg.Pool({ connectionString: url, max: poolSize });
  // An idle client that loses its server (restart, network) must not crash the process.
  pool.on('error', () => undefined);
  return new Kysely<Database>({ dialect: new SerialWriteDialect({ pool }) });
}
