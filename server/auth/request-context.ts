import type { Request } from 'express';
import type { ApiTokenScope } from '../../shared/schemas/api-token.ts';
import type { Role } from '../../shared/schemas/workspace.ts';

/** The signed-in caller, set by `requireUser`. */
export interface SessionUser {
  id: string;
  name: string;
  email: string;
  sessionVersion: number;
  /** The address was proved by a mailed link (or a mailed invitation). */
  emailVerified: boolean;
}

/** The personal API token a request was made with (`Authorization: Bearer rw_pat_…`), set by `loadSession`. */
export interface ApiTokenContext {
  id: string;
  workspaceId: string;
  scope: ApiTokenScope;
}

/** The caller's membership of the workspace in the path, set by `requireMember`. */
export interface WorkspaceContext {
  workspaceId: string;
  workspaceName: string;
  role: Role;
}

declare global {
   
  namespace Express {
    interface Request {
      user?: SessionUser;
      workspace?: WorkspaceContext;
      /** Nonce of the CSRF cookie the caller's session was issued beside. */
      sessionCsrf?: string;
      /** Set when the caller came with a personal API token instead of a session. */
      apiToken?: ApiTokenContext;
    }
  }
}

/** The caller on a route declared with access other than 'public'. */
export function userOf(req: Request): SessionUser {
  if (!req.user) throw new Error(`route ${req.method} ${req.path} reads the user but is not behind requireUser`);
  return req.user;
}

/** The caller's workspace membership on a route declared with a role. */
export function workspaceOf(req: Request): WorkspaceContext {
  if (!req.workspace) throw new Error(`route ${req.method} ${req.path} reads the workspace but declares no role`);
  return req.workspace;
}

/** A named `:param` of the route path (Express 5 types params as string | string[] because of splats). */
export function pathParam(req: Request, name: string): string {
  const value = req.params[name];
  if (typeof value !== 'string') throw new Error(`route ${req.method} ${req.path} has no :${name}`);
  return value;
}
