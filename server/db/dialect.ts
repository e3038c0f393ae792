import { PostgresAdapter, type RawBuilder, sql } from 'kysely';
import type { Queryable } from './database.ts';

/**
 * The few places where SQLite and PostgreSQL differ and a query has to say which it runs on.
 * Everything else (migrations, repositories) is written once in the SQL both accept.
 */
export type DatabaseKind = 'sqlite' | 'postgres';

export function databaseKind(db: Pick<Queryable, 'getExecutor'>): DatabaseKind {
  return db.getExecutor().adapter instanceof PostgresAdapter ? 'postgres' : 'sqlite';
}

/**
 * The order rows were inserted in, for a stable tie-break between rows stamped in the same
 * millisecond: SQLite's implicit `rowid`; on PostgreSQL the `seq` column that migration 0017
 * adds to the tables that need it (`alias` is the table name or its alias in the query).
 */
export function insertionOrder(db: Pick<Queryable, 'getExecutor'>, alias: string): RawBuilder<unknown> {
  return sql.ref(`${alias}.${databaseKind(db) === 'postgres' ? 'seq' : 'rowid'}`);
}

/** A unique or primary-key constraint refused the write (better-sqlite3 or pg error codes). */
export function isUniqueViolation(err: unknown): boolean {
  if (typeof err !== 'object' || err === null || !('code' in err)) return false;
  const code = (err as { code: unknown }).code;
  return code === 'SQLITE_CONSTRAINT_UNIQUE' || code === 'SQLITE_CONSTRAINT_PRIMARYKEY' || code === '23505';
}

/**
 * A text column read as its UTF-8 bytes (a Buffer from either driver), for documents that are
 * sent on as they are: megabytes decoded into a string and encoded back cost the request thread
 * far more than the copy.
 */
export function textAsBytes(db: Pick<Queryable, 'getExecutor'>, column: string): RawBuilder<Buffer> {
  return databaseKind(db) === 'postgres' ? sql<Buffer>`convert_to(${sql.ref(column)}, 'UTF8')` : sql<Buffer>`cast(${sql.ref(column)} as blob)`;
}

/** UTF-8 bytes written into a text column as text (the reverse of `textAsBytes`). */
export function bytesAsText(db: Pick<Queryable, 'getExecutor'>, bytes: Uint8Array): RawBuilder<string> {
  const buffer = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  return databaseKind(db) === 'postgres' ? sql<string>`convert_from(${buffer}, 'UTF8')` : sql<string>`cast(${buffer} as text)`;
}
