import type { Queryable } from '../db/database.ts';
import type { NewDynoFileRow } from './dyno-files.tables.ts';

/** SQL for dyno files. The uploaded text is read only where it is needed (detail, apply). */

export async function insertDynoFile(db: Queryable, row: NewDynoFileRow): Promise<void> {
  await db.insertInto('dyno_file').values(row).execute();
}

function fileQuery(db: Queryable, workspaceId: string, setupId: string) {
  return db
    .selectFrom('dyno_file as d')
    .innerJoin('user as u', 'u.id', 'd.uploaded_by')
    .leftJoin('setup_revision as r', 'r.id', 'd.produced_revision_id')
    .select([
      'd.id',
      'd.setup_id',
      'd.filename',
      'd.bytes',
      'd.options',
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

export type DynoFileListRow = Awaited<ReturnType<typeof listDynoFiles>>[number];

export function listDynoFiles(db: Queryable, workspaceId: string, setupId: string) {
  return fileQuery(db, workspaceId, setupId).orderBy('d.created_at', 'desc').orderBy('d.id').execute();
}

export function findDynoFile(db: Queryable, workspaceId: string, setupId: string, fileId: string) {
  return fileQuery(db, workspaceId, setupId).select(['d.content', 'd.loop']).where('d.id', '=', fileId).executeTakeFirst();
}

export async function linkProducedRevision(db: Queryable, fileId: string, revisionId: string): Promise<void> {
  await db.updateTable('dyno_file').set({ produced_revision_id: revisionId }).where('id', '=', fileId).execute();
}

/** Keeps the loop read from a file kept before loops were stored (filled on first opening). */
export async function storeDynoLoop(db: Queryable, fileId: string, loop: string): Promise<void> {
  await db.updateTable('dyno_file').set({ loop }).where('id', '=', fileId).where('loop', 'is', null).execute();
}
