import { randomUUID } from 'node:crypto';
import type { Me, PasswordChangeInput, SignInInput, SignUpInput } from '../../shared/schemas/account.ts';
import type { SessionUser } from '../auth/request-context.ts';
import { decoyHash, hashPassword, verifyPassword } from '../auth/password.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { UserRow } from './users.tables.ts';
import { bumpSessionVersion, findUserByEmail, findUserById, insertUser, setPasswordHash } from './users.repository.ts';
import { expireOpenResets } from './password-resets.repository.ts';
import { insertMembership, insertWorkspace, listMembershipsOfUser } from '../workspaces/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { releaseSlot, takeSlot, type ThrottleRule } from '../limits/index.ts';
import { isUniqueViolation } from '../core/sqlite-errors.ts';

export type SessionStart = Pick<UserRow, 'id' | 'session_version'>;

const emailTaken = () => fail('conflict', 'An account with this e-mail already exists.', [{ path: 'email', message: 'Already registered; sign in or reset the password' }]);

/** Creates the account and a workspace it administers. */
export async function signUp(db: Db, input: SignUpInput, now: Date): Promise<Outcome<SessionStart>> {
  if (await findUserByEmail(db, input.email)) return emailTaken();
  const passwordHash = await hashPassword(input.password);
  const userId = randomUUID();
  const workspaceId = randomUUID();
  const at = now.toISOString();
  try {
    await db.transaction().execute(async (trx) => {
      await insertUser(trx, { id: userId, email: input.email, name: input.name, password_hash: passwordHash, session_version: 0, created_at: at });
      await insertWorkspace(trx, { id: workspaceId, name: input.workspaceName, created_at: at });
      await insertMembership(trx, { workspace_id: workspaceId, user_id: userId, role: 'admin', created_at: at });
      await recordAudit(trx, {
        workspaceId,
        actorId: userId,
        action: 'workspace.created',
        entityType: 'workspace',
        entityId: workspaceId,
        summary: `${input.name} created the workspace "${input.workspaceName}" and administers it.`,
        at: now,
      });
    });
  } catch (err) {
    if (isUniqueViolation(err)) return emailTaken();
    throw err;
  }
  return ok({ id: userId, session_version: 0 });
}

const MINUTE = 60_000;
/**
 * Failed sign-ins per account address, beside the per-client-address limit on the route: a guesser
 * spreading over many client addresses still gets 10 tries per 15 minutes on one account. Counted
 * for unknown addresses too, so the limit says nothing about which addresses have accounts.
 */
export const signInRule = (email: string): ThrottleRule => ({ key: `signin:account:${email}`, limit: 10, windowMs: 15 * MINUTE, what: 'failed sign-ins for this account' });
/** Password changes (each one a key derivation) per user. */
export const passwordChangeRule = (userId: string): ThrottleRule => ({ key: `password:user:${userId}`, limit: 5, windowMs: 15 * MINUTE, what: 'password change attempts' });

/** Same answer and roughly the same time for an unknown e-mail as for a wrong password. */
export async function signIn(db: Db, input: SignInInput, now: Date): Promise<Outcome<SessionStart>> {
  // The attempt is counted before the password is checked and given back when it was right.
  const rule = signInRule(input.email);
  const limited = await takeSlot(db, [rule], now);
  if (limited) return limited;
  const user = await findUserByEmail(db, input.email);
  const matches = await verifyPassword(input.password, user?.password_hash ?? (await decoyHash()));
  if (!user || !matches) return fail('unauthenticated', 'The e-mail or the password is wrong.');
  await releaseSlot(db, rule, now);
  return ok(user);
}

/**
 * Ends every session of the user, this one included, and every password-reset link still open:
 * a link mailed before the sign-out must not outlive it.
 */
export async function signOutEverywhere(db: Db, userId: string, now: Date): Promise<void> {
  await db.transaction().execute(async (trx) => {
    await bumpSessionVersion(trx, userId);
    await expireOpenResets(trx, userId, now.toISOString());
  });
}

/** Sets a new password, ends every other session and every open reset link; returns the state for the caller's new cookie. */
export async function changePassword(db: Db, user: SessionUser, input: PasswordChangeInput, now: Date): Promise<Outcome<SessionStart>> {
  const row = await findUserById(db, user.id);
  if (!row) return fail('unauthenticated', 'Please sign in again.');
  // Counted before the hash is worked out, so a burst of guesses costs the server little.
  const limited = await takeSlot(db, [passwordChangeRule(user.id)], now);
  if (limited) return limited;
  if (!(await verifyPassword(input.currentPassword, row.password_hash))) {
    return fail('bad_request', 'The current password is wrong.', [{ path: 'currentPassword', message: 'Wrong password' }]);
  }
  const passwordHash = await hashPassword(input.newPassword);
  const version = await db.transaction().execute(async (trx) => {
    await setPasswordHash(trx, user.id, passwordHash);
    const v = await bumpSessionVersion(trx, user.id);
    // A reset link mailed before the change would otherwise still set a password.
    await expireOpenResets(trx, user.id, now.toISOString());
    await recordAudit(trx, {
      workspaceId: null,
      actorId: user.id,
      action: 'account.password_changed',
      entityType: 'user',
      entityId: user.id,
      summary: `${row.name} changed their password; other sessions were signed out.`,
      at: now,
    });
    return v;
  });
  return ok({ id: user.id, session_version: version });
}

/** The user behind a session token, or null when the token's version is stale or the user is gone. */
export async function sessionUser(db: Queryable, userId: string, sessionVersion: number): Promise<SessionUser | null> {
  const row = await findUserById(db, userId);
  if (!row || row.session_version !== sessionVersion) return null;
  return { id: row.id, name: row.name, email: row.email, sessionVersion: row.session_version };
}

export async function loadMe(db: Queryable, userId: string): Promise<Me> {
  const row = await findUserById(db, userId);
  if (!row) throw new Error(`user ${userId} vanished while building Me`);
  const memberships = await listMembershipsOfUser(db, userId);
  return {
    user: { id: row.id, name: row.name, email: row.email },
    memberships: memberships.map((m) => ({ workspaceId: m.workspace_id, workspaceName: m.workspace_name, role: m.role })),
  };
}
