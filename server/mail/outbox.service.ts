import type { OutboxResponse } from '../../shared/schemas/outbox.ts';
import type { SessionUser } from '../auth/request-context.ts';
import type { Queryable } from '../db/database.ts';
import { listOutboxMessagesFor } from './outbox.repository.ts';

const OUTBOX_LIMIT = 200;

/** The newest mail the local sink caught that was sent to `me` (by address or as a recipient). */
export async function outboxOf(db: Queryable, me: Pick<SessionUser, 'id' | 'email' | 'emailVerified'>): Promise<OutboxResponse> {
  const rows = await listOutboxMessagesFor(db, { userId: me.id, email: me.email, emailVerified: me.emailVerified }, OUTBOX_LIMIT);
  return {
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
}
