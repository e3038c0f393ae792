import type { Request, RequestHandler } from 'express';
import { ApiTokenText } from '../../shared/schemas/api-token.ts';
import type { Queryable } from '../db/database.ts';
import type { ApiTokenContext, SessionUser } from '../auth/request-context.ts';
import { HttpError } from '../core/errors.ts';
import { hashOneTimeToken } from '../core/one-time-tokens.ts';
import { findLiveApiTokenByHash, markApiTokenUsed } from './api-tokens.repository.ts';

/** `last_used_at` is written at most this often per token, so a script's reads do not each write a row. */
const LAST_USED_RESOLUTION_MS = 60_000;

/** The token of an `Authorization: Bearer …` header; null when the request sends no bearer header. */
export function bearerOf(req: Request): string | null {
  const header = req.get('authorization');
  if (!header) return null;
  const match = /^bearer\s+(.*)$/i.exec(header.trim());
  return match ? (match[1] ?? '') : null;
}

/**
 * The person and token behind a bearer token, or 401. Expired, revoked, unknown and malformed
 * tokens are refused alike, so the answer says nothing about which tokens exist.
 */
export async function bearerCaller(db: Queryable, token: string, now: Date): Promise<{ user: SessionUser; apiToken: ApiTokenContext }> {
  if (!ApiTokenText.safeParse(token).success) throw new HttpError('unauthenticated', 'This API token is unknown, expired or revoked.');
  const row = await findLiveApiTokenByHash(db, hashOneTimeToken(token), now.toISOString());
  if (!row) throw new HttpError('unauthenticated', 'This API token is unknown, expired or revoked.');
  if (!row.last_used_at || now.getTime() - new Date(row.last_used_at).getTime() >= LAST_USED_RESOLUTION_MS) {
    await markApiTokenUsed(db, row.id, now.toISOString());
  }
  return {
    user: { id: row.user_id, name: row.user_name, email: row.user_email, sessionVersion: row.session_version, emailVerified: row.email_verified_at !== null },
    apiToken: { id: row.id, workspaceId: row.workspace_id, scope: row.scope },
  };
}

const readOnlyMethods = new Set(['GET', 'HEAD']);

/**
 * The token's limits on one route, before the membership check: only routes inside a workspace,
 * only the token's workspace (any other answers as to a non-member), and writes only with the
 * write scope. The person's current role is checked after this by `requireMember`, as for a session.
 */
export function apiTokenGate(workspaceScoped: boolean): RequestHandler {
  return (req, _res, next) => {
    const token = req.apiToken;
    if (!token) return next();
    if (!workspaceScoped) throw new HttpError('forbidden', 'API tokens work only on routes inside their workspace (/api/workspaces/…); this one needs a signed-in session.');
    if (req.params.workspaceId !== token.workspaceId) throw new HttpError('not_found', 'No such workspace.');
    if (token.scope !== 'write' && !readOnlyMethods.has(req.method)) {
      throw new HttpError('forbidden', 'This API token has the read scope: it may only read. Make a token with the write scope to change things.');
    }
    next();
  };
}
