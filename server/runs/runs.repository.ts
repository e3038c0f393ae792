import { sql } from 'kysely';
import { insertionOrder } from '../db/dialect.ts';
import type { Queryable } from '../db/database.ts';
import type { NewRunRow } from './runs.tables.ts';

/** SQL for saved runs. Rows come back with their setup's name, newest revision and author's name. */

export async function insertRun(db: Queryable, row: NewRunRow): Promise<void> {
  await db.insertInto('run').values(row).execute();
}


export function setupExists(db: Queryable, workspaceId: string, setupId: string) {
  return db.selectFrom('setup').select('id').where('workspace_id', '=', workspaceId).where('id', '=', setupId).executeTakeFirst();
}

/** A road of the library (table `road`, migration 0003), checked by raw SQL so runs do not depend on its table interface. */
export async function findLibraryRoad(db: Queryable, workspaceId: string, roadId: string): Promise<{ id: string; definition: string } | undefined> {
  const result = await sql<{ id: string; definition: string }>`select id, definition from road where id = ${roadId} and workspace_id = ${workspaceId}`.execute(db);
  return result.rows[0];
}

const summaryColumns = [
  'run.id',
  'run.workspace_id',
  'run.setup_id',
  'run.revision_id',
  'run.road_id',
  'run.name',
  'run.road',
  'run.speed',
  'run.duration',
  'run.seed',
  'run.metrics',
  'run.modal',
  'run.created_by',
  'run.created_at',
  's.name as setup_name',
  'r.number as revision_number',
  'u.name as created_by_name',
] as const;

function summaryQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('run')
    .innerJoin('setup as s', 's.id', 'run.setup_id')
    .innerJoin('setup_revision as r', 'r.id', 'run.revision_id')
    .innerJoin('user as u', 'u.id', 'run.created_by')
    .select(summaryColumns)
    .select((eb) => eb.selectFrom('setup_revision as lr').select((e) => e.fn.max('lr.number').as('n')).whereRef('lr.setup_id', '=', 'run.setup_id').as('latest_revision'))
    .where('run.workspace_id', '=', workspaceId);
}

export type RunSummaryRow = Awaited<ReturnType<typeof listRunRows>>[number];

/** Newest first; `setupId` narrows to one setup. */
export function listRunRows(db: Queryable, workspaceId: string, opts: { setupId?: string; limit: number }) {
  let q = summaryQuery(db, workspaceId);
  if (opts.setupId) q = q.where('run.setup_id', '=', opts.setupId);
  return q.orderBy('run.created_at', 'desc').orderBy(insertionOrder(db, 'run'), 'desc').limit(opts.limit).execute();
}

export function findRunRow(db: Queryable, workspaceId: string, runId: string) {
  return summaryQuery(db, workspaceId)
    .select(['run.request', 'run.result', 'run.trace_info', 'run.traces', 'run.spectra_length', 'run.spectra'])
    .where('run.id', '=', runId)
    .executeTakeFirst();
}

export async function deleteRunRow(db: Queryable, workspaceId: string, runId: string): Promise<boolean> {
  const result = await db.deleteFrom('run').where('workspace_id', '=', workspaceId).where('id', '=', runId).executeTakeFirst();
  return Number(result.numDeletedRows) > 0;
}
