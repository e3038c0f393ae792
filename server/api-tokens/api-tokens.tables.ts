import type { Insertable } from 'kysely';
import type { ApiTokenScope } from '../../shared/schemas/api-token.ts';

/** A person's token for scripts in one workspace. Only the SHA-256 of the token is kept. */
export interface ApiTokenTable {
  id: string;
  user_id: string;
  workspace_id: string;
  name: string;
  scope: ApiTokenScope;
  token_hash: string;
  created_at: string;
  expires_at: string;
  last_used_at: string | null;
  revoked_at: string | null;
}
export type NewApiTokenRow = Insertable<ApiTokenTable>;
