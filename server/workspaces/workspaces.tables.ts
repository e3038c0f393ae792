import type { Generated, Insertable, Selectable } from 'kysely';
import type { Role } from '../../shared/schemas/workspace.ts';

export interface WorkspaceTable {
  id: string;
  name: string;
  created_at: string;
  /** 1 when a sheet must be released by a lead other than its author and submitter. */
  release_needs_second_person: Generated<number>;
}
export type WorkspaceRow = Selectable<WorkspaceTable>;
export type NewWorkspaceRow = Insertable<WorkspaceTable>;

export interface MembershipTable {
  workspace_id: string;
  user_id: string;
  role: Role;
  created_at: string;
}
export type MembershipRow = Selectable<MembershipTable>;
export type NewMembershipRow = Insertable<MembershipTable>;
