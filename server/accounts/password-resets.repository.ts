import type { Queryable } from '../db/database.ts';
import type { NewPasswordResetRow, PasswordResetRow } from './password-resets.tables.ts';

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
