import { type ChildProcess, spawn } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
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
    /** Where the app under test answers, e.g. http://127.0.0.1:41234 (no trailing slash). */
    baseUrl: string;
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

/**
 * Builds the client once, seeds a fresh SQLite file with the demo workspace, starts the app on
 * a free loopback port in demo mode (so the mail sink and /api/outbox run), and hands the URL
 * to the tests as `inject('baseUrl')`.
 */
export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), 'ridewright-browser-'));
  const distDir = join(dir, 'dist');
  const dbPath = join(dir, 'ridewright.sqlite');
  let child: ChildProcess | undefined;
  const killChild = () => {
    if (child && child.exitCode === null) child.kill('SIGKILL');
  };
  process.once('exit', killChild);

  try {
    await build({ root, configFile: join(root, 'vite.config.ts'), logLevel: 'warn', build: { outDir: distDir, emptyOutDir: true, sourcemap: false, manifest: true } });
    project.provide('clientDir', distDir);

    const db = openDatabase(dbPath);
    try {
      const { error } = await migrateToLatest(db);
      if (error) throw error;
      await seedDemo(db);
    } finally {
      await db.destroy();
    }

    let baseUrl = '';
    // another process may take the probed port before the server binds it: try a few
    for (let attempt = 1; !baseUrl; attempt++) {
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
      for (const key of ['SMTP_HOST', 'SMTP_PORT', 'SMTP_USER', 'SMTP_PASS', 'RIDEWRIGHT_SECRET']) delete env[key];
      child = spawn(process.execPath, ['--import', 'tsx', join(root, 'tests/browser/helpers/serve-built-client.ts')], {
        cwd: root,
        env,
        stdio: ['pipe', 'pipe', 'pipe'],
      });
      try {
        baseUrl = await waitForReady(child, 60_000);
      } catch (error) {
        killChild();
        if (attempt >= 3 || !String(error).includes('EADDRINUSE')) throw error;
      }
    }
    project.provide('baseUrl', baseUrl);
  } catch (error) {
    killChild();
    rmSync(dir, { recursive: true, force: true });
    throw error;
  }

  return async () => {
    const running = child;
    if (running && running.exitCode === null) {
      const exited = new Promise<void>((done) => running.once('exit', () => done()));
      running.kill('SIGTERM');
      const forced = setTimeout(() => running.kill('SIGKILL'), 5_000);
      await exited;
      clearTimeout(forced);
    }
    process.removeListener('exit', killChild);
    rmSync(dir, { recursive: true, force: true });
  };
}
