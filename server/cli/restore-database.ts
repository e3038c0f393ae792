import { closeSync, copyFileSync, existsSync, fsyncSync, openSync, renameSync, statSync } from 'node:fs';
import { resolve } from 'node:path';
import SQLite from 'better-sqlite3';
import { migrations } from '../db/migrator.ts';

/** What a backup file holds, or why it cannot be restored. */
export type BackupCheck =
  | { ok: true; migrations: string[]; pending: string[]; bytes: number }
  | { ok: false; reason: string };

const MIGRATION_TABLE = 'kysely_migration';

/**
 * Opens `file` read-only and checks it can replace the live database: SQLite's integrity_check
 * passes, Kysely's migration table is there, and it names no migration this code does not have
 * (a copy made by a newer version would be opened by code that does not understand it).
 * Migrations it lacks are fine: they run at the next start.
 */
export function checkBackupFile(file: string): BackupCheck {
  if (!existsSync(file)) return { ok: false, reason: `${file} does not exist` };
  let db: SQLite.Database;
  try {
    db = new SQLite(file, { readonly: true, fileMustExist: true });
  } catch (err) {
    return { ok: false, reason: `${file} is not an SQLite database (${(err as Error).message})` };
  }
  try {
    let check: unknown;
    try {
      check = db.pragma('integrity_check', { simple: true });
    } catch (err) {
      return { ok: false, reason: `${file} is not a readable SQLite database (${(err as Error).message})` };
    }
    if (check !== 'ok') return { ok: false, reason: `${file} failed integrity_check: ${String(check)}` };
    const table = db.prepare(`select name from sqlite_master where type = 'table' and name = ?`).get(MIGRATION_TABLE);
    if (!table) return { ok: false, reason: `${file} has no ${MIGRATION_TABLE} table: it is not a Ridewright database` };
    const applied = db.prepare<[], { name: string }>(`select name from ${MIGRATION_TABLE} order by name`).all().map((r) => r.name);
    const known = Object.keys(migrations);
    const unknown = applied.filter((n) => !known.includes(n));
    if (unknown.length) return { ok: false, reason: `${file} was made by a newer Ridewright (migrations ${unknown.join(', ')} are unknown here); update the code first` };
    return { ok: true, migrations: applied, pending: known.filter((n) => !applied.includes(n)), bytes: statSync(file).size };
  } finally {
    db.close();
  }
}

export interface RestoreResult {
  restored: string;
  /** Where the database that was live went (null when there was none). */
  previous: string | null;
  pending: string[];
}

/**
 * Puts `backupFile` in place of the database at `dbPath`. Refuses while any process has the
 * live database open (the server must be stopped): an exclusive lock is taken with no waiting.
 * The live database is checkpointed into one file and kept beside it as
 * `<db>.before-restore-<time>`; the backup is copied to `<db>.restoring`, flushed, and renamed
 * over `<db>`, so a crash part-way leaves either the old file set aside or the new one whole.
 */
export function restoreDatabase(backupFile: string, dbPath: string, now: Date = new Date()): { ok: true; value: RestoreResult } | { ok: false; reason: string } {
  const check = checkBackupFile(backupFile);
  if (!check.ok) return check;
  if (resolve(backupFile) === resolve(dbPath)) return { ok: false, reason: 'the backup is the live database itself' };
  let previous: string | null = null;
  if (existsSync(dbPath)) {
    const live = new SQLite(dbPath, { fileMustExist: true });
    try {
      live.pragma('busy_timeout = 0');
      live.pragma('locking_mode = EXCLUSIVE');
      try {
        live.exec('BEGIN EXCLUSIVE; COMMIT;');
      } catch {
        return { ok: false, reason: `${dbPath} is in use: stop the server first, then restore` };
      }
      live.pragma('wal_checkpoint(TRUNCATE)');
      live.pragma('journal_mode = DELETE');
    } finally {
      live.close();
    }
    previous = `${dbPath}.before-restore-${now.toISOString().replaceAll(':', '-').replace('.', '-')}`;
    renameSync(dbPath, previous);
  }
  // A left-over -wal would be replayed into the restored file: it belongs to the old one.
  for (const suffix of ['-wal', '-shm', '-journal']) {
    if (existsSync(dbPath + suffix)) renameSync(dbPath + suffix, `${previous ?? `${dbPath}.stale`}${suffix}`);
  }
  const staging = `${dbPath}.restoring`;
  copyFileSync(backupFile, staging);
  const fd = openSync(staging, 'r+');
  try {
    fsyncSync(fd);
  } finally {
    closeSync(fd);
  }
  renameSync(staging, dbPath);
  return { ok: true, value: { restored: dbPath, previous, pending: check.pending } };
}
