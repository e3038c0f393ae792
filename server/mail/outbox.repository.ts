import { sql } from 'kysely';
import { insertionOrder } from '../db/dialect.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { NewOutboxMessageRow, OutboxMessageRow } from './outbox.tables.ts';

/** Stores a caught message and its envelope recipients (lower-cased) together. */
export async function insertOutboxMessage(db: Db, recipients: string[], row: NewOutboxMessageRow): Promise<void> {
  await db.transaction().execute(async (trx) => {
    await trx.insertInto('outbox_message').values(row).execute();
    if (recipients.length) await trx.insertInto('outbox_recipient').values(recipients.map((address) => ({ message_id: row.id, address }))).execute();
  });
}

/** Who is reading the outbox. */
export interface OutboxReader {
  userId: string;
  /** Lower-cased, as stored on the user. */
  email: string;
  /** Until the address is confirmed, mail about workspaces sent to it (an invitation) stays hidden. */
  emailVerified: boolean;
}

/**
 * The newest messages `reader` may see: those sent to the reader's own address, and those about
 * a workspace the reader administers (invitations, sheet mail). Account mail about someone else
 * (a password reset) is never shown to anyone but its recipient, so administering a workspace,
 * which anyone can do on a demo instance by signing up, does not open other people's accounts.
 * An account that has not confirmed its address sees only account mail sent to it (the
 * confirmation itself), never an invitation to that address.
 */
export function listOutboxMessagesFor(db: Queryable, reader: OutboxReader, limit: number): Promise<OutboxMessageRow[]> {
  return db
    .selectFrom('outbox_message')
    .selectAll()
    .where((eb) =>
      eb.or([
        eb.exists(
          eb
            .selectFrom('outbox_recipient')
            .select(sql`1`.as('one'))
            .whereRef('outbox_recipient.message_id', '=', 'outbox_message.id')
            .where('outbox_recipient.address', '=', reader.email.toLowerCase())
            .where((w) => (reader.emailVerified ? w.lit(true) : w('outbox_message.workspace_id', 'is', null))),
        ),
        eb(
          'outbox_message.workspace_id',
          'in',
          eb.selectFrom('membership').select('membership.workspace_id').where('membership.user_id', '=', reader.userId).where('membership.role', '=', 'admin'),
        ),
      ]),
    )
    .orderBy('received_at', 'desc')
    .orderBy(insertionOrder(db, 'outbox_message'), 'desc')
    .limit(limit)
    .execute();
}
