import { randomUUID } from 'node:crypto';
import type { AcceptInvitationInput, Invitation, InvitationInfo, InviteInput } from '../../shared/schemas/workspace.ts';
import type { FieldIssue } from '../../shared/errors.ts';
import type { SessionUser, WorkspaceContext } from '../auth/request-context.ts';
import { hashPassword } from '../auth/password.ts';
import type { AppDeps } from '../deps.ts';
import type { InvitationRow } from './invitations.tables.ts';
import { invitationMail } from '../mail/index.ts';
import { deleteInvitation, findInvitation, findInvitationByTokenHash, insertInvitation, listPendingInvitations, markInvitationAccepted } from './invitations.repository.ts';
import { findUserByEmail, findUserById, insertUser, type SessionStart } from '../accounts/index.ts';
import { findMembership, findWorkspace, insertMembership } from './workspaces.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { hashOneTimeToken, minutesAfter, newOneTimeToken } from '../core/one-time-tokens.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { overLimit, recordActions, type ThrottleRule } from '../limits/index.ts';
import { isUniqueViolation } from '../db/dialect.ts';

export const INVITATION_DAYS = 7;
/** Pending invitations one workspace may hold at once. */
export const MAX_PENDING_INVITATIONS = 200;

const HOUR = 60 * 60_000;
/** Limits on sending invitations: per sender, per workspace, and per recipient address. */
export function invitationRules(actorId: string, workspaceId: string, email: string): ThrottleRule[] {
  return [
    { key: `invite:user:${actorId}`, limit: 20, windowMs: HOUR, what: 'invitations from you' },
    { key: `invite:workspace:${workspaceId}`, limit: 50, windowMs: HOUR, what: 'invitations from this workspace' },
    { key: `invite:to:${email}`, limit: 3, windowMs: 24 * HOUR, what: `invitations to ${email}` },
  ];
}

type Deps = Pick<AppDeps, 'db' | 'mailer' | 'publicUrl' | 'clock'>;

export function toInvitation(row: InvitationRow): Invitation {
  return { id: row.id, email: row.email, role: row.role, createdAt: row.created_at, expiresAt: row.expires_at };
}

/**
 * Stores an invitation and mails its link. A pending invitation to the same address in the
 * same workspace is replaced, so the list never shows two.
 */
export async function createInvitation(deps: Deps, ws: WorkspaceContext, actor: SessionUser, input: InviteInput): Promise<Outcome<Invitation>> {
  const existing = await findUserByEmail(deps.db, input.email);
  if (existing && (await findMembership(deps.db, ws.workspaceId, existing.id))) {
    return fail('conflict', `${input.email} is already a member of this workspace.`, [{ path: 'email', message: 'Already a member' }]);
  }
  const now = deps.clock();
  const rules = invitationRules(actor.id, ws.workspaceId, input.email);
  const limited = await overLimit(deps.db, rules, now);
  if (limited) return limited;
  if ((await listPendingInvitations(deps.db, ws.workspaceId, now.toISOString())).length >= MAX_PENDING_INVITATIONS) {
    return fail('conflict', `This workspace already has ${MAX_PENDING_INVITATIONS} invitations waiting; withdraw some before sending more.`);
  }
  const expiresAt = minutesAfter(now, INVITATION_DAYS * 24 * 60);
  const { token, hash } = newOneTimeToken();
  const row: InvitationRow = {
    id: randomUUID(),
    workspace_id: ws.workspaceId,
    email: input.email,
    role: input.role,
    token_hash: hash,
    invited_by: actor.id,
    created_at: now.toISOString(),
    expires_at: expiresAt.toISOString(),
    accepted_at: null,
  };
  await deps.db.transaction().execute(async (trx) => {
    await trx.deleteFrom('invitation').where('workspace_id', '=', ws.workspaceId).where('email', '=', input.email).where('accepted_at', 'is', null).execute();
    await insertInvitation(trx, row);
    await recordActions(trx, rules, now);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'invitation.created',
      entityType: 'invitation',
      entityId: row.id,
      summary: `${actor.name} invited ${input.email} as ${input.role}.`,
      at: now,
    });
  });
  const link = `${deps.publicUrl}/invite/${token}`;
  await deps.mailer.send({ to: input.email, workspaceId: ws.workspaceId, ...invitationMail({ workspaceName: ws.workspaceName, invitedBy: actor.name, role: input.role, link, expiresAt }) });
  return ok(toInvitation(row));
}

