import { dirname, join } from 'node:path';
import { loadConfig } from '../config.ts';
import { isPostgresUrl } from '../db/postgres.ts';
import { backupDatabase } from './backup-database.ts';
import { backupPostgres } from './postgres-backup.ts';

// `npm run backup [-- --out <dir>]`: an online copy of the live database while the server keeps
// running: SQLite's online backup of RIDEWRIGHT_DB, or pg_dump of DATABASE_URL. Default folder:
// `backups/` beside the SQLite file (data/backups).
const args = process.argv.slice(2);
const outAt = args.indexOf('--out');
const config = loadConfig(process.env);
const outDir = outAt >= 0 && args[outAt + 1] ? args[outAt + 1] : join(dirname(config.dbPath), 'backups');
try {
  if (isPostgresUrl(config.database)) {
    const { path, bytes } = backupPostgres(config.database, outDir);
    console.log(`backup written: ${path} (${(bytes / 1024).toFixed(1)} kB, pg_dump custom format, read back with pg_restore --list)`);
  } else {
    const { path, bytes } = await backupDatabase(config.dbPath, outDir);
    console.log(`backup written: ${path} (${(bytes / 1024).toFixed(1)} kB, integrity_check ok)`);
  }
} catch (err) {
  console.error(`backup failed: ${(err as Error).message}`);
  process.exitCode = 1;
}
