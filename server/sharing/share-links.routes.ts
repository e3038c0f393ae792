import { type CreatedShareLink, CreateShareLinkInput, type ShareLink, ShareLinksQuery, type ShareLinksResponse } from '../../shared/schemas/share-link.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { createLink, listLinks, revokeLink } from './share-links.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/share-links';

export const shareLinkRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: ShareLinksResponse = unwrap(await listLinks(deps.db, workspaceOf(req), ShareLinksQuery.parse(req.query), deps.clock()));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      const input = CreateShareLinkInput.parse(req.body);
      const body: CreatedShareLink = unwrap(await createLink(deps.db, workspaceOf(req), userOf(req), input, deps.clock()));
      // The token is in this answer only; keep it out of caches.
      res.set('Cache-Control', 'no-store').status(201).json(body);
    },
  },
  {
    method: 'delete',
    path: `${base}/:linkId`,
    access: 'engineer',
    handler: async (req, res) => {
      const body: ShareLink = unwrap(await revokeLink(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'linkId'), deps.clock()));
      res.json(body);
    },
  },
];
