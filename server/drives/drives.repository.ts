import type { Queryable } from '../db/database.ts';
import type { NewDriveRow } from './drives.tables.ts';

/** SQL for measured drives. The signals are read only where they are needed (detail). */

export async function insertDrive(db: Queryable, row: NewDriveRow): Promise<void> {
  await db.insertInto('drive').values(row).execute();
}

function driveQuery(db: Queryable, workspaceId: string, setupId: string) {
  return db
    .selectFrom('drive as d')
    .innerJoin('user as u', 'u.id', 'd.uploaded_by')
    .leftJoin('setup_revision as r', 'r.id', 'd.produced_revision_id')
    .select([
      'd.id',
      'd.setup_id',
      'd.filename',
      'd.note',
      'd.bytes',
      'd.summary',
      'd.uploaded_by',
      'u.name as uploaded_by_name',
      'd.created_at',
      'd.produced_revision_id',
      'r.number as produced_revision_number',
    ])
    .where('d.workspace_id', '=', workspaceId)
    .where('d.setup_id', '=', setupId);
}

export type DriveListRow = Awaited<ReturnType<typeof listDrives>>[number];

export function listDrives(db: Queryable, workspaceId: string, setupId: string) {
  return driveQuery(db, workspaceId, setupId).orderBy('d.created_at', 'desc').orderBy('d.id').execute();
}

export function findDrive(db: Queryable, workspaceId: string, setupId: string, driveId: string) {
  return driveQuery(db, workspaceId, setupId).where('d.id', '=', driveId).executeTakeFirst();
}

export function findDriveData(db: Queryable, workspaceId: string, setupId: string, driveId: string) {
  return driveQuery(db, workspaceId, setupId).select(['d.data']).where('d.id', '=', driveId).executeTakeFirst();
}

export async function linkDriveRevision(db: Queryable, driveId: string, revisionId: string): Promise<void> {
  await db.updateTable('drive').set({ produced_revision_id: revisionId }).where('id', '=', driveId).execute();
}