export async function revokeInvitation(deps: Deps, ws: WorkspaceContext, actor: SessionUser, invitationId: string): Promise<Outcome<void>> {
  const row = await findInvitation(deps.db, ws.workspaceId, invitationId);
  if (!row) return fail('not_found', 'No such invitation.');
  if (row.accepted_at !== null) return fail('conflict', 'This invitation was already accepted; change or remove the member instead.');
  await deps.db.transaction().execute(async (trx) => {
    await deleteInvitation(trx, ws.workspaceId, invitationId);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'invitation.revoked',
      entityType: 'invitation',
      entityId: invitationId,
      summary: `${actor.name} withdrew the invitation to ${row.email}.`,
      at: deps.clock(),
    });
  });
  return ok(undefined);
}

const gone = () => fail('gone', 'This invitation has expired, was withdrawn, or was already used.');

async function liveInvitation(deps: Deps, token: string): Promise<InvitationRow | null> {
  const row = await findInvitationByTokenHash(deps.db, hashOneTimeToken(token));
  if (!row || row.accepted_at !== null || row.expires_at <= deps.clock().toISOString()) return null;
  return row;
}

export async function invitationInfo(deps: Deps, token: string): Promise<Outcome<InvitationInfo>> {
  const row = await liveInvitation(deps, token);
  if (!row) return gone();
  const [workspace, inviter] = await Promise.all([findWorkspace(deps.db, row.workspace_id), findUserById(deps.db, row.invited_by)]);
  if (!workspace) return gone();
  return ok({ workspaceName: workspace.name, email: row.email, role: row.role, invitedBy: inviter?.name ?? 'An administrator' });
}

/**
 * Joins the invited address to the workspace. An existing account must be the signed-in caller;
 * otherwise the account is created from `name` and `password`. Returns the user to sign in.
 */
export async function acceptInvitation(deps: Deps, token: string, input: AcceptInvitationInput, caller: SessionUser | undefined): Promise<Outcome<SessionStart>> {
  const row = await liveInvitation(deps, token);
  if (!row) return gone();
  const account = await findUserByEmail(deps.db, row.email);
  // Signed out with nothing filled in: one answer whether or not the address has an account,
  // so the bare link tells nobody which.
  if (!caller && !input.name && !input.password) {
    return fail('bad_request', `Sign in as ${row.email} to accept, or choose a name and a password for a new account.`, [
      { path: 'name', message: 'Required to create your account' },
      { path: 'password', message: 'Required to create your account' },
    ]);
  }
  if (account) {
    if (!caller) return fail('unauthenticated', `Sign in as ${row.email} to accept this invitation.`);
    if (caller.id !== account.id) return fail('forbidden', `This invitation is for ${row.email}; sign in with that address to accept it.`);
    // An account joins other teams only once it has proved it owns its address.
    if (account.email_verified_at === null) {
      return fail('forbidden', `Confirm your address first: open the link we mailed to ${row.email} (your account page sends a new one), then accept.`);
    }
    if (await findMembership(deps.db, row.workspace_id, account.id)) return fail('conflict', 'You are already a member of this workspace.');
  } else {
    const missing: FieldIssue[] = [];
    if (!input.name) missing.push({ path: 'name', message: 'Required to create your account' });
    if (!input.password) missing.push({ path: 'password', message: 'Required to create your account' });
    if (missing.length > 0) return fail('bad_request', 'Choose a name and a password for your new account.', missing);
  }
  const passwordHash = account ? null : await hashPassword(input.password ?? '');
  const now = deps.clock();
  const at = now.toISOString();
  try {
    return await deps.db.transaction().execute(async (trx) => {
      if (!(await markInvitationAccepted(trx, row.id, at))) return gone();
      const userId = account?.id ?? randomUUID();
      const name = account?.name ?? input.name ?? '';
      if (!account) {
        // The invitation link went to this address: following it proves the address.
        await insertUser(trx, { id: userId, email: row.email, name, password_hash: passwordHash ?? '', session_version: 0, created_at: at, email_verified_at: at });
      }
      await insertMembership(trx, { workspace_id: row.workspace_id, user_id: userId, role: row.role, created_at: at });
      await recordAudit(trx, {
        workspaceId: row.workspace_id,
        actorId: userId,
        action: 'member.joined',
        entityType: 'user',
        entityId: userId,
        summary: `${name} (${row.email}) accepted an invitation and joined as ${row.role}.`,
        at: now,
      });
      return ok({ id: userId, session_version: account?.session_version ?? 0 });
    });
  } catch (err) {
    // Someone created the account or joined between our checks and the transaction.
    if (isUniqueViolation(err)) return gone();
    throw err;
  }
}
