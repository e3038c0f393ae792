import type { Role } from '../../../shared/schemas/workspace.ts';
import type { Transaction } from 'kysely';
import type { Database } from '../database.ts';

/** What the first seed step made, handed to every later step. */
export interface SeedContext {
  workspaceId: string;
  /** User id per role: admin Ada Quill, lead Tomas Reeve, engineer Ines Marlow, viewer Olu Fenwick. */
  users: Record<Role, string>;
  /** One timestamp for the whole seed. */
  now: Date;
}

/**
 * A later seed step (setups, roads, runs…). It gets the open transaction: use `trx`, never the
 * outer `db` (SQLite has one connection, so the outer handle would wait for this transaction forever).
 */
export type SeedStep = (trx: Transaction<Database>, ctx: SeedContext) => Promise<void>;
