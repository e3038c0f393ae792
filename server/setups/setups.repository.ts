import type { Queryable } from '../db/database.ts';
import type { CornerColumn, NewSetupRevisionRow, NewSetupRow, SetupTable } from './setups.tables.ts';

/** SQL for setups and their revisions. Revisions are only ever inserted and read. */

export async function insertSetup(db: Queryable, row: NewSetupRow): Promise<void> {
  await db.insertInto('setup').values(row).execute();
}

export async function insertRevision(db: Queryable, row: NewSetupRevisionRow): Promise<void> {
  await db.insertInto('setup_revision').values(row).execute();
}

/** Each setup with its newest revision, the names of who made and last changed it, and its vehicle. */
function summaryQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('setup as s')
    .innerJoin('setup_revision as r', (join) =>
      join
        .onRef('r.setup_id', '=', 's.id')
        .on((eb) => eb('r.number', '=', eb.selectFrom('setup_revision as r2').select((e) => e.fn.max('r2.number').as('n')).whereRef('r2.setup_id', '=', 's.id'))),
    )
    .innerJoin('user as cu', 'cu.id', 's.created_by')
    .innerJoin('user as uu', 'uu.id', 's.updated_by')
    .leftJoin('vehicle as v', 'v.id', 's.vehicle_id')
    .select([
      's.id',
      's.workspace_id',
      's.name',
      's.vehicle_id',
      's.corner',
      's.created_by',
      's.created_at',
      's.updated_by',
      's.updated_at',
      's.archived_at',
      'cu.name as created_by_name',
      'uu.name as updated_by_name',
      'v.name as vehicle_name',
      'r.id as revision_id',
      'r.number as revision_number',
      'r.message as revision_message',
      'r.document as revision_document',
    ])
    .where('s.workspace_id', '=', workspaceId);
}

export type SetupSummaryRow = Awaited<ReturnType<typeof listSetupSummaries>>[number];

export function listSetupSummaries(db: Queryable, workspaceId: string, archived: 'exclude' | 'include' | 'only') {
  let q = summaryQuery(db, workspaceId);
  if (archived === 'exclude') q = q.where('s.archived_at', 'is', null);
  if (archived === 'only') q = q.where('s.archived_at', 'is not', null);
  return q.orderBy('s.updated_at', 'desc').orderBy('s.id').execute();
}

export function findSetupSummary(db: Queryable, workspaceId: string, setupId: string): Promise<SetupSummaryRow | undefined> {
  return summaryQuery(db, workspaceId).where('s.id', '=', setupId).executeTakeFirst();
}

/** Summaries of the live (not archived) setups grouped into any of `vehicleIds`. */
export function listSetupSummariesOfVehicles(db: Queryable, workspaceId: string, vehicleIds: string[]) {
  if (vehicleIds.length === 0) return Promise.resolve([]);
  return summaryQuery(db, workspaceId).where('s.vehicle_id', 'in', vehicleIds).where('s.archived_at', 'is', null).where('s.corner', 'is not', null).execute();
}

export function findSetup(db: Queryable, workspaceId: string, setupId: string) {
  return db.selectFrom('setup').selectAll().where('workspace_id', '=', workspaceId).where('id', '=', setupId).executeTakeFirst();
}

export async function updateSetupRow(db: Queryable, setupId: string, patch: Partial<Omit<SetupTable, 'id' | 'workspace_id' | 'created_by' | 'created_at'>>): Promise<void> {
  await db.updateTable('setup').set(patch).where('id', '=', setupId).execute();
}

export async function latestRevisionNumber(db: Queryable, setupId: string): Promise<number> {
  const row = await db.selectFrom('setup_revision').select((eb) => eb.fn.max('number').as('n')).where('setup_id', '=', setupId).executeTakeFirst();
  return Number(row?.n ?? 0);
}

function revisionQuery(db: Queryable) {
  return db
    .selectFrom('setup_revision as r')
    .innerJoin('user as a', 'a.id', 'r.author_id')
    .select(['r.id', 'r.setup_id', 'r.number', 'r.message', 'r.author_id', 'a.name as author_name', 'r.created_at', 'r.source']);
}

export type RevisionSummaryRow = Awaited<ReturnType<typeof listRevisions>>[number];

/** Up to `limit` revisions numbered below `before` (all when absent), newest first. */
export function listRevisions(db: Queryable, setupId: string, page: { limit: number; before?: number }) {
  let q = revisionQuery(db).where('r.setup_id', '=', setupId);
  if (page.before !== undefined) q = q.where('r.number', '<', page.before);
  return q.orderBy('r.number', 'desc').limit(page.limit).execute();
}

export function findRevision(db: Queryable, setupId: string, number: number) {
  return revisionQuery(db).select('r.document').where('r.setup_id', '=', setupId).where('r.number', '=', number).executeTakeFirst();
}
/** Every revision's number and stored document, newest first (for the duplicate check on save). */
export function listRevisionDocuments(db: Queryable, setupId: string) {
  return db.selectFrom('setup_revision').select(['number', 'document']).where('setup_id', '=', setupId).orderBy('number', 'desc').execute();
}

export type RevisionRow = NonNullable<Awaited<ReturnType<typeof findRevision>>>;

/** A revision by its id, with its setup's name and workspace (for share links). */
export function findRevisionById(db: Queryable, revisionId: string) {
  return revisionQuery(db)
    .innerJoin('setup as s', 's.id', 'r.setup_id')
    .select(['r.document', 's.workspace_id', 's.name as setup_name'])
    .where('r.id', '=', revisionId)
    .executeTakeFirst();
}

/** The live setup holding a corner slot of a vehicle, if any. */
export function findSlotHolder(db: Queryable, vehicleId: string, corner: CornerColumn) {
  return db
    .selectFrom('setup')
    .select(['id', 'name'])
    .where('vehicle_id', '=', vehicleId)
    .where('corner', '=', corner)
    .where('archived_at', 'is', null)
    .executeTakeFirst();
}

/**
 * A revision of a setup in the workspace, by its number or its id, with the setup's name: what
 * runs and studies check a request against before they copy the revision's document.
 */
export function findRevisionInWorkspace(db: Queryable, workspaceId: string, setupId: string, which: { number: number } | { id: string }) {
  const q = db
    .selectFrom('setup_revision as r')
    .innerJoin('setup as s', 's.id', 'r.setup_id')
    .select(['r.id', 'r.number', 'r.document', 's.name as setup_name'])
    .where('s.workspace_id', '=', workspaceId)
    .where('s.id', '=', setupId);
  return ('id' in which ? q.where('r.id', '=', which.id) : q.where('r.number', '=', which.number)).executeTakeFirst();
}
