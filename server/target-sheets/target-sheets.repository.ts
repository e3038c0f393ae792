import { bytesAsText, insertionOrder } from '../db/dialect.ts';
import type { Queryable } from '../db/database.ts';
import type { NewDynoCheckRow, NewTargetSheetRow, TargetSheetEventTable, TargetSheetPatch } from './target-sheets.tables.ts';

/** SQL for target sheets, their status history and their dyno checks. */

export async function insertSheet(db: Queryable, row: NewTargetSheetRow): Promise<void> {
  await db.insertInto('target_sheet').values(row).execute();
}

export async function updateSheet(db: Queryable, sheetId: string, patch: TargetSheetPatch): Promise<void> {
  await db.updateTable('target_sheet').set(patch).where('id', '=', sheetId).execute();
}

export async function deleteSheet(db: Queryable, sheetId: string): Promise<void> {
  await db.deleteFrom('target_sheet').where('id', '=', sheetId).execute();
}

/** A sheet with the names it shows: setup, author, approver and the numbers of linked sheets. */
function sheetQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('target_sheet as s')
    .innerJoin('setup as st', 'st.id', 's.setup_id')
    .innerJoin('user as a', 'a.id', 's.author_id')
    .leftJoin('user as d', 'd.id', 's.decided_by')
    .leftJoin('target_sheet as prev', 'prev.id', 's.supersedes_id')
    .leftJoin('target_sheet as next', 'next.id', 's.superseded_by_id')
    .selectAll('s')
    .select(['st.name as setup_name', 'a.name as author_name', 'd.name as decided_by_name', 'prev.number as supersedes_number', 'next.number as superseded_by_number'])
    .where('s.workspace_id', '=', workspaceId);
}

export type SheetViewRow = NonNullable<Awaited<ReturnType<typeof findSheet>>>;

export function findSheet(db: Queryable, workspaceId: string, sheetId: string) {
  return sheetQuery(db, workspaceId).where('s.id', '=', sheetId).executeTakeFirst();
}

export function listSheets(db: Queryable, workspaceId: string) {
  return sheetQuery(db, workspaceId).orderBy('s.updated_at', 'desc').orderBy('s.number', 'desc').execute();
}

/** The released sheet of a setup that no sheet has superseded (at most one; see migrations/0014), other than `exceptId`. */
export function findSheetInForce(db: Queryable, workspaceId: string, setupId: string, exceptId: string) {
  return sheetQuery(db, workspaceId).where('s.setup_id', '=', setupId).where('s.status', '=', 'released').where('s.superseded_by_id', 'is', null).where('s.id', '!=', exceptId).executeTakeFirst();
}

/** Every number issued in a workspace (the next one is computed from them). */
export async function listSheetNumbers(db: Queryable, workspaceId: string): Promise<string[]> {
  const rows = await db.selectFrom('target_sheet').select('number').where('workspace_id', '=', workspaceId).execute();
  return rows.map((r) => r.number);
}

export async function insertSheetEvent(db: Queryable, row: TargetSheetEventTable): Promise<void> {
  await db.insertInto('target_sheet_event').values(row).execute();
}

export function listSheetEvents(db: Queryable, sheetId: string) {
  return db
    .selectFrom('target_sheet_event as e')
    .innerJoin('user as u', 'u.id', 'e.actor_id')
    .select(['e.from_status', 'e.to_status', 'e.actor_id', 'u.name as actor_name', 'e.reason', 'e.at'])
    .where('e.sheet_id', '=', sheetId)
    .orderBy('e.at')
    // several steps can share a timestamp (a seed, a fixed clock): insertion order breaks ties
    .orderBy(insertionOrder(db, 'e'))
    .execute();
}

/** Name and address of every member with exactly `role` in the workspace. */
export function listMembersWithRole(db: Queryable, workspaceId: string, role: 'lead' | 'admin') {
  return db
    .selectFrom('membership as m')
    .innerJoin('user as u', 'u.id', 'm.user_id')
    .select(['u.id', 'u.name', 'u.email'])
    .where('m.workspace_id', '=', workspaceId)
    .where('m.role', '=', role)
    .orderBy('u.name')
    .execute();
}

export function findUserAddress(db: Queryable, userId: string) {
  return db.selectFrom('user').select(['id', 'name', 'email']).where('id', '=', userId).executeTakeFirst();
}

/** A check; the files it keeps as text, or as UTF-8 bytes made in a worker (stored as the same text). */
export async function insertDynoCheck(db: Queryable, row: Omit<NewDynoCheckRow, 'content'> & { content: string | Uint8Array }): Promise<void> {
  const { content, ...rest } = row;
  await db
    .insertInto('dyno_check')
    .values({ ...rest, content: typeof content === 'string' ? content : bytesAsText(db, content) })
    .execute();
}

function checkQuery(db: Queryable, sheetId: string) {
  return db
    .selectFrom('dyno_check as c')
    .innerJoin('user as u', 'u.id', 'c.uploaded_by')
    .select(['c.id', 'c.sheet_id', 'c.filename', 'c.result', 'c.uploaded_by', 'u.name as uploaded_by_name', 'c.created_at'])
    .where('c.sheet_id', '=', sheetId);
}

export type DynoCheckViewRow = Awaited<ReturnType<typeof listDynoChecks>>[number];

export function listDynoChecks(db: Queryable, sheetId: string) {
  return checkQuery(db, sheetId).orderBy('c.created_at', 'desc').orderBy('c.id').execute();
}

export function findDynoCheck(db: Queryable, sheetId: string, checkId: string) {
  return checkQuery(db, sheetId).where('c.id', '=', checkId).executeTakeFirst();
}
