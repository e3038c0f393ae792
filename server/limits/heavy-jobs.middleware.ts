import type { RequestHandler } from 'express';
import { userOf } from '../auth/request-context.ts';
import type { Db } from '../db/database.ts';
import { HttpError } from '../core/errors.ts';
import { takeSlot, type ThrottleRule } from './throttle.service.ts';

export interface HeavyJobLimits {
  /** Large jobs (uploads, road figures, fits, checks, study ranking) one person may have running at once. */
  atOnce: number;
  /** …and may start in ten minutes, counted in the database across processes. */
  perWindow: number;
}
export const DEFAULT_HEAVY_JOB_LIMITS: HeavyJobLimits = { atOnce: 2, perWindow: 60 };
const WINDOW_MS = 10 * 60_000;

const windowRule = (userId: string, limit: number): ThrottleRule => ({ key: `heavy-jobs:${userId}`, limit, windowMs: WINDOW_MS, what: 'large jobs from you' });

/**
 * Per-person limits on the routes that start heavy work, checked before an upload is even read:
 * the worker pool is shared by everyone, so one member cannot fill it. Over a limit: 429 with
 * Retry-After. The running count is this process's; the pool it protects is this process's too.
 */
export function heavyJobLimit(db: Db, clock: () => Date, limits: HeavyJobLimits): RequestHandler {
  const running = new Map<string, number>();
  return async (req, res, next) => {
    const user = userOf(req);
    const now = running.get(user.id) ?? 0;
    if (limits.atOnce > 0 && now >= limits.atOnce) {
      throw new HttpError('rate_limited', `You already have ${limits.atOnce} large jobs running; try again when one has finished.`, undefined, 5);
    }
    // Counted before the await, so requests arriving together cannot all pass the check.
    running.set(user.id, now + 1);
    let counted = true;
    const release = () => {
      if (!counted) return;
      counted = false;
      const left = (running.get(user.id) ?? 1) - 1;
      if (left > 0) running.set(user.id, left);
      else running.delete(user.id);
    };
    res.once('close', release);
    const limited = limits.perWindow > 0 ? await takeSlot(db, [windowRule(user.id, limits.perWindow)], clock()) : null;
    if (limited) {
      release();
      throw new HttpError('rate_limited', limited.message, undefined, limited.retryAfterSeconds);
    }
    next();
  };
}
