import type { Db, Queryable } from '../db/database.ts';
import { countSince, deleteEventsBefore, deleteOneEvent, insertEvents } from './throttle.repository.ts';
import { fail, type Failure } from '../core/outcome.ts';

/** At most `limit` actions under `key` in any `windowMs`. */
export interface ThrottleRule {
  key: string;
  limit: number;
  windowMs: number;
  /** Says what was limited, e.g. "invitations from you". */
  what: string;
}

const LONGEST_WINDOW_MS = 24 * 60 * 60_000;

/**
 * The first rule already at its limit, as a 429 failure that says when to try again, or null.
 * Counts live in the database, so every server process sees the same limits.
 */
export async function overLimit(db: Queryable, rules: ThrottleRule[], now: Date): Promise<Failure | null> {
  for (const rule of rules) {
    const since = new Date(now.getTime() - rule.windowMs).toISOString();
    const { count, oldest } = await countSince(db, rule.key, since);
    if (count >= rule.limit) {
      const freesAt = oldest ? new Date(oldest).getTime() + rule.windowMs : now.getTime() + rule.windowMs;
      const retryAfterSeconds = Math.max(1, Math.ceil((freesAt - now.getTime()) / 1000));
      return { ...fail('rate_limited', `Too many ${rule.what}; try again in ${describeWait(retryAfterSeconds)}.`), retryAfterSeconds };
    }
  }
  return null;
}

/** Counts one action against every rule's key, forgetting that key's actions older than any window. */
export async function recordActions(db: Queryable, rules: ThrottleRule[], now: Date): Promise<void> {
  const keys = [...new Set(rules.map((r) => r.key))];
  await deleteEventsBefore(db, keys, new Date(now.getTime() - LONGEST_WINDOW_MS).toISOString());
  await insertEvents(db, keys, now.toISOString());
}

function describeWait(seconds: number): string {
  if (seconds < 90) return `${seconds} s`;
  if (seconds < 90 * 60) return `${Math.ceil(seconds / 60)} min`;
  return `${Math.ceil(seconds / 3600)} h`;
}

/**
 * Checks the rules and counts this action in one transaction, so a burst of concurrent requests
 * cannot all pass the check before any is counted. Returns the failure when over a limit.
 */
export async function takeSlot(db: Db, rules: ThrottleRule[], now: Date): Promise<Failure | null> {
  return db.transaction().execute(async (trx) => {
    const limited = await overLimit(trx, rules, now);
    if (!limited) await recordActions(trx, rules, now);
    return limited;
  });
}

/** Gives back a slot taken at `now` (e.g. a sign-in that turned out right is not counted). */
export async function releaseSlot(db: Queryable, rule: ThrottleRule, now: Date): Promise<void> {
  await deleteOneEvent(db, rule.key, now.toISOString());
}
