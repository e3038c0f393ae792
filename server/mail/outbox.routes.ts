import type { OutboxResponse } from '../../shared/schemas/outbox.ts';
import { HttpError } from '../core/errors.ts';
import { userOf } from '../auth/request-context.ts';
import { outboxOf } from './outbox.service.ts';
import type { RouteModule } from '../http/registry.ts';

export const outboxRoutes: RouteModule = (deps) => [
  {
    // Only while the local sink runs (demo, development, tests); with a real SMTP server there is nothing to show.
    method: 'get',
    path: '/api/outbox',
    access: { anyWorkspace: 'admin' },
    handler: async (req, res) => {
      if (!deps.outboxEnabled) throw new HttpError('not_found', 'There is no local outbox: mail goes to a real SMTP server.');
      const body: OutboxResponse = await outboxOf(deps.db, userOf(req));
      res.json(body);
    },
  },
];
