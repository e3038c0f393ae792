import type { Queryable } from '../db/database.ts';
import type { NewShareLinkRow } from './share-links.tables.ts';

export async function insertShareLink(db: Queryable, row: NewShareLinkRow): Promise<void> {
  await db.insertInto('share_link').values(row).execute();
}

function linkQuery(db: Queryable) {
  return db
    .selectFrom('share_link as l')
    .innerJoin('user as u', 'u.id', 'l.created_by')
    .innerJoin('workspace as w', 'w.id', 'l.workspace_id')
    .select([
      'l.id',
      'l.workspace_id',
      'l.object_type',
      'l.object_id',
      'l.created_by',
      'l.created_at',
      'l.expires_at',
      'l.revoked_at',
      'u.name as created_by_name',
      'w.name as workspace_name',
    ]);
}
export type ShareLinkViewRow = NonNullable<Awaited<ReturnType<typeof findShareLinkByHash>>>;

/** The link a token opens, found by the token's SHA-256 only. */
export function findShareLinkByHash(db: Queryable, tokenHash: string) {
  return linkQuery(db).where('l.token_hash', '=', tokenHash).executeTakeFirst();
}

export function findShareLink(db: Queryable, workspaceId: string, linkId: string) {
  return linkQuery(db).where('l.workspace_id', '=', workspaceId).where('l.id', '=', linkId).executeTakeFirst();
}

/** Links of a workspace, newest first; with `objectIds`, only links to those objects. */
export function listShareLinks(db: Queryable, workspaceId: string, objectIds?: string[]) {
  let q = linkQuery(db).where('l.workspace_id', '=', workspaceId);
  if (objectIds) {
    if (objectIds.length === 0) return Promise.resolve([]);
    q = q.where('l.object_id', 'in', objectIds);
  }
  return q.orderBy('l.created_at', 'desc').orderBy('l.id').execute();
}

export async function revokeShareLinkRow(db: Queryable, linkId: string, at: string): Promise<void> {
  await db.updateTable('share_link').set({ revoked_at: at }).where('id', '=', linkId).where('revoked_at', 'is', null).execute();
}

/** Revokes every live link `userId` made in the workspace; returns how many. */
export async function revokeShareLinksOfCreator(db: Queryable, workspaceId: string, userId: string, at: string): Promise<number> {
  const r = await db
    .updateTable('share_link')
    .set({ revoked_at: at })
    .where('workspace_id', '=', workspaceId)
    .where('created_by', '=', userId)
    .where('revoked_at', 'is', null)
    .executeTakeFirst();
  return Number(r.numUpdatedRows);
}

/** Revision ids of a setup, for listing the links that point into it. */
export async function revisionIdsOfSetup(db: Queryable, setupId: string): Promise<string[]> {
  const rows = await db.selectFrom('setup_revision').select('id').where('setup_id', '=', setupId).execute();
  return rows.map((r) => r.id);
}
