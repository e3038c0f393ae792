import type { Db } from '../../../server/db/database.ts';
import { insertionOrder } from '../../../server/db/dialect.ts';
import type { OutboxMessageRow } from '../../../server/mail/outbox.tables.ts';

/**
 * The newest message the sink stored for `to` (optionally with a subject containing `subject`).
 * Polls because some mail (password reset) is sent after the response; gives up after `waitMs`.
 */
export async function waitForMail(db: Db, to: string, subject?: string, waitMs = 10_000): Promise<OutboxMessageRow> {
  const until = Date.now() + waitMs;
  for (;;) {
    let q = db.selectFrom('outbox_message').selectAll().where('to_address', 'like', `%${to}%`);
    if (subject) q = q.where('subject', 'like', `%${subject}%`);
    const row = await q.orderBy('received_at', 'desc').orderBy(insertionOrder(db, 'outbox_message'), 'desc').executeTakeFirst();
    if (row) return row;
    if (Date.now() > until) throw new Error(`no mail to ${to}${subject ? ` about "${subject}"` : ''} within ${waitMs} ms`);
    await new Promise((r) => setTimeout(r, 25));
  }
}

export async function mailCount(db: Db, to: string): Promise<number> {
  const row = await db.selectFrom('outbox_message').select((eb) => eb.fn.countAll<number>().as('n')).where('to_address', 'like', `%${to}%`).executeTakeFirstOrThrow();
  return Number(row.n);
}

/** The first link in the text that starts with `prefix`, and the token after it. */
export function linkIn(text: string, prefix: string): { link: string; token: string } {
  const escaped = prefix.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');
  const m = new RegExp(`${escaped}([A-Za-z0-9_-]+)`).exec(text);
  if (!m) throw new Error(`no link starting ${prefix} in:\n${text}`);
  return { link: m[0], token: m[1] };
}
