import pino, { type Logger } from 'pino';
import type { Db } from './db/database.ts';
import { DEFAULT_HEAVY_JOB_LIMITS, type HeavyJobLimits } from './limits/index.ts';
import type { Mailer } from './mail/index.ts';
import type { FleetQueue } from './fleet/fleet-queue.ts';
import { WORKSPACE_UPLOAD_QUOTA_BYTES } from './uploads/index.ts';

/** How the app serves the client outside /api. */
export type ClientServing =
  /** Built files from `distDir` with the SPA fallback; a plain page when index.html is missing. */
  | { kind: 'static'; distDir: string }
  /** API only (tests). */
  | { kind: 'none' };

/** Everything the app needs from outside; built by main.ts, dev tooling and the test helpers. */
export interface AppDeps {
  db: Db;
  /** HS256 key for session tokens. */
  secret: Uint8Array;
  /** Base of links in e-mails, without a trailing slash. */
  publicUrl: string;
  mailer: Mailer;
  demoMode: boolean;
  /** POST /api/auth/signup is open to anyone (RIDEWRIGHT_OPEN_SIGNUP; default: in demo mode). */
  openSignUp: boolean;
  /** True while the local mail sink runs: enables GET /api/outbox. */
  outboxEnabled: boolean;
  /** Current time; tests pass a clock they can move to check expiry. */
  clock: () => Date;
  logger: Logger;
  /** Requests per 15 minutes per address on the sensitive public routes; 0 disables. */
  rateLimit: number;
  /** Large jobs per person: running at once, and started per ten minutes (server/limits/heavy-jobs.middleware.ts); 0 lifts either. */
  heavyJobs: HeavyJobLimits;
  /** Uploaded bytes a workspace may keep (server/uploads/upload-quota.service.ts); over it, uploads get 413. */
  uploadQuotaBytes: number;
  /** Express `trust proxy` setting. */
  trustProxy: boolean | number | string;
  client: ClientServing;
  /** The queue of the team's workers (REDIS_URL); null: studies run in the browser only. */
  fleet: FleetQueue | null;
}

export type AppOptions = Pick<AppDeps, 'db' | 'secret' | 'publicUrl' | 'mailer'> & Partial<AppDeps>;

export function resolveDeps(options: AppOptions): AppDeps {
  return {
    openSignUp: options.demoMode ?? false,
    demoMode: false,
    outboxEnabled: false,
    clock: () => new Date(),
    logger: pino({ level: 'silent' }),
    rateLimit: 100,
    heavyJobs: DEFAULT_HEAVY_JOB_LIMITS,
    uploadQuotaBytes: WORKSPACE_UPLOAD_QUOTA_BYTES,
    trustProxy: false,
    client: { kind: 'none' },
    fleet: null,
    ...options,
  };
}
