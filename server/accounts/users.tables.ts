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
  /** When the address was proved by a mailed link (or by accepting a mailed invitation); null until then (0010). */
  email_verified_at: string | null;
  /** Display units as JSON (shared/schemas/unit-preferences.ts); null until the person picks (0015). */
  unit_preferences: string | null;
}
export type UserRow = Selectable<UserTable>;
export type NewUserRow = Insertable<UserTable>;
