import { randomUUID } from 'node:crypto';
import { hashPassword } from '../auth/password.ts';
import type { AppDeps } from '../deps.ts';
import { passwordResetMail } from '../mail/index.ts';
import { bumpSessionVersion, findUserByEmail, findUserById, setPasswordHash } from './users.repository.ts';
import { expireOpenResets, findPasswordResetByTokenHash, insertPasswordReset, markPasswordResetUsed } from './password-resets.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { markEmailVerified } from './email-verifications.repository.ts';
import { hashOneTimeToken, minutesAfter, newOneTimeToken } from '../core/one-time-tokens.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';

export const RESET_MINUTES = 30;

type Deps = Pick<AppDeps, 'db' | 'mailer' | 'publicUrl' | 'clock'>;

/**
 * Stores a reset link and mails it when the address has an account; does nothing otherwise,
 * so the caller cannot tell the difference. The mail is sent in the background for the same reason;
 * the returned promise (for tests and tooling) settles when it is sent.
 */
export async function requestPasswordReset(deps: Deps, email: string): Promise<{ mailed: Promise<boolean> }> {
  const user = await findUserByEmail(deps.db, email);
  if (!user) return { mailed: Promise.resolve(false) };
  const now = deps.clock();
  const { token, hash } = newOneTimeToken();
  const expiresAt = minutesAfter(now, RESET_MINUTES);
  await insertPasswordReset(deps.db, {
    id: randomUUID(),
    user_id: user.id,
    token_hash: hash,
    created_at: now.toISOString(),
    expires_at: expiresAt.toISOString(),
    used_at: null,
  });
  const link = `${deps.publicUrl}/reset/${token}`;
  return { mailed: deps.mailer.send({ to: user.email, ...passwordResetMail({ name: user.name, link, expiresAt }) }) };
}

const gone = () => fail('gone', 'This link has expired or was already used. Ask for a new one.');

/** Sets the new password if the token is live, uses it up, and ends every session of the account. */
export async function confirmPasswordReset(deps: Deps, token: string, password: string): Promise<Outcome<void>> {
  const now = deps.clock();
  const reset = await findPasswordResetByTokenHash(deps.db, hashOneTimeToken(token));
  if (!reset || reset.used_at !== null || reset.expires_at <= now.toISOString()) return gone();
  const passwordHash = await hashPassword(password);
  return deps.db.transaction().execute(async (trx) => {
    if (!(await markPasswordResetUsed(trx, reset.id, now.toISOString()))) return gone();
    const user = await findUserById(trx, reset.user_id);
    if (!user) return gone();
    await setPasswordHash(trx, user.id, passwordHash);
    // The link was mailed to the address, so using it proves the address too.
    await markEmailVerified(trx, user.id, now.toISOString());
    await bumpSessionVersion(trx, user.id);
    await expireOpenResets(trx, user.id, now.toISOString());
    await recordAudit(trx, {
      workspaceId: null,
      actorId: user.id,
      action: 'account.password_reset',
      entityType: 'user',
      entityId: user.id,
      summary: `${user.name} set a new password through an e-mailed link; every session was signed out.`,
      at: now,
    });
    return ok(undefined);
  });
}
