import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, renameSync, statSync, unlinkSync } from 'node:fs';
import { join } from 'node:path';
import pg from 'pg';
import { postgresBinDir } from '../db/local-postgres.ts';
import { migrations } from '../db/migrator.ts';
import { withoutPassword } from '../db/postgres.ts';
import type { BackupResult } from './backup-database.ts';

/** `ridewright-2024-05-01T12-30-05-123Z.dump`: sorts by time, safe in any file system. */
const dumpFileName = (at: Date) => `ridewright-${at.toISOString().replaceAll(':', '-').replace('.', '-')}.dump`;

/** pg_dump / pg_restore of the newest installed PostgreSQL, else whatever is on PATH. */
function tool(name: 'pg_dump' | 'pg_restore'): string {
  const bin = postgresBinDir();
  return bin && existsSync(join(bin, name)) ? join(bin, name) : name;
}

function run(name: 'pg_dump' | 'pg_restore', args: string[]): { ok: boolean; output: string } {
  const result = spawnSync(tool(name), args, { encoding: 'utf8' });
  if (result.error) return { ok: false, output: `${name} could not run (${result.error.message}); install Debian's postgresql-client` };
  return { ok: result.status === 0, output: `${result.stderr}${result.stdout}`.trim() };
}

/**
 * `npm run backup` on PostgreSQL: `pg_dump` in its custom format, which reads one consistent
 * snapshot while the servers keep writing. Written under a `.partial` name, read back with
 * `pg_restore --list` (a whole, readable archive), and only then given its final name.
 */
export function backupPostgres(url: string, outDir: string, now: Date = new Date()): BackupResult {
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, dumpFileName(now));
  const partial = `${path}.partial`;
  const dump = run('pg_dump', ['--format=custom', '--no-owner', '--no-privileges', `--file=${partial}`, url]);
  if (!dump.ok) {
    if (existsSync(partial)) unlinkSync(partial);
    throw new Error(`pg_dump of ${withoutPassword(url)} failed: ${dump.output}`);
  }
  const list = run('pg_restore', ['--list', partial]);
  if (!list.ok || !list.output.includes('kysely_migration')) {
    unlinkSync(partial);
    throw new Error(`the dump could not be read back: ${list.output.slice(0, 500)}`);
  }
  renameSync(partial, path);
  return { path, bytes: statSync(path).size };
}

/**
 * `npm run restore -- <file.dump>` on PostgreSQL: refuses while any other session is connected
 * to the database (stop every server process first) and when the dump holds migrations this
 * code does not know; then `pg_restore --clean --if-exists --single-transaction`, so a failed
 * restore leaves the database as it was.
 */
export async function restorePostgres(file: string, url: string): Promise<{ ok: true; pending: string[] } | { ok: false; reason: string }> {
  if (!existsSync(file)) return { ok: false, reason: `${file} does not exist` };
  const list = run('pg_restore', ['--list', file]);
  if (!list.ok) return { ok: false, reason: `${file} is not a PostgreSQL dump pg_restore can read: ${list.output.slice(0, 300)}` };
  if (!list.output.includes('kysely_migration')) return { ok: false, reason: `${file} has no kysely_migration table: it is not a Ridewright database` };

  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    const others = await client.query<{ n: string }>('select count(*) as n from pg_stat_activity where datname = current_database() and pid <> pg_backend_pid()');
    if (Number(others.rows[0].n) > 0) return { ok: false, reason: `${withoutPassword(url)} is in use by ${others.rows[0].n} other connection(s): stop every server process first, then restore` };
  } finally {
    await client.end();
  }

  const restored = run('pg_restore', ['--clean', '--if-exists', '--no-owner', '--no-privileges', '--single-transaction', `--dbname=${url}`, file]);
  if (!restored.ok) return { ok: false, reason: `pg_restore failed, the database is unchanged: ${restored.output.slice(0, 500)}` };

  const after = new pg.Client({ connectionString: url });
  await after.connect();
  try {
    const applied = (await after.query<{ name: string }>('select name from kysely_migration order by name')).rows.map((r) => r.name);
    const known = Object.keys(migrations);
    const unknown = applied.filter((n) => !known.includes(n));
    if (unknown.length) return { ok: false, reason: `restored, but made by a newer Ridewright (migrations ${unknown.join(', ')} are unknown here); update the code before starting it` };
    return { ok: true, pending: known.filter((n) => !applied.includes(n)) };
  } finally {
    await after.end();
  }
}
