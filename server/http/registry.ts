import { type RequestHandler, Router } from 'express';
import { rateLimit } from 'express-rate-limit';
import type { Role } from '../../shared/schemas/workspace.ts';
import { ensureCsrfCookie } from '../auth/csrf.ts';
import { requireUser } from '../auth/require-user.ts';
import type { AppDeps } from '../deps.ts';
import { sendError } from '../core/errors.ts';
import { heavyJobLimit, SharedRateLimitStore } from '../limits/index.ts';
import { requireMember, requireRoleAnywhere } from '../workspaces/index.ts';

/**
 * Who may call a route:
 * - `'public'`: anyone, signed in or not;
 * - `'user'`: any signed-in person;
 * - a `Role`: a member of the `:workspaceId` in the path with that role or above
 *   (signed out → 401, not a member → 404, lower role → 403);
 * - `{ anyWorkspace: Role }`: signed in with that role in at least one workspace (else 401/403).
 */
export type Access = 'public' | 'user' | Role | { anyWorkspace: Role };

export type Method = 'get' | 'post' | 'put' | 'patch' | 'delete';

/** One API route, declared once; the app mounts it and the route × role test walks it. */
export interface RouteDef {
  method: Method;
  /** Full Express path starting with `/api/`; role-scoped paths contain `:workspaceId`. */
  path: string;
  access: Access;
  /** Counts requests per address (sign-in, sign-up, reset, invitation accept). */
  rateLimited?: boolean;
  /** Starts heavy work (worker pool): per-person limits apply before the body is read. */
  heavy?: boolean;
  /** Sets the readable CSRF cookie before the access check (GET /api/config, /api/auth/me). */
  issuesCsrf?: boolean;
  /** Middleware that runs after the access check, before the handler (e.g. multer for an upload). */
  before?: RequestHandler[];
  /** Rejected promises reach the error middleware (Express 5). */
  handler: RequestHandler;
}

/** A feature's routes, built from the app's dependencies. */
export type RouteModule = (deps: AppDeps) => RouteDef[];

export const routeKey = (r: Pick<RouteDef, 'method' | 'path'>) => `${r.method.toUpperCase()} ${r.path}`;

function accessCheck(access: Access, deps: AppDeps): RequestHandler[] {
  if (access === 'public') return [];
  if (access === 'user') return [requireUser];
  if (typeof access === 'object') return [requireUser, requireRoleAnywhere(deps.db, access.anyWorkspace)];
  return [requireUser, requireMember(deps.db, access)];
}

function limiter(deps: AppDeps, key: string): RequestHandler | null {
  if (deps.rateLimit <= 0) return null;
  return rateLimit({
    // counted in the database, so every server process on it sees the same attempts
    store: new SharedRateLimitStore(deps.db, deps.clock, `address:${key}:`),
    windowMs: 15 * 60_000,
    limit: deps.rateLimit,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, res) => sendError(res, 'rate_limited', 'Too many attempts from this address; wait a few minutes and try again.'),
  });
}

/** Checks the declarations (bugs fail at start-up) and mounts them on a new router. */
export function buildApiRouter(routes: RouteDef[], deps: AppDeps): Router {
  const router = Router();
  const seen = new Set<string>();
  const heavyLimit = heavyJobLimit(deps.db, deps.clock, deps.heavyJobs);
  for (const route of routes) {
    const key = routeKey(route);
    if (seen.has(key)) throw new Error(`route ${key} is declared twice`);
    seen.add(key);
    if (!route.path.startsWith('/api/')) throw new Error(`route ${key} must start with /api/`);
    const scoped = typeof route.access === 'string' && route.access !== 'public' && route.access !== 'user';
    if (scoped && !route.path.includes(':workspaceId')) throw new Error(`route ${key} declares a role but has no :workspaceId`);

    const chain: RequestHandler[] = [];
    const limit = route.rateLimited ? limiter(deps, key) : null;
    if (limit) chain.push(limit);
    if (route.issuesCsrf) chain.push((req, res, next) => (ensureCsrfCookie(req, res, deps.secret), next()));
    chain.push(...accessCheck(route.access, deps), ...(route.heavy ? [heavyLimit] : []), ...(route.before ?? []), route.handler);
    router[route.method](route.path, ...chain);
  }
  return router;
}
