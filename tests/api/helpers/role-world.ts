import { roles, type Role } from '../../../shared/schemas/workspace.ts';
import { addMember, createUser, createWorkspace, type TestUser } from './people.ts';
import type { TestApp } from './test-app.ts';

/** Who calls in the route × role test: signed out, a stranger (admin elsewhere), or a member with a role. */
export type Caller = 'signedOut' | 'stranger' | Role;
export const callers: Caller[] = ['signedOut', 'stranger', ...roles];

/** One workspace with a member per role, and a stranger who administers a second workspace. */
export interface RoleWorld {
  t: TestApp;
  workspaceId: string;
  otherWorkspaceId: string;
  members: Record<Role, TestUser>;
  stranger: TestUser;
  /** A user in no workspace, for routes that sign someone in (sign-in, reset). */
  spare: TestUser;
}

export async function createRoleWorld(t: TestApp): Promise<RoleWorld> {
  const workspaceId = await createWorkspace(t.db, 'Matrix workspace');
  const otherWorkspaceId = await createWorkspace(t.db, 'Somebody else’s workspace');
  const members = {} as Record<Role, TestUser>;
  for (const role of roles) {
    members[role] = await createUser(t.db, { name: `Matrix ${role}` });
    await addMember(t.db, workspaceId, members[role].id, role);
  }
  const stranger = await createUser(t.db, { name: 'Matrix stranger' });
  await addMember(t.db, otherWorkspaceId, stranger.id, 'admin');
  const spare = await createUser(t.db, { name: 'Matrix spare' });
  return { t, workspaceId, otherWorkspaceId, members, stranger, spare };
}

export function userOfCaller(world: RoleWorld, caller: Caller): TestUser | null {
  if (caller === 'signedOut') return null;
  if (caller === 'stranger') return world.stranger;
  return world.members[caller];
}
