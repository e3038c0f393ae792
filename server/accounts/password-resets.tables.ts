import type { Insertable, Selectable } from 'kysely';

// Only the SHA-256 of the token is stored, so a copy of the database does not let anyone
// reset a password.
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
