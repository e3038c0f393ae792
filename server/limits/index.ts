// What other parts of the server may use from this domain; everything else stays inside it.
export { overLimit, recordActions, releaseSlot, takeSlot, type ThrottleRule } from './throttle.service.ts';
export { DEFAULT_HEAVY_JOB_LIMITS, heavyJobLimit, type HeavyJobLimits } from './heavy-jobs.middleware.ts';
export { SharedRateLimitStore } from './shared-rate-limit-store.ts';
