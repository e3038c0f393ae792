import { loadConfig } from '../config.ts';
import { openDatabase } from './database.ts';
import { withoutPassword } from './postgres.ts';
import { migrateToLatest } from './migrator.ts';
import { DEMO_WORKSPACE_NAME } from '../core/demo-people.ts';
import { seedDemo } from './seed/seed-demo.ts';

// `npm run seed`: the demo workspace, only when the database has no users yet.
const config = loadConfig(process.env);
const db = openDatabase(config.database);
try {
  const { error } = await migrateToLatest(db);
  if (error) throw error;
  const { seeded } = await seedDemo(db);
  console.log(seeded ? `seeded demo workspace "${DEMO_WORKSPACE_NAME}" in ${withoutPassword(config.database)}` : `${withoutPassword(config.database)} already has users; nothing seeded`);
} catch (err) {
  console.error('seed failed:', err);
  process.exitCode = 1;
} finally {
  await db.destroy();
}
