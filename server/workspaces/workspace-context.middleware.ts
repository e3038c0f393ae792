import type { RequestHandler } from 'express';
import { hasRole, type Role } from '../../shared/schemas/workspace.ts';
import type { Db } from '../db/database.ts';
import { HttpError } from '../core/errors.ts';
import { findMembership, listRolesOfUser } from './workspaces.repository.ts';

const notFound = () => new HttpError('not_found', 'No such workspace.');

/**
 * For routes under `/api/workspaces/:workspaceId`: loads the caller's membership into
 * `req.workspace`. Not a member → 404 (the workspace's existence stays private); a role below
 * `least` → 403. Runs after `requireUser`.
 */
export function requireMember(db: Db, least: Role): RequestHandler {
  return async (req, _res, next) => {
    const user = req.user;
    const workspaceId = req.params.workspaceId;
    if (!user) throw new HttpError('unauthenticated', 'Please sign in.');
    if (typeof workspaceId !== 'string') throw new Error(`${req.method} ${req.route?.path} declares a role but has no :workspaceId`);
    const m = await findMembership(db, workspaceId, user.id);
    if (!m) throw notFound();
    if (!hasRole(m.role, least)) throw new HttpError('forbidden', `This needs the ${least} role or above; you are ${m.role === 'admin' ? 'an' : 'a'} ${m.role} here.`);
    req.workspace = { workspaceId: m.workspace_id, workspaceName: m.workspace_name, role: m.role };
    next();
  };
}

/** For routes outside a workspace that need a role somewhere (the outbox needs admin of at least one). */
export function requireRoleAnywhere(db: Db, least: Role): RequestHandler {
  return async (req, _res, next) => {
    if (!req.user) throw new HttpError('unauthenticated', 'Please sign in.');
    const roles = await listRolesOfUser(db, req.user.id);
    if (!roles.some((r) => hasRole(r.role, least))) throw new HttpError('forbidden', `This needs the ${least} role in at least one workspace.`);
    next();
  };
}
