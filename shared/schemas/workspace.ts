import { z } from 'zod';
import { Email, Id, IsoDateTime, NewPassword, PersonName, plainLine, plainLineMessage } from './fields.ts';

export const roles = ['viewer', 'engineer', 'lead', 'admin'] as const;
/** A member's role in one workspace; each role can do everything the one below it can. */
export const Role = z.enum(roles);
export type Role = z.infer<typeof Role>;

export const roleRank: Record<Role, number> = { viewer: 0, engineer: 1, lead: 2, admin: 3 };

/** True when `role` is `least` or above. */
export function hasRole(role: Role, least: Role): boolean {
  return roleRank[role] >= roleRank[least];
}

export const WorkspaceName = z.string().trim().min(1, 'Required').max(100, 'At most 100 characters').regex(plainLine, plainLineMessage);

/** One of the caller's workspaces, as listed in `Me`. */
export const Membership = z.object({ workspaceId: Id, workspaceName: z.string(), role: Role });
export type Membership = z.infer<typeof Membership>;

/** GET /api/workspaces/:workspaceId */
export const WorkspaceSettings = z.object({
  /** A target sheet is released only by a lead other than the one who wrote or submitted it. */
  releaseNeedsSecondPerson: z.boolean(),
});
export type WorkspaceSettings = z.infer<typeof WorkspaceSettings>;

export const WorkspaceInfo = z.object({ id: Id, name: z.string(), role: Role, settings: WorkspaceSettings });
export type WorkspaceInfo = z.infer<typeof WorkspaceInfo>;

export const Member = z.object({
  userId: Id,
  name: z.string(),
  email: z.string(),
  role: Role,
  joinedAt: IsoDateTime,
});
export type Member = z.infer<typeof Member>;

/** A pending invitation (admins only). */
export const Invitation = z.object({
  id: Id,
  email: z.string(),
  role: Role,
  createdAt: IsoDateTime,
  expiresAt: IsoDateTime,
});
export type Invitation = z.infer<typeof Invitation>;

export const MembersResponse = z.object({ members: z.array(Member), invitations: z.array(Invitation) });
export type MembersResponse = z.infer<typeof MembersResponse>;

/** POST /api/workspaces/:workspaceId/invitations */
export const InviteInput = z.object({ email: Email, role: Role });
export type InviteInput = z.infer<typeof InviteInput>;

/**
 * GET /api/invitations/:token — what the person following the link sees. It never says whether
 * the address already has an account: the page offers both ways in.
 */
export const InvitationInfo = z.object({
  workspaceName: z.string(),
  email: z.string(),
  role: Role,
  /** Name of the admin who sent it. */
  invitedBy: z.string(),
});
export type InvitationInfo = z.infer<typeof InvitationInfo>;

/**
 * POST /api/invitations/:token/accept. Name and password are required only when no account
 * exists for the invited address; the server answers 400 naming the missing field.
 */
export const AcceptInvitationInput = z.object({
  name: PersonName.optional(),
  password: NewPassword.optional(),
});
export type AcceptInvitationInput = z.infer<typeof AcceptInvitationInput>;

/** PATCH /api/workspaces/:workspaceId/members/:userId */
export const RoleChangeInput = z.object({ role: Role });
export type RoleChangeInput = z.infer<typeof RoleChangeInput>;
