import type { Queryable } from '../db/database.ts';
import type { InvitationRow, NewInvitationRow } from './invitations.tables.ts';

export async function insertInvitation(db: Queryable, row: NewInvitationRow): Promise<void> {
  await db.insertInto('invitation').values(row).execute();
}

export function findInvitationByTokenHash(db: Queryable, tokenHash: string): Promise<InvitationRow | undefined> {
  return db.selectFrom('invitation').selectAll().where('token_hash', '=', tokenHash).executeTakeFirst();
}

export function findInvitation(db: Queryable, workspaceId: string, id: string): Promise<InvitationRow | undefined> {
  return db.selectFrom('invitation').selectAll().where('workspace_id', '=', workspaceId).where('id', '=', id).executeTakeFirst();
}

/** Not yet accepted and not expired at `now`, newest first. */
export function listPendingInvitations(db: Queryable, workspaceId: string, now: string): Promise<InvitationRow[]> {
  return db
    .selectFrom('invitation')
    .selectAll()
    .where('workspace_id', '=', workspaceId)
    .where('accepted_at', 'is', null)
    .where('expires_at', '>', now)
    .orderBy('created_at', 'desc')
    .orderBy('id')
    .execute();
}

/** Marks it accepted unless someone got there first; true when this call won. */
export async function markInvitationAccepted(db: Queryable, id: string, at: string): Promise<boolean> {
  const r = await db.updateTable('invitation').set({ accepted_at: at }).where('id', '=', id).where('accepted_at', 'is', null).executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}

export async function deleteInvitation(db: Queryable, workspaceId: string, id: string): Promise<void> {
  await db.deleteFrom('invitation').where('workspace_id', '=', workspaceId).where('id', '=', id).execute();
}
