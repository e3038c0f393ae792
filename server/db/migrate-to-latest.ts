import { loadConfig } from '../config.ts';
import { openDatabase } from './database.ts';
import { withoutPassword } from './postgres.ts';
import { migrateToLatest } from './migrator.ts';

// `npm run migrate`: prints each migration's outcome and exits non-zero on failure.
const config = loadConfig(process.env);
const db = openDatabase(config.database);
const { error, results } = await migrateToLatest(db);
for (const r of results ?? []) {
  const mark = r.status === 'Success' ? 'applied' : r.status === 'Error' ? 'FAILED ' : 'skipped';
  console.log(`${mark} ${r.migrationName}`);
}
if (results?.length === 0 && !error) console.log(`database ${withoutPassword(config.database)} is up to date`);
await db.destroy();
if (error) {
  console.error('migration failed:', error);
  process.exit(1);
}
