import { randomBytes } from 'node:crypto';
import { inject } from 'vitest';
import { type Db, openDatabase } from '../../../server/db/database.ts';
import { adminQuery } from '../../../server/db/local-postgres.ts';
import { migrateToLatest } from '../../../server/db/migrator.ts';

/**
 * The database an API test app runs on. The `api` project uses a fresh in-memory SQLite
 * database; the `api-pg` project (RIDEWRIGHT_TEST_DATABASE=postgres) a fresh PostgreSQL database
 * copied from the migrated template that its global setup made, dropped again on close.
 */
export interface TestDatabase {
  db: Db;
  kind: 'sqlite' | 'postgres';
  /** Where a server process could open the same database (a file path or a postgres URL). */
  target: string;
  drop(): Promise<void>;
}

/**
 * A new database on the test cluster, copied from the migrated template (or empty with
 * `{ empty: true }`); returns its URL. For tests that need a database of a name they know.
 */
export async function createClusterDatabase(name: string, opts: { empty?: boolean } = {}): Promise<string> {
  const cluster = inject('postgresCluster');
  if (!cluster) throw new Error('a PostgreSQL test database needs the global setup of the api-pg or team project');
  await adminQuery(cluster.adminUrl, `create database ${name}${opts.empty ? '' : ` template ${cluster.template}`}`);
  return clusterDatabaseUrl(name);
}

/** The URL of a database `name` on the test cluster. */
export function clusterDatabaseUrl(name: string): string {
  return inject('postgresCluster')!.adminUrl.replace(/\/[^/]*$/, `/${name}`);
}

export async function openTestDatabase(): Promise<TestDatabase> {
  if (process.env.RIDEWRIGHT_TEST_DATABASE === 'postgres') {
    const cluster = inject('postgresCluster')!;
    const name = `t_${randomBytes(6).toString('hex')}`;
    const target = await createClusterDatabase(name);
    const db = openDatabase(target);
    return {
      db,
      kind: 'postgres',
      target,
      async drop() {
        await db.destroy();
        await adminQuery(cluster.adminUrl, `drop database if exists ${name} with (force)`);
      },
    };
  }
  const db = openDatabase(':memory:');
  const { error } = await migrateToLatest(db);
  if (error) throw error;
  return { db, kind: 'sqlite', target: ':memory:', drop: () => db.destroy() };
}

declare module 'vitest' {
  export interface ProvidedContext {
    postgresCluster: { adminUrl: string; template: string } | undefined;
  }
}
