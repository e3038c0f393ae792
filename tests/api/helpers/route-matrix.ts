import request from 'supertest';
import { hasRole } from '../../../shared/schemas/workspace.ts';
import type { ErrorCode } from '../../../shared/errors.ts';
import type { Access } from '../../../server/http/registry.ts';
import { anonymousHeaders, sessionHeaders } from './people.ts';
import { type Caller, type RoleWorld, userOfCaller } from './role-world.ts';

/** A request the route accepts from a caller who has access. */
export interface MatrixRequest {
  /** Concrete path, e.g. `/api/workspaces/${world.workspaceId}/members`. */
  path: string;
  /** JSON body for POST/PUT/PATCH. */
  body?: unknown;
  /** For anything else (multipart uploads, query strings): adjust the request before it is sent. */
  customize?: (req: request.Test) => request.Test;
}

/**
 * How the route × role test calls one route. Keyed by `METHOD /api/path` exactly as declared in
 * the registry (see `routeKey`). `build` runs once per caller, so create a fresh target there
 * (a new invitation to revoke, a new member to remove) rather than reusing one.
 */
export interface MatrixEntry {
  /** The access the product requires, stated independently of the route's declaration; they must agree. */
  access: Access;
  /** Status of a successful call (200, 201, 202, 204). */
  ok: number;
  build: (world: RoleWorld, caller: Caller) => Promise<MatrixRequest> | MatrixRequest;
}
export type MatrixEntries = Record<string, MatrixEntry>;

export interface Expectation {
  status: number;
  code?: ErrorCode;
}

/** What the declared access says this caller gets. */
export function expectedFor(access: Access, caller: Caller, ok: number): Expectation {
  if (access === 'public') return { status: ok };
  if (caller === 'signedOut') return { status: 401, code: 'unauthenticated' };
  if (access === 'user') return { status: ok };
  if (typeof access === 'object') {
    // The stranger administers their own workspace.
    const best = caller === 'stranger' ? 'admin' : caller;
    return hasRole(best, access.anyWorkspace) ? { status: ok } : { status: 403, code: 'forbidden' };
  }
  if (caller === 'stranger') return { status: 404, code: 'not_found' };
  return hasRole(caller, access) ? { status: ok } : { status: 403, code: 'forbidden' };
}

/** Sends the entry's request as `caller`, with a current session (if any) and a valid CSRF token. */
export async function sendAs(world: RoleWorld, method: string, req: MatrixRequest, caller: Caller): Promise<request.Response> {
  const user = userOfCaller(world, caller);
  const headers = user ? await sessionHeaders(world.t, user.id) : anonymousHeaders(world.t);
  const agent = request(world.t.url);
  let r: request.Test = agent[method as 'get' | 'post' | 'put' | 'patch' | 'delete'](req.path).set(headers);
  if (req.customize) r = req.customize(r);
  else if (req.body !== undefined) r = r.send(req.body as object);
  return r;
}
