import { closeHeavyPool } from './jobs/heavy-pool.ts';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import type { Logger } from 'pino';
import { createApp } from './app.ts';
import { resolveSecret, type ServerConfig } from './config.ts';
import { type Db, openDatabase } from './db/database.ts';
import { migrateToLatest } from './db/migrator.ts';
import { DEFAULT_HEAVY_JOB_LIMITS } from './limits/index.ts';
import type { ClientServing } from './deps.ts';
import { createMailer } from './mail/index.ts';
import { type MailSink, startMailSink } from './mail/index.ts';
import { openFleetQueue } from './fleet/index.ts';

export const DIST_DIR = fileURLToPath(new URL('../dist/', import.meta.url));

export interface RunningServer {
  url: string;
  port: number;
  db: Db;
  /** The local mail sink's port, when it runs (no SMTP_HOST). */
  sinkPort?: number;
  close(): Promise<void>;
}

function trustProxyValue(v: string | undefined): boolean | number | string {
  if (v === undefined || v === '' || v === 'false') return false;
  if (v === 'true') return true;
  return /^\d+$/.test(v) ? Number(v) : v;
}

/**
 * Opens the database, migrates it, starts the mail sink when no SMTP server is configured, and
 * listens. Used by main.ts; test harnesses can call it directly.
 */
export async function startServer(config: ServerConfig, logger: Logger, client: ClientServing = { kind: 'static', distDir: DIST_DIR }): Promise<RunningServer> {
  const db = openDatabase(config.database);
  const { error, results } = await migrateToLatest(db);
  for (const r of results ?? []) if (r.status !== 'NotExecuted') logger.info(`migration ${r.migrationName}: ${r.status}`);
  if (error) {
    await db.destroy();
    throw new Error(`migration failed: ${String(error)}`, { cause: error });
  }
  let sink: MailSink | undefined;
  if (!config.smtp) sink = await startMailSink({ db, port: config.sinkPort });
  const mailer = createMailer(config.smtp ? { kind: 'smtp', settings: config.smtp } : { kind: 'sink', port: sink!.port }, config.mailFrom, logger);
  const fleet = config.redisUrl ? openFleetQueue(config.redisUrl, (err) => logger.warn({ err: err.message }, 'team workers queue')) : null;
  const { app } = createApp({
    db,
    secret: resolveSecret(config),
    publicUrl: config.publicUrl,
    mailer,
    demoMode: config.demoMode,
    openSignUp: config.openSignUp,
    heavyJobs: { ...DEFAULT_HEAVY_JOB_LIMITS, perWindow: config.heavyJobsPerWindow },
    outboxEnabled: !!sink,
    logger,
    rateLimit: config.rateLimit,
    trustProxy: trustProxyValue(config.trustProxy),
    client,
    fleet,
  });
  const server: Server = await new Promise((resolve, reject) => {
    const s = app.listen(config.port, config.host, (err?: Error) => (err ? reject(err) : resolve(s)));
  });
  const port = (server.address() as AddressInfo).port;
  const shownHost = config.host === '0.0.0.0' || config.host === '::' ? '127.0.0.1' : config.host;
  return {
    url: `http://${shownHost.includes(':') ? `[${shownHost}]` : shownHost}:${port}`,
    port,
    db,
    sinkPort: sink?.port,
    async close() {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeIdleConnections();
        setTimeout(() => server.closeAllConnections(), 3000).unref();
      });
      mailer.close();
      await sink?.close();
      await closeHeavyPool();
      await fleet?.close();
      await db.destroy();
    },
  };
}
