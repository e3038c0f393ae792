import { loadConfig } from '../config.ts';
import { isPostgresUrl, withoutPassword } from '../db/postgres.ts';
import { restorePostgres } from './postgres-backup.ts';
import { restoreDatabase } from './restore-database.ts';

// `npm run restore -- <backup file>`: checks the file, then puts it in place of RIDEWRIGHT_DB
// (the database it replaces is kept beside it), or pg_restore's it into DATABASE_URL.
// Every server process must be stopped.
const file = process.argv[2];
if (!file) {
  console.error('usage: npm run restore -- <backup file>');
  process.exit(2);
}
const config = loadConfig(process.env);
if (isPostgresUrl(config.database)) {
  const restored = await restorePostgres(file, config.database);
  if (!restored.ok) {
    console.error(`not restored: ${restored.reason}`);
    process.exit(1);
  }
  console.log(`restored ${file} into ${withoutPassword(config.database)}`);
  if (restored.pending.length) console.log(`migrations still to run at the next start: ${restored.pending.join(', ')}`);
  process.exit(0);
}
const outcome = restoreDatabase(file, config.dbPath);
if (!outcome.ok) {
  console.error(`not restored: ${outcome.reason}`);
  process.exitCode = 1;
} else {
  const { restored, previous, pending } = outcome.value;
  console.log(`restored ${file} as ${restored}`);
  console.log(previous ? `the database it replaced is kept as ${previous}` : 'there was no database before');
  if (pending.length) console.log(`migrations still to run at the next start: ${pending.join(', ')}`);
}
