import type { Queryable } from '../db/database.ts';
import type { NewApiTokenRow } from './api-tokens.tables.ts';

export async function insertApiToken(db: Queryable, row: NewApiTokenRow): Promise<void> {
  await db.insertInto('api_token').values(row).execute();
}

function tokenQuery(db: Queryable) {
  return db
    .selectFrom('api_token as t')
    .innerJoin('workspace as w', 'w.id', 't.workspace_id')
    .select(['t.id', 't.user_id', 't.workspace_id', 't.name', 't.scope', 't.created_at', 't.expires_at', 't.last_used_at', 't.revoked_at', 'w.name as workspace_name']);
}
export type ApiTokenViewRow = NonNullable<Awaited<ReturnType<typeof findApiTokenOfUser>>>;

export function findApiTokenOfUser(db: Queryable, userId: string, tokenId: string) {
  return tokenQuery(db).where('t.user_id', '=', userId).where('t.id', '=', tokenId).executeTakeFirst();
}

/** A person's tokens that are not revoked, newest first. */
export function listApiTokensOfUser(db: Queryable, userId: string) {
  return tokenQuery(db).where('t.user_id', '=', userId).where('t.revoked_at', 'is', null).orderBy('t.created_at', 'desc').orderBy('t.id').execute();
}

/** The live token with this hash and its owner, found by the hash only. */
export function findLiveApiTokenByHash(db: Queryable, tokenHash: string, nowIso: string) {
  return db
    .selectFrom('api_token as t')
    .innerJoin('user as u', 'u.id', 't.user_id')
    .select(['t.id', 't.workspace_id', 't.scope', 't.last_used_at', 'u.id as user_id', 'u.name as user_name', 'u.email as user_email', 'u.session_version', 'u.email_verified_at'])
    .where('t.token_hash', '=', tokenHash)
    .where('t.revoked_at', 'is', null)
    .where('t.expires_at', '>', nowIso)
    .executeTakeFirst();
}

export async function markApiTokenUsed(db: Queryable, tokenId: string, at: string): Promise<void> {
  await db.updateTable('api_token').set({ last_used_at: at }).where('id', '=', tokenId).execute();
}

export async function revokeApiTokenRow(db: Queryable, tokenId: string, at: string): Promise<void> {
  await db.updateTable('api_token').set({ revoked_at: at }).where('id', '=', tokenId).where('revoked_at', 'is', null).execute();
}
