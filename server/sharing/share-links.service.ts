import { randomUUID } from 'node:crypto';
import { hasRole } from '../../shared/schemas/workspace.ts';
import type { CopiedShared, CreatedShareLink, CreateShareLinkInput, ShareLink, ShareLinkState, ShareLinksQuery, ShareLinksResponse, SharedObject } from '../../shared/schemas/share-link.ts';
import { ShareToken } from '../../shared/schemas/share-link.ts';
import type { Db, Queryable } from '../db/database.ts';
import { findShareLink, findShareLinkByHash, insertShareLink, listShareLinks, revisionIdsOfSetup, revokeShareLinkRow, type ShareLinkViewRow } from './share-links.repository.ts';
import { findSetup } from '../setups/index.ts';
import { findMembership } from '../workspaces/index.ts';
import { recordAudit } from '../audit/index.ts';
import { hashOneTimeToken, newOneTimeToken } from '../core/one-time-tokens.ts';
import { fail, type Failure, ok, type Outcome } from '../core/outcome.ts';
import { shareableKinds } from './share-objects.service.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';


export const sharedPagePath = (token: string) => `/shared/${token}`;

function stateOf(r: Pick<ShareLinkViewRow, 'revoked_at' | 'expires_at'>, now: Date): ShareLinkState {
  if (r.revoked_at) return 'revoked';
  if (r.expires_at && r.expires_at <= now.toISOString()) return 'expired';
  return 'active';
}

async function toLink(db: Queryable, r: ShareLinkViewRow, now: Date): Promise<ShareLink> {
  const described = await shareableKinds[r.object_type]?.describe(db, r.workspace_id, r.object_id);
  return {
    id: r.id,
    objectType: r.object_type,
    objectId: r.object_id,
    label: described?.label ?? 'No longer available',
    setupId: described?.setupId ?? null,
    revisionNumber: described?.revisionNumber ?? null,
    createdBy: { id: r.created_by, name: r.created_by_name },
    createdAt: r.created_at,
    expiresAt: r.expires_at,
    revokedAt: r.revoked_at,
    state: stateOf(r, now),
  };
}

export async function listLinks(db: Db, ws: WorkspaceRef, query: ShareLinksQuery, now: Date): Promise<Outcome<ShareLinksResponse>> {
  let objectIds: string[] | undefined;
  if (query.setupId) {
    if (!(await findSetup(db, ws.workspaceId, query.setupId))) return fail('not_found', 'No such setup in this workspace.');
    objectIds = await revisionIdsOfSetup(db, query.setupId);
  }
  const rows = await listShareLinks(db, ws.workspaceId, objectIds);
  return ok({ links: await Promise.all(rows.map((r) => toLink(db, r, now))) });
}

/** A new link to one object of this workspace. The token is returned here once and kept only as its SHA-256. */
export function createLink(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateShareLinkInput, now: Date): Promise<Outcome<CreatedShareLink>> {
  return db.transaction().execute(async (trx) => {
    const kind = shareableKinds[input.objectType];
    if (!kind) return fail('bad_request', 'This kind of object cannot be shared yet.', [{ path: 'objectType', message: 'Not shareable yet' }]);
    const described = await kind.describe(trx, ws.workspaceId, input.objectId);
    if (!described) return fail('not_found', 'Nothing to share: no such object in this workspace.');
    const expiresAt = input.expiresAt ? new Date(input.expiresAt) : null;
    if (expiresAt && expiresAt.getTime() <= now.getTime()) {
      return fail('bad_request', 'The expiry needs attention.', [{ path: 'expiresAt', message: 'Choose a moment in the future, or no expiry.' }]);
    }
    const { token, hash } = newOneTimeToken();
    const id = randomUUID();
    await insertShareLink(trx, {
      id,
      workspace_id: ws.workspaceId,
      object_type: input.objectType,
      object_id: input.objectId,
      token_hash: hash,
      created_by: actor.id,
      created_at: now.toISOString(),
      expires_at: expiresAt?.toISOString() ?? null,
      revoked_at: null,
    });
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'share_link.created',
      entityType: 'share_link',
      entityId: id,
      summary: `${actor.name} made a read-only link to ${described.label}${expiresAt ? `, valid until ${expiresAt.toISOString().slice(0, 16).replace('T', ' ')} UTC` : ''}.`,
      at: now,
    });
    const row = await findShareLink(trx, ws.workspaceId, id);
    if (!row) throw new Error(`share link ${id} vanished inside its own transaction`);
    return ok({ link: await toLink(trx, row, now), token, path: sharedPagePath(token) });
  });
}

