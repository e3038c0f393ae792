import type { TestProject } from 'vitest/node';
import { openDatabase } from '../../../server/db/database.ts';
import { adminQuery, type LocalPostgres, startLocalPostgres } from '../../../server/db/local-postgres.ts';
import { migrateToLatest } from '../../../server/db/migrator.ts';

const TEMPLATE = 'ridewright_template';
let cluster: LocalPostgres | undefined;

/**
 * The `api-pg` project's PostgreSQL: a throwaway cluster (Debian's package) on 127.0.0.1, and a
 * template database migrated once that each test app copies (CREATE DATABASE … TEMPLATE).
 */
export async function setup(project: TestProject): Promise<void> {
  cluster = await startLocalPostgres({ fast: true });
  await adminQuery(cluster.url(), `create database ${TEMPLATE}`);
  const db = openDatabase(cluster.url(TEMPLATE));
  const { error } = await migrateToLatest(db);
  await db.destroy();
  if (error) throw error;
  project.provide('postgresCluster', { adminUrl: cluster.url(), template: TEMPLATE });
}

export async function teardown(): Promise<void> {
  await cluster?.stop();
}
