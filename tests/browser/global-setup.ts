import { type ChildProcess, spawn } from 'node:child_process';
import { copyFileSync, mkdirSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import type { TestProject } from 'vitest/node';
import { openDatabase } from '../../server/db/database.ts';
import { migrateToLatest } from '../../server/db/migrator.ts';
import { seedDemo } from '../../server/db/seed/seed-demo.ts';

declare module 'vitest' {
  export interface ProvidedContext {
    /**
     * One app per vitest worker, each on its own copy of the seeded database, so two browser files
     * can run at once without seeing each other's writes. Tests read theirs with `appUrl()`
     * (helpers/app-url.ts), never this list directly.
     */
    baseUrls: string[];
    /** The built client the app serves, with Vite's manifest in `.vite/manifest.json` (bundle-size.test.ts reads it). */
    clientDir: string;
  }
}

const root = resolve(fileURLToPath(new URL('../..', import.meta.url)));

/** Waits for the child's READY line; fails with its output if it exits or stays silent. */
function waitForReady(child: ChildProcess, timeoutMs: number): Promise<string> {
  return new Promise((resolvePromise, reject) => {
    let output = '';
    const timer = setTimeout(() => reject(new Error(`server did not start within ${timeoutMs} ms:\n${output}`)), timeoutMs);
    const onData = (chunk: Buffer) => {
      output += chunk.toString();
      const match = output.match(/READY (http:\/\/\S+)/);
      if (match) {
        clearTimeout(timer);
        resolvePromise(match[1]);
      }
    };
    child.stdout?.on('data', onData);
    child.stderr?.on('data', (chunk: Buffer) => (output += chunk.toString()));
    child.once('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with code ${code} before it was ready:\n${output}`));
    });
  });
}

/** A loopback port nobody listens on right now (e-mail links need the real port up front). */
function freePort(): Promise<number> {
  return new Promise((resolvePromise, reject) => {
    const probe = createServer();
    probe.once('error', reject);
    probe.listen(0, '127.0.0.1', () => {
      const address = probe.address();
      const port = typeof address === 'object' && address ? address.port : 0;
      probe.close(() => resolvePromise(port));
    });
  });
}

type ChildApp = { child: ChildProcess; baseUrl: string };

/** Starts one app on a free loopback port over `dbPath`, serving the build in `distDir`. */
async function startApp(dbPath: string, distDir: string): Promise<ChildApp> {
  // another process may take the probed port before the server binds it: try a few
  for (let attempt = 1; ; attempt++) {
    const port = await freePort();
    const env: NodeJS.ProcessEnv = {
      ...process.env,
      HOST: '127.0.0.1',
      PORT: String(port),
      PUBLIC_URL: `http://127.0.0.1:${port}`,
      RIDEWRIGHT_DB: dbPath,
      RIDEWRIGHT_DEMO: '1',
      RIDEWRIGHT_TEST_DIST: distDir,
      // the tests sign in many times from one address; limiting is covered by the API tests
      RIDEWRIGHT_RATE_LIMIT: '0',
      SMTP_SINK_PORT: '0',
      NODE_ENV: 'test',
    };
    for (const key of ['SMTP_HOST', 'SMTP_PORT', 'SMTP_USER', 'SMTP_PASS', 'RIDEWRIGHT_SECRET', 'DATABASE_URL', 'REDIS_URL']) delete env[key];
    const child = spawn(process.execPath, ['--import', 'tsx', join(root, 'tests/browser/helpers/serve-built-client.ts')], {
      cwd: root,
      env,
      stdio: ['pipe', 'pipe', 'pipe'],
    });
    try {
      return { child, baseUrl: await waitForReady(child, 60_000) };
    } catch (error) {
      if (child.exitCode === null) child.kill('SIGKILL');
      if (attempt >= 3 || !String(error).includes('EADDRINUSE')) throw error;
    }
  }
}

async function stopApp({ child }: ChildApp): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise<void>((done) => child.once('exit', () => done()));
  child.kill('SIGTERM');
  const forced = setTimeout(() => child.kill('SIGKILL'), 5_000);
  await exited;
  clearTimeout(forced);
}

/**
 * Builds the client once, seeds one SQLite file with the demo workspace, copies it once per
 * vitest worker, starts one app per copy on a free loopback port in demo mode (so each has its
 * mail sink and /api/outbox), and hands the addresses to the tests as `inject('baseUrls')`.
 * A file always talks to the app of the worker it runs in (`appUrl()`), so files that run at the
 * same time never share a database, and the files of one worker share one as they always did.
 */
export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), 'ridewright-browser-'));
  const distDir = join(dir, 'dist');
  const templatePath = join(dir, 'seeded.sqlite');
  const apps: ChildApp[] = [];
  const killAll = () => {
    for (const { child } of apps) if (child.exitCode === null) child.kill('SIGKILL');
  };
  process.once('exit', killAll);

  try {
    await build({ root, configFile: join(root, 'vite.config.ts'), logLevel: 'warn', build: { outDir: distDir, emptyOutDir: true, sourcemap: false, manifest: true } });
    project.provide('clientDir', distDir);

    const db = openDatabase(templatePath);
    try {
      const { error } = await migrateToLatest(db);
      if (error) throw error;
      await seedDemo(db);
    } finally {
      await db.destroy();
    }

    const workers = Math.max(1, Number(project.config.maxWorkers) || 1);
    const started = await Promise.all(
      Array.from({ length: workers }, (_, index) => {
        const appDir = join(dir, `app-${index + 1}`);
        mkdirSync(appDir);
        const dbPath = join(appDir, 'ridewright.sqlite');
        copyFileSync(templatePath, dbPath);
        return startApp(dbPath, distDir).then((app) => (apps.push(app), app));
      }),
    );
    project.provide('baseUrls', started.map((app) => app.baseUrl));
  } catch (error) {
    killAll();
    rmSync(dir, { recursive: true, force: true });
    throw error;
  }

  return async () => {
    await Promise.all(apps.map(stopApp));
    process.removeListener('exit', killAll);
    rmSync(dir, { recursive: true, force: true });
  };
}
