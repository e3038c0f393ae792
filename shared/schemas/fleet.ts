import { z } from 'zod';

/**
 * A study run on the team's workers, as the study page shows it. `running`: chunks are queued or
 * running; `finishing`: every point is in and the summary is being made; then `complete`,
 * `cancelled` (the finished points are kept) or `failed` (with the reason).
 */
export const FleetRunState = z.enum(['running', 'finishing', 'complete', 'cancelled', 'failed']);
export type FleetRunState = z.infer<typeof FleetRunState>;

export const FleetProgress = z.object({
  state: FleetRunState,
  /** Points stored, the base setup's runs counting as one, of those planned. */
  unitsDone: z.number().int().nonnegative(),
  unitsTotal: z.number().int().nonnegative(),
  runsDone: z.number().int().nonnegative(),
  runsTotal: z.number().int().nonnegative(),
  /** Runs per second lately (null before there is anything to measure). */
  runsPerSecond: z.number().nonnegative().nullable(),
  /** s; null while the rate is unknown or the run is over. */
  secondsLeft: z.number().nonnegative().nullable(),
  error: z.string().nullable(),
  startedBy: z.object({ id: z.string(), name: z.string() }),
  startedAt: z.string(),
  finishedAt: z.string().nullable(),
});
export type FleetProgress = z.infer<typeof FleetProgress>;

/** GET …/studies/:id/fleet: whether this server has workers, and the study's last run on them. */
export const FleetStatus = z.object({ available: z.boolean(), run: FleetProgress.nullable() });
export type FleetStatus = z.infer<typeof FleetStatus>;

/** Studies with more runs than this start on the team's workers unless the person picks this browser. */
export const FLEET_DEFAULT_FROM_RUNS = 2000;
