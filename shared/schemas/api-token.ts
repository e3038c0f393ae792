import { z } from 'zod';
import { Id, IsoDateTime, plainLine, plainLineMessage } from './fields.ts';

/**
 * Personal API tokens: a person's key for scripts, for one workspace. `read` allows GET routes
 * only; `write` also allows what the person's current role allows to change. The token itself
 * (`rw_pat_` + 32 random bytes, base64url) is shown once at creation; only its SHA-256 is kept.
 */

export const apiTokenScopes = ['read', 'write'] as const;
export const ApiTokenScope = z.enum(apiTokenScopes);
export type ApiTokenScope = z.infer<typeof ApiTokenScope>;

export const API_TOKEN_PREFIX = 'rw_pat_';
export const API_TOKEN_DEFAULT_DAYS = 90;
export const API_TOKEN_MAX_DAYS = 365;

/** A token as sent in `Authorization: Bearer …`. */
export const ApiTokenText = z.string().regex(/^rw_pat_[A-Za-z0-9_-]{43,128}$/, 'Not a Ridewright API token');

/** POST /api/account/api-tokens. */
export const CreateApiTokenInput = z.object({
  workspaceId: Id,
  name: z.string().trim().min(1, 'Required').max(80, 'At most 80 characters').regex(plainLine, plainLineMessage),
  scope: ApiTokenScope,
  expiresInDays: z.number().int().min(1, 'At least 1 day').max(API_TOKEN_MAX_DAYS, `At most ${API_TOKEN_MAX_DAYS} days`).default(API_TOKEN_DEFAULT_DAYS),
});
export type CreateApiTokenInput = z.input<typeof CreateApiTokenInput>;

export const ApiTokenState = z.enum(['active', 'expired']);
export type ApiTokenState = z.infer<typeof ApiTokenState>;

/** A token as listed: never the token itself. */
export const ApiToken = z.object({
  id: Id,
  name: z.string(),
  workspaceId: Id,
  workspaceName: z.string(),
  scope: ApiTokenScope,
  createdAt: IsoDateTime,
  expiresAt: IsoDateTime,
  lastUsedAt: IsoDateTime.nullable(),
  state: ApiTokenState,
});
export type ApiToken = z.infer<typeof ApiToken>;

/** GET /api/account/api-tokens: the caller's tokens that are not revoked, newest first. */
export const ApiTokensResponse = z.object({ tokens: z.array(ApiToken) });
export type ApiTokensResponse = z.infer<typeof ApiTokensResponse>;

/** The answer to a create: the only time the token is sent. */
export const CreatedApiToken = z.object({ token: ApiTokenText, apiToken: ApiToken });
export type CreatedApiToken = z.infer<typeof CreatedApiToken>;
