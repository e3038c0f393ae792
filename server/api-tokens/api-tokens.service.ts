import { randomBytes, randomUUID } from 'node:crypto';
import { API_TOKEN_PREFIX, type ApiToken, type ApiTokensResponse, CreateApiTokenInput, type CreatedApiToken } from '../../shared/schemas/api-token.ts';
import type { Db } from '../db/database.ts';
import type { Actor } from '../core/actor.ts';
import { hashOneTimeToken } from '../core/one-time-tokens.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { recordAudit } from '../audit/index.ts';
import { findMembership } from '../workspaces/index.ts';
import { type ApiTokenViewRow, findApiTokenOfUser, insertApiToken, listApiTokensOfUser, revokeApiTokenRow } from './api-tokens.repository.ts';

const DAY_MS = 86_400_000;

function toApiToken(r: ApiTokenViewRow, now: Date): ApiToken {
  return {
    id: r.id,
    name: r.name,
    workspaceId: r.workspace_id,
    workspaceName: r.workspace_name,
    scope: r.scope,
    createdAt: r.created_at,
    expiresAt: r.expires_at,
    lastUsedAt: r.last_used_at,
    state: r.expires_at <= now.toISOString() ? 'expired' : 'active',
  };
}

/** A new token text (`rw_pat_` + 32 random bytes) and the SHA-256 that is stored instead. */
export function newApiTokenText(): { token: string; hash: string } {
  const token = `${API_TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`;
  return { token, hash: hashOneTimeToken(token) };
}

export async function listMyApiTokens(db: Db, actor: Actor, now: Date): Promise<ApiTokensResponse> {
  const rows = await listApiTokensOfUser(db, actor.id);
  return { tokens: rows.map((r) => toApiToken(r, now)) };
}

/** Makes a token for one workspace the caller belongs to; the token is returned here once. */
export function createApiToken(db: Db, actor: Actor, raw: unknown, now: Date): Promise<Outcome<CreatedApiToken>> {
  const input = CreateApiTokenInput.parse(raw);
  return db.transaction().execute(async (trx) => {
    const membership = await findMembership(trx, input.workspaceId, actor.id);
    if (!membership) return fail('not_found', 'No such workspace.', [{ path: 'workspaceId', message: 'You are not a member of this workspace.' }]);
    if (input.scope === 'write' && membership.role === 'viewer') {
      return fail('bad_request', 'A viewer can change nothing, so a write token would do no more than a read token.', [
        { path: 'scope', message: 'Choose read: you are a viewer in this workspace.' },
      ]);
    }
    const { token, hash } = newApiTokenText();
    const id = randomUUID();
    const expiresAt = new Date(now.getTime() + input.expiresInDays * DAY_MS);
    await insertApiToken(trx, {
      id,
      user_id: actor.id,
      workspace_id: input.workspaceId,
      name: input.name,
      scope: input.scope,
      token_hash: hash,
      created_at: now.toISOString(),
      expires_at: expiresAt.toISOString(),
      last_used_at: null,
      revoked_at: null,
    });
    await recordAudit(trx, {
      workspaceId: input.workspaceId,
      actorId: actor.id,
      action: 'api_token.created',
      entityType: 'api_token',
      entityId: id,
      summary: `Created the ${input.scope} API token “${input.name}”, valid until ${expiresAt.toISOString().slice(0, 10)}.`,
      at: now,
    });
    const row = await findApiTokenOfUser(trx, actor.id, id);
    if (!row) throw new Error(`api token ${id} vanished inside its own transaction`);
    return ok({ token, apiToken: toApiToken(row, now) });
  });
}

/** Revokes one of the caller's own tokens; someone else's or an already revoked one is 404. */
export function revokeApiToken(db: Db, actor: Actor, tokenId: string, now: Date): Promise<Outcome<null>> {
  return db.transaction().execute(async (trx) => {
    const row = await findApiTokenOfUser(trx, actor.id, tokenId);
    if (!row || row.revoked_at) return fail('not_found', 'No such API token.');
    await revokeApiTokenRow(trx, tokenId, now.toISOString());
    await recordAudit(trx, {
      workspaceId: row.workspace_id,
      actorId: actor.id,
      action: 'api_token.revoked',
      entityType: 'api_token',
      entityId: tokenId,
      summary: `Revoked the ${row.scope} API token “${row.name}”.`,
      at: now,
    });
    return ok(null);
  });
}
