import type { Queryable } from '../db/database.ts';

/** How many actions under `key` happened at or after `since`, and the oldest of them. */
export async function countSince(db: Queryable, key: string, since: string): Promise<{ count: number; oldest: string | null }> {
  const row = await db
    .selectFrom('throttle_event')
    .select((eb) => [eb.fn.countAll<number>().as('n'), eb.fn.min('at').as('oldest')])
    .where('key', '=', key)
    .where('at', '>=', since)
    .executeTakeFirstOrThrow();
  return { count: Number(row.n), oldest: (row.oldest as string | null) ?? null };
}

export async function insertEvents(db: Queryable, keys: string[], at: string): Promise<void> {
  if (keys.length === 0) return;
  await db.insertInto('throttle_event').values(keys.map((key) => ({ key, at }))).execute();
}

/** Forgets the keys' actions older than `before` (every limit's window is shorter). */
export async function deleteEventsBefore(db: Queryable, keys: string[], before: string): Promise<void> {
  if (keys.length === 0) return;
  await db.deleteFrom('throttle_event').where('key', 'in', keys).where('at', '<', before).execute();
}

/** Forgets the action counted under `key` at exactly `at` (one attempt's own mark). */
export async function deleteOneEvent(db: Queryable, key: string, at: string): Promise<void> {
  await db.deleteFrom('throttle_event').where('key', '=', key).where('at', '=', at).execute();
}

/** Forgets the newest action counted under `key` (a request that should not have counted). */
export async function deleteNewestEvent(db: Queryable, key: string): Promise<void> {
  const newest = await db.selectFrom('throttle_event').select((eb) => eb.fn.max('at').as('at')).where('key', '=', key).executeTakeFirst();
  if (newest?.at) await deleteOneEvent(db, key, newest.at as string);
}

export async function deleteKey(db: Queryable, key: string): Promise<void> {
  await db.deleteFrom('throttle_event').where('key', '=', key).execute();
}
