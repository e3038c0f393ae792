import { randomUUID } from 'node:crypto';
import type { Me, PasswordChangeInput, SignInInput, SignUpInput } from '../../shared/schemas/account.ts';
import type { SessionUser } from '../auth/request-context.ts';
import { decoyHash, hashPassword, verifyPassword } from '../auth/password.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { AppDeps } from '../deps.ts';
import { addressCheckMail, signUpAgainMail } from '../mail/index.ts';
import { hashOneTimeToken, minutesAfter, newOneTimeToken } from '../core/one-time-tokens.ts';
import { findEmailVerificationByTokenHash, insertEmailVerification, markEmailVerificationUsed, markEmailVerified } from './email-verifications.repository.ts';
import type { UserRow } from './users.tables.ts';
import { bumpSessionVersion, findUserByEmail, findUserById, insertUser, setPasswordHash } from './users.repository.ts';
import { expireOpenResets } from './password-resets.repository.ts';
import { unitPreferencesOf } from './unit-preferences.service.ts';
import { insertMembership, insertWorkspace, listMembershipsOfUser } from '../workspaces/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { releaseSlot, takeSlot, type ThrottleRule } from '../limits/index.ts';
import { isUniqueViolation } from '../db/dialect.ts';

export type SessionStart = Pick<UserRow, 'id' | 'session_version'>;

type Deps = Pick<AppDeps, 'db' | 'mailer' | 'publicUrl' | 'clock'>;

/** How long an address-confirmation link works. */
export const ADDRESS_CHECK_HOURS = 24;

/**
 * Signs up without saying whether the address already has an account: a new address gets an
 * unconfirmed account, a workspace it administers and a mailed confirmation link; a taken one
 * gets a mail saying so (sign in or reset instead). Either way the answer is the same and the
 * person signs in after confirming. The mail goes out in the background; `mailed` settles when sent.
 */
export async function signUp(deps: Deps, input: SignUpInput): Promise<{ mailed: Promise<boolean> }> {
  const now = deps.clock();
  // Worked out either way, so a taken address answers in about the same time.
  const passwordHash = await hashPassword(input.password);
  const existing = await findUserByEmail(deps.db, input.email);
  if (existing) return { mailed: mailTakenAddress(deps, existing) };
  const userId = randomUUID();
  const workspaceId = randomUUID();
  const at = now.toISOString();
  try {
    await deps.db.transaction().execute(async (trx) => {
      await insertUser(trx, { id: userId, email: input.email, name: input.name, password_hash: passwordHash, session_version: 0, created_at: at, email_verified_at: null });
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
    // The same address signed up a moment ago: answer as for any taken address.
    if (isUniqueViolation(err)) {
      const taken = await findUserByEmail(deps.db, input.email);
      return { mailed: taken ? mailTakenAddress(deps, taken) : Promise.resolve(false) };
    }
    throw err;
  }
  return { mailed: mailAddressCheck(deps, { id: userId, name: input.name, email: input.email }) };
}

function mailTakenAddress(deps: Deps, user: Pick<UserRow, 'name' | 'email'>): Promise<boolean> {
  return deps.mailer.send({ to: user.email, ...signUpAgainMail({ name: user.name, signInLink: `${deps.publicUrl}/signin`, resetLink: `${deps.publicUrl}/reset` }) });
}

/** Stores a confirmation link for the account's address and mails it. */
async function mailAddressCheck(deps: Deps, user: Pick<UserRow, 'id' | 'name' | 'email'>): Promise<boolean> {
  const now = deps.clock();
  const { token, hash } = newOneTimeToken();
  const expiresAt = minutesAfter(now, ADDRESS_CHECK_HOURS * 60);
  await insertEmailVerification(deps.db, { id: randomUUID(), user_id: user.id, token_hash: hash, created_at: now.toISOString(), expires_at: expiresAt.toISOString(), used_at: null });
  return deps.mailer.send({ to: user.email, ...addressCheckMail({ name: user.name, link: `${deps.publicUrl}/confirm/${token}`, expiresAt }) });
}

/** Confirmation mails per account per hour. */
export const addressCheckRule = (userId: string): ThrottleRule => ({ key: `address-check:user:${userId}`, limit: 3, windowMs: 60 * 60_000, what: 'confirmation mails' });

/** Mails a new confirmation link to a signed-in account whose address is not confirmed yet. */
export async function resendAddressCheck(deps: Deps, user: SessionUser): Promise<Outcome<{ mailed: Promise<boolean> }>> {
  const row = await findUserById(deps.db, user.id);
  if (!row) return fail('unauthenticated', 'Please sign in again.');
  if (row.email_verified_at !== null) return fail('conflict', 'Your address is already confirmed.');
  const limited = await takeSlot(deps.db, [addressCheckRule(user.id)], deps.clock());
  if (limited) return limited;
  return ok({ mailed: mailAddressCheck(deps, row) });
}

/** Proves the address behind a live link, uses the link up, and starts a session for the account. */
export async function confirmAddress(deps: Deps, token: string): Promise<Outcome<SessionStart>> {
  const now = deps.clock();
  const at = now.toISOString();
  const row = await findEmailVerificationByTokenHash(deps.db, hashOneTimeToken(token));
  if (!row || row.used_at !== null || row.expires_at <= at) return fail('gone', 'This link has expired or was already used. Sign in and ask for a new one.');
  return deps.db.transaction().execute(async (trx) => {
    if (!(await markEmailVerificationUsed(trx, row.id, at))) return fail('gone', 'This link was already used.');
    const user = await findUserById(trx, row.user_id);
    if (!user) return fail('gone', 'This account no longer exists.');
    await markEmailVerified(trx, user.id, at);
    await recordAudit(trx, { workspaceId: null, actorId: user.id, action: 'account.address_confirmed', entityType: 'user', entityId: user.id, summary: `${user.name} confirmed the address ${user.email}.`, at: now });
    return ok(user);
  });
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
  return { id: row.id, name: row.name, email: row.email, sessionVersion: row.session_version, emailVerified: row.email_verified_at !== null };
}

export async function loadMe(db: Queryable, userId: string): Promise<Me> {
  const row = await findUserById(db, userId);
  if (!row) throw new Error(`user ${userId} vanished while building Me`);
  const memberships = await listMembershipsOfUser(db, userId);
  return {
    user: { id: row.id, name: row.name, email: row.email, emailVerified: row.email_verified_at !== null },
    memberships: memberships.map((m) => ({ workspaceId: m.workspace_id, workspaceName: m.workspace_name, role: m.role })),
    units: unitPreferencesOf(row),
  };
}
