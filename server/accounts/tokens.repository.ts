import type { Queryable } from '../db/database.ts';
import type { InvitationRow, NewInvitationRow, NewPasswordResetRow, PasswordResetRow } from './tokens.tables.ts';

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

export async function insertPasswordReset(db: Queryable, row: NewPasswordResetRow): Promise<void> {
  await db.insertInto('password_reset').values(row).execute();
}

export function findPasswordResetByTokenHash(db: Queryable, tokenHash: string): Promise<PasswordResetRow | undefined> {
  return db.selectFrom('password_reset').selectAll().where('token_hash', '=', tokenHash).executeTakeFirst();
}

/** Marks it used unless already used; true when this call won. */
export async function markPasswordResetUsed(db: Queryable, id: string, at: string): Promise<boolean> {
  const r = await db.updateTable('password_reset').set({ used_at: at }).where('id', '=', id).where('used_at', 'is', null).executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}

/** Earlier unused links die when a reset succeeds. */
export async function expireOpenResets(db: Queryable, userId: string, at: string): Promise<void> {
  await db.updateTable('password_reset').set({ used_at: at }).where('user_id', '=', userId).where('used_at', 'is', null).execute();
}
