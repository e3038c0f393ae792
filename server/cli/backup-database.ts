import { mkdirSync, renameSync, statSync, unlinkSync } from 'node:fs';
import { basename, join } from 'node:path';
import SQLite from 'better-sqlite3';

export interface BackupResult {
  path: string;
  bytes: number;
}

/** `ridewright-2024-05-01T12-30-05-123Z.sqlite`: sorts by time, safe in any file system. */
export const backupFileName = (at: Date) => `ridewright-${at.toISOString().replaceAll(':', '-').replace('.', '-')}.sqlite`;

/**
 * Copies the live database at `dbPath` into `outDir` with SQLite's online backup, while the
 * server keeps running and writing. The whole file is copied in one backup step, which reads
 * one consistent snapshot (WAL readers do not block the writer, nor it them), so the copy holds
 * every transaction committed before the step began and none half-done. The copy is written
 * under a `.partial` name, switched to a single self-contained file (rollback journal, no -wal),
 * checked with `integrity_check`, and only then given its final name.
 */
export async function backupDatabase(dbPath: string, outDir: string, now: Date = new Date()): Promise<BackupResult> {
  statSync(dbPath); // a missing database is an error, not an empty backup
  mkdirSync(outDir, { recursive: true });
  const path = join(outDir, backupFileName(now));
  const partial = `${path}.partial`;
  const source = new SQLite(dbPath, { fileMustExist: true });
  try {
    source.pragma('busy_timeout = 5000');
    // Return "all remaining pages" for every step: the copy is one snapshot, never restarted by a write.
    await source.backup(partial, { progress: () => 0x7fffffff });
  } catch (err) {
    try {
      unlinkSync(partial);
    } catch {
      // nothing was written
    }
    throw err;
  } finally {
    source.close();
  }
  const copy = new SQLite(partial);
  try {
    copy.pragma('journal_mode = DELETE');
    const check = copy.pragma('integrity_check', { simple: true });
    if (check !== 'ok') throw new Error(`the copy of ${basename(dbPath)} failed integrity_check: ${String(check)}`);
  } finally {
    copy.close();
  }
  renameSync(partial, path);
  return { path, bytes: statSync(path).size };
}
