import type { Insertable, Selectable } from 'kysely';

// Only the SHA-256 of the token is stored, so a copy of the database does not let anyone verify
// an address (0010).
export interface EmailVerificationTable {
  id: string;
  user_id: string;
  token_hash: string;
  created_at: string;
  expires_at: string;
  used_at: string | null;
}
export type EmailVerificationRow = Selectable<EmailVerificationTable>;
export type NewEmailVerificationRow = Insertable<EmailVerificationTable>;
