import { z } from 'zod';
import { Id, IsoDateTime } from './fields.ts';

/** A message caught by the local mail sink (demo, development and tests only). */
export const OutboxMessage = z.object({
  id: Id,
  receivedAt: IsoDateTime,
  from: z.string(),
  to: z.string(),
  subject: z.string(),
  text: z.string(),
  html: z.string().optional(),
});
export type OutboxMessage = z.infer<typeof OutboxMessage>;

/** GET /api/outbox — newest first. */
export const OutboxResponse = z.object({ messages: z.array(OutboxMessage) });
export type OutboxResponse = z.infer<typeof OutboxResponse>;
