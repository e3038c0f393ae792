import type { Queryable } from '../db/database.ts';
import type { EmailVerificationRow, NewEmailVerificationRow } from './email-verifications.tables.ts';

export async function insertEmailVerification(db: Queryable, row: NewEmailVerificationRow): Promise<void> {
  await db.insertInto('email_verification').values(row).execute();
}

export function findEmailVerificationByTokenHash(db: Queryable, tokenHash: string): Promise<EmailVerificationRow | undefined> {
  return db.selectFrom('email_verification').selectAll().where('token_hash', '=', tokenHash).executeTakeFirst();
}

/** Marks it used unless already used; true when this call won. */
export async function markEmailVerificationUsed(db: Queryable, id: string, at: string): Promise<boolean> {
  const r = await db.updateTable('email_verification').set({ used_at: at }).where('id', '=', id).where('used_at', 'is', null).executeTakeFirst();
  return Number(r.numUpdatedRows) === 1;
}

/** The address of the account is proved (first proof wins; later ones change nothing). */
export async function markEmailVerified(db: Queryable, userId: string, at: string): Promise<void> {
  await db.updateTable('user').set({ email_verified_at: at }).where('id', '=', userId).where('email_verified_at', 'is', null).execute();
}
