import { dirname, join } from 'node:path';
import { loadConfig } from '../config.ts';
import { backupDatabase } from './backup-database.ts';

// `npm run backup [-- --out <dir>]`: an online copy of the live database (RIDEWRIGHT_DB) while
// the server keeps running. Default folder: `backups/` beside the database.
const args = process.argv.slice(2);
const outAt = args.indexOf('--out');
const config = loadConfig(process.env);
const outDir = outAt >= 0 && args[outAt + 1] ? args[outAt + 1] : join(dirname(config.dbPath), 'backups');
try {
  const { path, bytes } = await backupDatabase(config.dbPath, outDir);
  console.log(`backup written: ${path} (${(bytes / 1024).toFixed(1)} kB, integrity_check ok)`);
} catch (err) {
  console.error(`backup failed: ${(err as Error).message}`);
  process.exitCode = 1;
}
