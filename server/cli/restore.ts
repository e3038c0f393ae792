import { loadConfig } from '../config.ts';
import { restoreDatabase } from './restore-database.ts';

// `npm run restore -- <backup file>`: checks the file, then puts it in place of RIDEWRIGHT_DB.
// The server must be stopped; the database it replaces is kept beside it.
const file = process.argv[2];
if (!file) {
  console.error('usage: npm run restore -- <backup file>');
  process.exit(2);
}
const config = loadConfig(process.env);
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