/** Withdraws a link for good; the row stays for the record. Revoking twice is harmless. */
export function revokeLink(db: Db, ws: WorkspaceRef, actor: Actor, linkId: string, now: Date): Promise<Outcome<ShareLink>> {
  return db.transaction().execute(async (trx) => {
    const row = await findShareLink(trx, ws.workspaceId, linkId);
    if (!row) return fail('not_found', 'No such share link in this workspace.');
    if (!row.revoked_at) {
      const at = now.toISOString();
      await revokeShareLinkRow(trx, linkId, at);
      const link = await toLink(trx, row, now);
      await recordAudit(trx, {
        workspaceId: ws.workspaceId,
        actorId: actor.id,
        action: 'share_link.revoked',
        entityType: 'share_link',
        entityId: linkId,
        summary: `${actor.name} withdrew the read-only link to ${link.label} (made by ${row.created_by_name}).`,
        at: now,
      });
      return ok({ ...link, revokedAt: at, state: 'revoked' as const });
    }
    return ok(await toLink(trx, row, now));
  });
}

const unknownLink = (): Failure => fail('not_found', 'This link does not lead anywhere. Check that it was copied whole.');

/** The link a token opens, if it is still good: unknown → 404, withdrawn or expired → 410 with plain words. */
async function liveLink(db: Queryable, token: string, now: Date): Promise<Outcome<ShareLinkViewRow>> {
  if (!ShareToken.safeParse(token).success) return unknownLink();
  const row = await findShareLinkByHash(db, hashOneTimeToken(token));
  if (!row) return unknownLink();
  const state = stateOf(row, now);
  if (state === 'revoked') return fail('gone', 'This link was withdrawn by the person who shared it. Ask them for a new one if you still need it.');
  if (state === 'expired') return fail('gone', `This link expired on ${row.expires_at?.slice(0, 10)}. Ask the person who shared it for a new one if you still need it.`);
  return ok(row);
}

/** What anyone holding the token may read: the one object it names, marked read-only. */
export async function openShared(db: Db, token: string, now: Date): Promise<Outcome<SharedObject>> {
  const link = await liveLink(db, token, now);
  if (!link.ok) return link;
  const view = await shareableKinds[link.value.object_type]?.view(db, link.value);
  return view ? ok(view) : fail('gone', 'What this link pointed to is no longer there.');
}

/** Copies the shared object into a workspace where the caller is engineer or above. */
export function copyShared(db: Db, token: string, workspaceId: string, actor: Actor, now: Date): Promise<Outcome<CopiedShared>> {
  return db.transaction().execute(async (trx) => {
    const link = await liveLink(trx, token, now);
    if (!link.ok) return link;
    const membership = await findMembership(trx, workspaceId, actor.id);
    if (!membership) return fail('not_found', 'No such workspace.');
    if (!hasRole(membership.role, 'engineer')) return fail('forbidden', `Copying in needs the engineer role or above in "${membership.workspace_name}"; you are a ${membership.role} there.`);
    const kind = shareableKinds[link.value.object_type];
    if (!kind) return fail('gone', 'What this link pointed to is no longer there.');
    const copied = await kind.copy(trx, link.value, workspaceId, actor, now);
    if (!copied.ok) return copied;
    return ok({ objectType: link.value.object_type, workspaceId, id: copied.value.id, name: copied.value.name });
  });
}
