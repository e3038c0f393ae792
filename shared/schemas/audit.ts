import { z } from 'zod';
import { Id, IsoDateTime } from './fields.ts';

/** One line of a workspace's audit log. `action` is dotted, e.g. `member.role_changed`. */
export const AuditEntry = z.object({
  id: Id,
  at: IsoDateTime,
  actor: z.object({ id: Id, name: z.string() }),
  action: z.string(),
  entityType: z.string(),
  entityId: z.string(),
  summary: z.string(),
});
export type AuditEntry = z.infer<typeof AuditEntry>;

/** GET /api/workspaces/:workspaceId/audit — newest first. */
export const AuditResponse = z.object({ entries: z.array(AuditEntry) });
export type AuditResponse = z.infer<typeof AuditResponse>;

/** Query string of the audit route: page backwards with `before` = the oldest `at` seen. */
export const AuditQuery = z.object({
  limit: z.coerce.number().int().min(1).max(200).default(50),
  before: IsoDateTime.optional(),
});
export type AuditQuery = z.infer<typeof AuditQuery>;
