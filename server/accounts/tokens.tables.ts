import type { Insertable, Selectable } from 'kysely';
import type { Role } from '../../shared/schemas/workspace.ts';

// One-time links: only the SHA-256 of the token is stored, so a copy of the database
// does not let anyone accept an invitation or reset a password.

export interface InvitationTable {
  id: string;
  workspace_id: string;
  /** Lower-cased address the invitation was sent to. */
  email: string;
  role: Role;
  token_hash: string;
  invited_by: string;
  created_at: string;
  expires_at: string;
  accepted_at: string | null;
}
export type InvitationRow = Selectable<InvitationTable>;
export type NewInvitationRow = Insertable<InvitationTable>;

export interface PasswordResetTable {
  id: string;
  user_id: string;
  token_hash: string;
  created_at: string;
  expires_at: string;
  used_at: string | null;
}
export type PasswordResetRow = Selectable<PasswordResetTable>;
export type NewPasswordResetRow = Insertable<PasswordResetTable>;
