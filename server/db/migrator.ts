import { type Kysely, type Migration, type MigrationResultSet, Migrator } from 'kysely';
import * as m0001 from '../../migrations/0001_init.ts';
import * as m0002 from '../../migrations/0002_setups.ts';
import * as m0003 from '../../migrations/0003_roads_dyno.ts';
import * as m0004 from '../../migrations/0004_runs.ts';
import * as m0005 from '../../migrations/0005_studies.ts';
import * as m0006 from '../../migrations/0006_target_sheets.ts';
import * as m0007 from '../../migrations/0007_outbox_audience.ts';
import * as m0008 from '../../migrations/0008_throttle_events.ts';
import * as m0009 from '../../migrations/0009_release_second_person.ts';
import * as m0010 from '../../migrations/0010_address_verification.ts';
import * as m0011 from '../../migrations/0011_dyno_file_loop.ts';
import * as m0012 from '../../migrations/0012_road_versions.ts';
import * as m0013 from '../../migrations/0013_stored_sizes.ts';
import * as m0014 from '../../migrations/0014_one_released_sheet.ts';
import * as m0015 from '../../migrations/0015_unit_preferences.ts';
import * as m0017 from '../../migrations/0017_insertion_order.ts';
import * as m0018 from '../../migrations/0018_api_tokens.ts';
import * as m0019 from '../../migrations/0019_fleet_runs.ts';
import * as m0021 from '../../migrations/0021_drives.ts';
import * as m0023 from '../../migrations/0023_road_kind.ts';

/**
 * Every migration, imported statically: Kysely's FileMigrationProvider loads `.ts` through
 * Node's own loader, which fails under vitest. A new migration adds one line here; a unit test
 * (migrator.test.ts) fails when a file in migrations/ is missing from this list.
 */
export const migrations: Record<string, Migration> = {
  '0001_init': m0001,
  '0002_setups': m0002,
  '0003_roads_dyno': m0003,
  '0004_runs': m0004,
  '0005_studies': m0005,
  '0006_target_sheets': m0006,
  '0007_outbox_audience': m0007,
  '0008_throttle_events': m0008,
  '0009_release_second_person': m0009,
  '0010_address_verification': m0010,
  '0011_dyno_file_loop': m0011,
  '0012_road_versions': m0012,
  '0013_stored_sizes': m0013,
  '0014_one_released_sheet': m0014,
  '0015_unit_preferences': m0015,
  '0017_insertion_order': m0017,
  '0018_api_tokens': m0018,
  '0019_fleet_runs': m0019,
  '0021_drives': m0021,
  '0023_road_kind': m0023,
};

export function createMigrator(db: Kysely<any>): Migrator {
  // Branches take migration numbers ahead of time, so one can land after a higher number has
  // already run on someone's database; each migration touches only its own tables and columns,
  // so running a late lower number afterwards is safe (Kysely refuses it by default).
  return new Migrator({ db, provider: { getMigrations: async () => migrations }, allowUnorderedMigrations: true });
}

/** Runs every pending migration; returns Kysely's result set (error as a value). */
export function migrateToLatest(db: Kysely<any>): Promise<MigrationResultSet> {
  return createMigrator(db).migrateToLatest();
}
