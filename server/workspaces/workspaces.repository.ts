import type { Role } from '../../shared/schemas/workspace.ts';
import type { Queryable } from '../db/database.ts';
import type { MembershipRow, NewMembershipRow, NewWorkspaceRow, WorkspaceRow } from './workspaces.tables.ts';

export async function insertWorkspace(db: Queryable, row: NewWorkspaceRow): Promise<void> {
  await db.insertInto('workspace').values(row).execute();
}

export function findWorkspace(db: Queryable, id: string): Promise<WorkspaceRow | undefined> {
  return db.selectFrom('workspace').selectAll().where('id', '=', id).executeTakeFirst();
}

export async function insertMembership(db: Queryable, row: NewMembershipRow): Promise<void> {
  await db.insertInto('membership').values(row).execute();
}

/** The membership of one user in one workspace, with the workspace's name. */
export function findMembership(db: Queryable, workspaceId: string, userId: string) {
  return db
    .selectFrom('membership')
    .innerJoin('workspace', 'workspace.id', 'membership.workspace_id')
    .select(['membership.workspace_id', 'membership.user_id', 'membership.role', 'membership.created_at', 'workspace.name as workspace_name'])
    .where('membership.workspace_id', '=', workspaceId)
    .where('membership.user_id', '=', userId)
    .executeTakeFirst();
}

/** All workspaces of a user, by workspace name. */
export function listMembershipsOfUser(db: Queryable, userId: string) {
  return db
    .selectFrom('membership')
    .innerJoin('workspace', 'workspace.id', 'membership.workspace_id')
    .select(['membership.workspace_id', 'membership.role', 'workspace.name as workspace_name'])
    .where('membership.user_id', '=', userId)
    .orderBy('workspace.name')
    .orderBy('workspace.id')
    .execute();
}

function membersQuery(db: Queryable, workspaceId: string) {
  return db
    .selectFrom('membership')
    .innerJoin('user', 'user.id', 'membership.user_id')
    .select(['membership.user_id', 'membership.role', 'membership.created_at', 'user.name', 'user.email'])
    .where('membership.workspace_id', '=', workspaceId);
}

/** Members of a workspace with their names, by name. */
export function listMembersOfWorkspace(db: Queryable, workspaceId: string) {
  return membersQuery(db, workspaceId).orderBy('user.name').orderBy('user.id').execute();
}
export type MemberRow = Awaited<ReturnType<typeof listMembersOfWorkspace>>[number];

export function findMemberOfWorkspace(db: Queryable, workspaceId: string, userId: string): Promise<MemberRow | undefined> {
  return membersQuery(db, workspaceId).where('membership.user_id', '=', userId).executeTakeFirst();
}

export async function updateMembershipRole(db: Queryable, workspaceId: string, userId: string, role: Role): Promise<void> {
  await db.updateTable('membership').set({ role }).where('workspace_id', '=', workspaceId).where('user_id', '=', userId).execute();
}

export async function deleteMembership(db: Queryable, workspaceId: string, userId: string): Promise<void> {
  await db.deleteFrom('membership').where('workspace_id', '=', workspaceId).where('user_id', '=', userId).execute();
}

export async function countAdmins(db: Queryable, workspaceId: string): Promise<number> {
  const row = await db
    .selectFrom('membership')
    .select((eb) => eb.fn.countAll<number>().as('n'))
    .where('workspace_id', '=', workspaceId)
    .where('role', '=', 'admin')
    .executeTakeFirstOrThrow();
  return Number(row.n);
}

/** Every role a user holds, one per workspace (for routes such as the outbox). */
export function listRolesOfUser(db: Queryable, userId: string): Promise<Pick<MembershipRow, 'role'>[]> {
  return db.selectFrom('membership').select('role').where('user_id', '=', userId).execute();
}

export async function updateWorkspaceSettings(db: Queryable, id: string, patch: { release_needs_second_person: number }): Promise<void> {
  await db.updateTable('workspace').set(patch).where('id', '=', id).execute();
}
