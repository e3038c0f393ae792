import type { ApiTokensResponse, CreatedApiToken } from '../../shared/schemas/api-token.ts';
import { pathParam, userOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import type { RouteModule } from '../http/registry.ts';
import { createApiToken, listMyApiTokens, revokeApiToken } from './api-tokens.service.ts';

const base = '/api/account/api-tokens';

// Session-only ('user' access): a token cannot list, make or revoke tokens (apiTokenGate refuses it).
export const apiTokenRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'user',
    handler: async (req, res) => {
      const body: ApiTokensResponse = await listMyApiTokens(deps.db, userOf(req), deps.clock());
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'user',
    handler: async (req, res) => {
      const body: CreatedApiToken = unwrap(await createApiToken(deps.db, userOf(req), req.body, deps.clock()));
      // The token is in this answer only; keep it out of caches.
      res.set('Cache-Control', 'no-store').status(201).json(body);
    },
  },
  {
    method: 'delete',
    path: `${base}/:tokenId`,
    access: 'user',
    handler: async (req, res) => {
      unwrap(await revokeApiToken(deps.db, userOf(req), pathParam(req, 'tokenId'), deps.clock()));
      res.status(204).end();
    },
  },
];
