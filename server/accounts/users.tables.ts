import type { Insertable, Selectable } from 'kysely';

export interface UserTable {
  id: string;
  /** Lower-cased; unique. */
  email: string;
  name: string;
  /** `scrypt$N$r$p$salt$hash`, see server/auth/password.ts. */
  password_hash: string;
  /** Bumped on sign-out and password change; session tokens carry it and die when it moves. */
  session_version: number;
  created_at: string;
}
export type UserRow = Selectable<UserTable>;
export type NewUserRow = Insertable<UserTable>;
