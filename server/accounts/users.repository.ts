import type { Queryable } from '../db/database.ts';
import type { NewUserRow, UserRow } from './users.tables.ts';

export function findUserById(db: Queryable, id: string): Promise<UserRow | undefined> {
  return db.selectFrom('user').selectAll().where('id', '=', id).executeTakeFirst();
}

export function findUserByEmail(db: Queryable, email: string): Promise<UserRow | undefined> {
  return db.selectFrom('user').selectAll().where('email', '=', email.toLowerCase()).executeTakeFirst();
}

export async function insertUser(db: Queryable, row: NewUserRow): Promise<void> {
  await db.insertInto('user').values(row).execute();
}

/** Kills every session issued so far; returns the new version. */
export async function bumpSessionVersion(db: Queryable, id: string): Promise<number> {
  const row = await db
    .updateTable('user')
    .set((eb) => ({ session_version: eb('session_version', '+', 1) }))
    .where('id', '=', id)
    .returning('session_version')
    .executeTakeFirstOrThrow();
  return row.session_version;
}

export async function setPasswordHash(db: Queryable, id: string, passwordHash: string): Promise<void> {
  await db.updateTable('user').set({ password_hash: passwordHash }).where('id', '=', id).execute();
}

export async function setUnitPreferences(db: Queryable, id: string, json: string): Promise<void> {
  await db.updateTable('user').set({ unit_preferences: json }).where('id', '=', id).execute();
}
