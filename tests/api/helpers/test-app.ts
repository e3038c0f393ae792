import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import pino from 'pino';
import { createApp } from '../../../server/app.ts';
import type { Db } from '../../../server/db/database.ts';
import type { AppDeps, AppOptions } from '../../../server/deps.ts';
import { createMailer } from '../../../server/mail/mailer.ts';
import { type MailSink, startMailSink } from '../../../server/mail/sink.ts';
import type { RouteDef } from '../../../server/http/registry.ts';
import { openTestDatabase } from './test-database.ts';

export const TEST_PUBLIC_URL = 'http://ridewright.test';

/** A clock the test moves by hand (expiry checks without waiting). */
export interface TestClock {
  now(): Date;
  advance(ms: number): void;
}

export function testClock(start = new Date()): TestClock {
  let t = start.getTime();
  return { now: () => new Date(t), advance: (ms) => void (t += ms) };
}

export interface TestApp {
  /** Base URL of the app on 127.0.0.1; pass it to supertest's `request()` / `request.agent()`. */
  url: string;
  db: Db;
  deps: AppDeps;
  routes: RouteDef[];
  clock: TestClock;
  sink: MailSink;
  close(): Promise<void>;
}

/**
 * A fresh database, migrated (in-memory SQLite, or a PostgreSQL copy of the migrated template in
 * the `api-pg` project: see test-database.ts); a real mail sink on 127.0.0.1 (port 0) storing into it;
 * the app listening on 127.0.0.1 (port 0). Rate limits are off unless `overrides.rateLimit` is set.
 */
export async function createTestApp(overrides: Partial<AppOptions> = {}): Promise<TestApp> {
  const database = await openTestDatabase();
  const { db } = database;
  const clock = testClock();
  const logger = pino({ level: process.env.TEST_LOG_LEVEL ?? 'silent' });
  const sink = await startMailSink({ db, clock: clock.now });
  const mailer = createMailer({ kind: 'sink', port: sink.port }, 'Ridewright test <no-reply@ridewright.test>', logger);
  const { app, deps, routes } = createApp({
    db,
    secret: new TextEncoder().encode('test-secret-test-secret-test-secret-0123'),
    publicUrl: TEST_PUBLIC_URL,
    mailer,
    demoMode: false,
    // Tests stand for a server whose owner opened sign-up (RIDEWRIGHT_OPEN_SIGNUP); closed sign-up has its own test.
    openSignUp: true,
    outboxEnabled: true,
    clock: clock.now,
    logger,
    rateLimit: 0,
    ...overrides,
  });
  const server: Server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  const { port } = server.address() as AddressInfo;
  return {
    url: `http://127.0.0.1:${port}`,
    db,
    deps,
    routes,
    clock,
    sink,
    async close() {
      server.closeAllConnections();
      await new Promise<void>((resolve) => server.close(() => resolve()));
      mailer.close();
      await sink.close();
      await database.drop();
    },
  };
}
