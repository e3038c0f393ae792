import type { Member, MembersResponse, Role } from '../../shared/schemas/workspace.ts';
import type { SessionUser, WorkspaceContext } from '../auth/request-context.ts';
import type { Db } from '../db/database.ts';
import { revokeShareLinksOfCreator } from '../sharing/index.ts';
import { listPendingInvitations } from './invitations.repository.ts';
import { countAdmins, deleteMembership, findMemberOfWorkspace, listMembersOfWorkspace, type MemberRow, updateMembershipRole } from './workspaces.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { toInvitation } from './invitations.service.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';

function toMember(r: MemberRow): Member {
  return { userId: r.user_id, name: r.name, email: r.email, role: r.role, joinedAt: r.created_at };
}

/** Members for everyone in the workspace; pending invitations only for admins. */
export async function listMembers(db: Db, ws: WorkspaceContext, now: Date): Promise<MembersResponse> {
  const members = (await listMembersOfWorkspace(db, ws.workspaceId)).map(toMember);
  const invitations = ws.role === 'admin' ? (await listPendingInvitations(db, ws.workspaceId, now.toISOString())).map(toInvitation) : [];
  return { members, invitations };
}

const lastAdmin = (what: string) => fail('conflict', `${what} would leave the workspace without an administrator; make someone else admin first.`);

export async function changeRole(db: Db, ws: WorkspaceContext, actor: SessionUser, userId: string, role: Role, now: Date): Promise<Outcome<Member>> {
  return db.transaction().execute(async (trx) => {
    const target = await findMemberOfWorkspace(trx, ws.workspaceId, userId);
    if (!target) return fail('not_found', 'No such member.');
    if (target.role === role) return ok(toMember(target));
    if (target.role === 'admin' && (await countAdmins(trx, ws.workspaceId)) <= 1) return lastAdmin('Demoting the only admin');
    await updateMembershipRole(trx, ws.workspaceId, userId, role);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'member.role_changed',
      entityType: 'user',
      entityId: userId,
      summary: `${actor.name} changed ${target.name}'s role from ${target.role} to ${role}.`,
      at: now,
    });
    return ok({ ...toMember(target), role });
  });
}

/** Removes a member and revokes the share links they made in this workspace. */
export async function removeMember(db: Db, ws: WorkspaceContext, actor: SessionUser, userId: string, now: Date): Promise<Outcome<void>> {
  return db.transaction().execute(async (trx) => {
    const target = await findMemberOfWorkspace(trx, ws.workspaceId, userId);
    if (!target) return fail('not_found', 'No such member.');
    if (target.role === 'admin' && (await countAdmins(trx, ws.workspaceId)) <= 1) return lastAdmin('Removing the only admin');
    await deleteMembership(trx, ws.workspaceId, userId);
    // Policy (server/THREAT-MODEL.md): read-only links live no longer than their maker's access.
    const revoked = await revokeShareLinksOfCreator(trx, ws.workspaceId, userId, now.toISOString());
    const links = revoked === 0 ? '' : ` ${revoked} share link${revoked === 1 ? '' : 's'} they made ${revoked === 1 ? 'was' : 'were'} revoked.`;
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'member.removed',
      entityType: 'user',
      entityId: userId,
      summary: (userId === actor.id ? `${actor.name} left the workspace.` : `${actor.name} removed ${target.name} (${target.role}) from the workspace.`) + links,
      at: now,
    });
    return ok(undefined);
  });
}
