import { type CopiedShared, CopySharedInput, type SharedObject } from '../../shared/schemas/share-link.ts';
import { pathParam, userOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { copyShared, openShared } from './share-links.service.ts';
import type { RouteModule } from '../http/registry.ts';

/** The public side of share links: read with the token alone; copy when signed in. */
export const sharedRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/shared/:token',
    access: 'public',
    handler: async (req, res) => {
      const body: SharedObject = unwrap(await openShared(deps.db, pathParam(req, 'token'), deps.clock()));
      // Tokens sit in the path: keep the answer out of shared caches and the token out of referrers.
      res.set({ 'Cache-Control': 'private, no-store', 'Referrer-Policy': 'no-referrer' }).json(body);
    },
  },
  {
    method: 'post',
    path: '/api/shared/:token/copy',
    // The target workspace is in the body: the service checks the engineer role there.
    access: { anyWorkspace: 'engineer' },
    handler: async (req, res) => {
      const { workspaceId } = CopySharedInput.parse(req.body);
      const body: CopiedShared = unwrap(await copyShared(deps.db, pathParam(req, 'token'), workspaceId, userOf(req), deps.clock()));
      res.status(201).json(body);
    },
  },
];
