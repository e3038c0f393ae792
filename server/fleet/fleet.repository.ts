import type { Queryable } from '../db/database.ts';
import type { FleetRunStateColumn, NewFleetRunRow } from './fleet.tables.ts';

/** SQL for the runs of studies on the team's workers. */

export function findFleetRun(db: Queryable, studyId: string) {
  return db
    .selectFrom('study_fleet_run as f')
    .innerJoin('user as u', 'u.id', 'f.started_by')
    .selectAll('f')
    .select('u.name as started_by_name')
    .where('f.study_id', '=', studyId)
    .executeTakeFirst();
}
export type FleetRunView = NonNullable<Awaited<ReturnType<typeof findFleetRun>>>;

/** A new start replaces the study's previous run row. */
export async function putFleetRun(db: Queryable, row: NewFleetRunRow): Promise<void> {
  const { study_id: _id, ...rest } = row;
  await db.insertInto('study_fleet_run').values(row).onConflict((oc) => oc.column('study_id').doUpdateSet(rest)).execute();
}

/**
 * Takes the run's row for a chunk's write (on PostgreSQL this locks it until the transaction
 * ends, so a cancel waits for the write or the write sees the cancel): false when the run is no
 * longer this generation's or no longer running.
 */
export async function claimRunningRun(db: Queryable, studyId: string, generation: number, at: string): Promise<boolean> {
  const r = await db.updateTable('study_fleet_run').set({ updated_at: at }).where('study_id', '=', studyId).where('generation', '=', generation).where('state', '=', 'running').executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

export async function addDone(db: Queryable, studyId: string, units: number, runs: number): Promise<void> {
  await db
    .updateTable('study_fleet_run')
    .set((eb) => ({ units_done: eb('units_done', '+', units), runs_done: eb('runs_done', '+', runs) }))
    .where('study_id', '=', studyId)
    .execute();
}

/** Moves the run from one of `from` to `to`; false when it was in none of them (someone else moved it first). */
export async function moveFleetRun(
  db: Queryable,
  studyId: string,
  generation: number,
  from: FleetRunStateColumn[],
  to: FleetRunStateColumn,
  at: string,
  extra: { error?: string; finished?: boolean } = {},
): Promise<boolean> {
  const r = await db
    .updateTable('study_fleet_run')
    .set({ state: to, updated_at: at, ...(extra.error !== undefined ? { error: extra.error } : {}), ...(extra.finished ? { finished_at: at } : {}) })
    .where('study_id', '=', studyId)
    .where('generation', '=', generation)
    .where('state', 'in', from)
    .executeTakeFirst();
  return r.numUpdatedRows > 0n;
}

/** Runs that still expect chunks or a close, across workspaces (for the workers' check after a Redis loss). */
export function listUnfinishedRuns(db: Queryable) {
  return db.selectFrom('study_fleet_run').select(['study_id', 'workspace_id', 'generation', 'state', 'units_done', 'units_total']).where('state', 'in', ['running', 'finishing']).execute();
}
