import type { Db } from '../database.ts';
import { seedDemoPeople } from './demo-people.ts';
import { seedRoadsDyno } from './roads-dyno.ts';
import { seedRuns } from './runs.ts';
import type { SeedStep } from './seed-context.ts';
import { seedSetups } from './setups.ts';
import { seedStudies } from './studies.ts';
import { seedTargetSheets } from './target-sheets.ts';

/**
 * Steps that run after the people exist, in order. A feature adds its demo data as one file in
 * server/db/seed/ exporting a `SeedStep`, and one line here.
 */
export const seedSteps: SeedStep[] = [seedSetups, seedRoadsDyno, seedRuns, seedTargetSheets, seedStudies];

/**
 * Seeds the demo workspace when the database has no users; does nothing otherwise, so it is
 * safe to run on every start. Everything goes in one transaction: a failed step leaves no half demo.
 */
export async function seedDemo(db: Db, now: Date = new Date()): Promise<{ seeded: boolean }> {
  return db.transaction().execute(async (trx) => {
    const row = await trx.selectFrom('user').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow();
    if (Number(row.n) > 0) return { seeded: false };
    const ctx = await seedDemoPeople(trx, now);
    for (const step of seedSteps) await step(trx, ctx);
    return { seeded: true };
  });
}
