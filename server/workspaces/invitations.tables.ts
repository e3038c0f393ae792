import type { Insertable, Selectable } from 'kysely';
import type { Role } from '../../shared/schemas/workspace.ts';

// Only the SHA-256 of the token is stored, so a copy of the database does not let anyone
// accept an invitation.
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
