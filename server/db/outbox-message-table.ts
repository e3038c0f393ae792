import type { Insertable, Selectable } from 'kysely';

/** Messages caught by the local mail sink (server/mail/sink.ts). */
export interface OutboxMessageTable {
  id: string;
  received_at: string;
  from_address: string;
  to_address: string;
  subject: string;
  text_body: string;
  html_body: string | null;
}
export type OutboxMessageRow = Selectable<OutboxMessageTable>;
export type NewOutboxMessageRow = Insertable<OutboxMessageTable>;
