import type { IncrementResponse, Options, Store } from 'express-rate-limit';
import type { Db } from '../db/database.ts';
import { countSince, deleteKey, deleteNewestEvent } from './throttle.repository.ts';
import { recordActions } from './throttle.service.ts';

/**
 * express-rate-limit's counter kept in the database (`throttle_event`) instead of process memory,
 * so every server process on one database counts the same attempts: with two processes behind a
 * load balancer, an address still gets `limit` sign-in attempts, not twice as many. The window
 * slides (attempts in the last `windowMs`), as the other limits here do.
 */
export class SharedRateLimitStore implements Store {
  /** Tells express-rate-limit the counts are shared between processes. */
  readonly localKeys = false;
  private windowMs = 15 * 60_000;

  constructor(
    private readonly db: Db,
    private readonly clock: () => Date,
    readonly prefix: string,
  ) {}

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  async increment(key: string): Promise<IncrementResponse> {
    const now = this.clock();
    const rule = { key: this.prefix + key, limit: Number.MAX_SAFE_INTEGER, windowMs: this.windowMs, what: 'attempts' };
    const { count, oldest } = await this.db.transaction().execute(async (trx) => {
      await recordActions(trx, [rule], now);
      return countSince(trx, rule.key, new Date(now.getTime() - this.windowMs).toISOString());
    });
    const resetAt = (oldest ? new Date(oldest).getTime() : now.getTime()) + this.windowMs;
    return { totalHits: count, resetTime: new Date(resetAt) };
  }

  async decrement(key: string): Promise<void> {
    await deleteNewestEvent(this.db, this.prefix + key);
  }

  async resetKey(key: string): Promise<void> {
    await deleteKey(this.db, this.prefix + key);
  }
}
