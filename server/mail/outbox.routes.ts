import type { OutboxResponse } from '../../shared/schemas/outbox.ts';
import { HttpError } from '../core/errors.ts';
import { userOf } from '../auth/request-context.ts';
import { listOutboxMessagesFor } from './outbox.repository.ts';
import type { RouteModule } from '../http/registry.ts';

const OUTBOX_LIMIT = 200;

export const outboxRoutes: RouteModule = (deps) => [
  {
    // Only while the local sink runs (demo, development, tests); with a real SMTP server there is nothing to show.
    method: 'get',
    path: '/api/outbox',
    access: { anyWorkspace: 'admin' },
    handler: async (req, res) => {
      if (!deps.outboxEnabled) throw new HttpError('not_found', 'There is no local outbox: mail goes to a real SMTP server.');
      const me = userOf(req);
      const rows = await listOutboxMessagesFor(deps.db, { userId: me.id, email: me.email }, OUTBOX_LIMIT);
      const body: OutboxResponse = {
        messages: rows.map((r) => ({
          id: r.id,
          receivedAt: r.received_at,
          from: r.from_address,
          to: r.to_address,
          subject: r.subject,
          text: r.text_body,
          ...(r.html_body !== null ? { html: r.html_body } : {}),
        })),
      };
      res.json(body);
    },
  },
];
