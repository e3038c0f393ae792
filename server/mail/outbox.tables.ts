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
  /** The workspace the message is about (invitation, sheet mail); null for account mail (reset). */
  workspace_id: string | null;
}
export type OutboxMessageRow = Selectable<OutboxMessageTable>;
export type NewOutboxMessageRow = Insertable<OutboxMessageTable>;

/** One envelope recipient of an outbox message, lower-cased (migrations/0007_outbox_audience.ts). */
export interface OutboxRecipientTable {
  message_id: string;
  address: string;
}
