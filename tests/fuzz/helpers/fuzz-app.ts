import { createHash } from 'node:crypto';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import SQLite from 'better-sqlite3';
import { Kysely, SqliteDialect } from 'kysely';
import pino from 'pino';
import { createApp } from '../../../server/app.ts';
import type { Database } from '../../../server/db/database.ts';
import { migrateToLatest } from '../../../server/db/migrator.ts';
import type { AppOptions } from '../../../server/deps.ts';
import type { Mailer } from '../../../server/mail/mailer.ts';
import { type TestApp, testClock } from '../../api/helpers/test-app.ts';
import { memoryFleetQueue } from '../../api/helpers/memory-fleet-queue.ts';

/** The app under fuzzing, with the raw SQLite handle for checksums. */
export interface FuzzApp extends TestApp {
  /** SHA-256 over every row of every table (schema included), in rowid order. */
  checksum(): string;
}

/** Mail goes nowhere: a background send must not change the database between two checksums. */
const silentMailer: Mailer = { send: async () => true, close: () => undefined };

function hashValue(h: ReturnType<typeof createHash>, v: unknown): void {
  if (v === null) h.update('\u0000n');
  else if (Buffer.isBuffer(v)) h.update('\u0000b').update(v);
  else h.update(`\u0000${typeof v}`).update(String(v));
}

/**
 * Like `createTestApp` (in-memory SQLite, app on 127.0.0.1:0, rate limits off), but with a
 * mailer that stores nothing and a checksum of the whole database, so a test can show that a
 * refused request changed nothing.
 */
export async function createFuzzApp(overrides: Partial<AppOptions> = {}): Promise<FuzzApp> {
  const raw = new SQLite(':memory:');
  raw.pragma('foreign_keys = ON');
  const db = new Kysely<Database>({ dialect: new SqliteDialect({ database: raw }) });
  const { error } = await migrateToLatest(db);
  if (error) throw error;
  const clock = testClock();
  const { app, deps, routes } = createApp({
    db,
    secret: new TextEncoder().encode('fuzz-secret-fuzz-secret-fuzz-secret-0123'),
    publicUrl: 'http://ridewright.test',
    mailer: silentMailer,
    outboxEnabled: true,
    clock: clock.now,
    logger: pino({ level: process.env.TEST_LOG_LEVEL ?? 'silent' }),
    rateLimit: 0,
    // Fuzzing sends hundreds of uploads as one person; the per-person limits have their own tests.
    heavyJobs: { atOnce: 0, perWindow: 0 },
    openSignUp: true,
    // the team-workers routes answer as they would with Redis (the real queue is tested in tests/fleet/)
    fleet: memoryFleetQueue(),
    ...overrides,
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  const tables = () => raw.prepare<[], { name: string; sql: string | null }>(`select name, sql from sqlite_master where type = 'table' order by name`).all();
  return {
    url: `http://127.0.0.1:${port}`,
    db,
    deps,
    routes,
    clock,
    sink: { port: 0, close: async () => undefined },
    checksum() {
      const h = createHash('sha256');
      for (const t of tables()) {
        // Counted attempts (failed sign-ins, password changes) are written on refusal by design.
        if (t.name === 'throttle_event') continue;
        h.update(`\u0001${t.name}\u0001${t.sql ?? ''}`);
        for (const row of raw.prepare(`select * from "${t.name.replaceAll('"', '""')}"`).raw().iterate() as Iterable<unknown[]>) {
          h.update('\u0002');
          for (const v of row) hashValue(h, v);
        }
      }
      return h.digest('hex');
    },
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      await db.destroy();
    },
  };
}
