import { type ChildProcess, spawn } from 'node:child_process';
import { mkdirSync, mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { openDatabase } from '../db/database.ts';
import { migrateToLatest } from '../db/migrator.ts';
import { seedDemo } from '../db/seed/seed-demo.ts';

const ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** The real server (`node --import tsx server/main.ts`) running as a child process on loopback. */
export interface ServerProcess {
  url: string;
  pid: number;
  child: ChildProcess;
  /** Resident memory of the child, bytes (Linux /proc). */
  rssBytes(): number;
  /** CPU time the child has used so far (user + system), ms (Linux /proc). */
  cpuMs(): number;
  /** Sends `signal` and resolves when the process is gone. */
  kill(signal?: NodeJS.Signals): Promise<void>;
}

export interface ServerProcessOptions {
  dbPath: string;
  /** Extra environment (e.g. a rate limit); the defaults turn limiting off and use demo mode. */
  env?: Record<string, string>;
  /** How long to wait for "serving" on stdout; a loaded machine can take tens of seconds. */
  readyTimeoutMs?: number;
  /**
   * A pre-compiled copy of `server/main.ts` from `bundleServer()` to run instead of going through
   * tsx: the same code, but a start costs about half the CPU (tests that restart it a hundred times).
   */
  bundle?: string;
  /** Extra node flags before the script, e.g. `--cpu-prof` (not allowed in NODE_OPTIONS). */
  nodeArgs?: string[];
  /** Another checkout to run `server/main.ts` from (before/after benchmarks); default this one. */
  root?: string;
}

/** A fixed session key, so a session survives a restart of the child. */
export const CHILD_SECRET = 'ridewright-child-process-secret-0123456789';

/**
 * Compiles `server/main.ts` and everything it imports from this repository into one ES module
 * with esbuild (the compiler tsx itself runs on); npm packages stay imports, so the file is
 * written under `node_modules/.cache/` where they resolve. Returns its path; `remove()` deletes it.
 */
export async function bundleServer(): Promise<{ path: string; remove(): void }> {
  const { build } = await import('esbuild');
  mkdirSync(join(ROOT, 'node_modules', '.cache'), { recursive: true });
  const dir = mkdtempSync(join(ROOT, 'node_modules', '.cache', 'rw-server-'));
  const path = join(dir, 'main.mjs');
  await build({ entryPoints: [join(ROOT, 'server/main.ts')], bundle: true, platform: 'node', format: 'esm', packages: 'external', target: 'node20', outfile: path, logLevel: 'warning', tsconfig: join(ROOT, 'tsconfig.json') });
  return { path, remove: () => rmSync(dir, { recursive: true, force: true }) };
}

/** Migrates the database file and seeds the demo workspace (when it has no users). */
export async function prepareDatabase(dbPath: string): Promise<void> {
  const db = openDatabase(dbPath);
  try {
    const { error } = await migrateToLatest(db);
    if (error) throw error;
    await seedDemo(db);
  } finally {
    await db.destroy();
  }
}

/** Starts `server/main.ts` with its own database on 127.0.0.1 and a free port; resolves once it serves. */
export function startServerProcess(options: ServerProcessOptions): Promise<ServerProcess> {
  const env: Record<string, string> = {};
  for (const [k, v] of Object.entries(process.env)) if (v !== undefined && !k.startsWith('SMTP_') && k !== 'PORT' && k !== 'HOST') env[k] = v;
  Object.assign(env, {
    RIDEWRIGHT_DB: options.dbPath,
    HOST: '127.0.0.1',
    PORT: '0',
    RIDEWRIGHT_RATE_LIMIT: '0',
    RIDEWRIGHT_DEMO: '1',
    RIDEWRIGHT_SECRET: CHILD_SECRET,
    NODE_ENV: 'test',
    LOG_LEVEL: 'warn',
    ...options.env,
  });
  const args = [...(options.nodeArgs ?? []), ...(options.bundle ? [options.bundle] : ['--import', 'tsx', 'server/main.ts'])];
  const child = spawn(process.execPath, args, { cwd: options.root ?? ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
  const gone = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  let stderr = '';
  child.stderr!.on('data', (d: Buffer) => void (stderr = (stderr + d.toString()).slice(-4000)));
  return new Promise((resolve, reject) => {
    let out = '';
    let ready = false;
    const timer = setTimeout(() => {
      child.kill('SIGKILL');
      reject(new Error(`server did not start within ${options.readyTimeoutMs ?? 120_000} ms:\n${stderr}`));
    }, options.readyTimeoutMs ?? 120_000);
    child.once('exit', (code, signal) => {
      clearTimeout(timer);
      if (!ready) reject(new Error(`server exited before serving (${code ?? signal}):\n${stderr}`));
    });
    child.stdout!.on('data', (d: Buffer) => {
      out += d.toString();
      const m = /serving (http:\/\/\S+)/.exec(out);
      if (!m || ready) return;
      ready = true;
      clearTimeout(timer);
      child.stdout!.removeAllListeners('data');
      child.stdout!.resume();
      const pid = child.pid!;
      resolve({
        url: m[1],
        pid,
        child,
        rssBytes: () => Number(/VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'))?.[1] ?? 0) * 1024,
        cpuMs: () => {
          // fields 14 and 15 of /proc/<pid>/stat (utime, stime) in clock ticks of 10 ms on Linux
          const fields = readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ');
          return (Number(fields[11]) + Number(fields[12])) * 10;
        },
        async kill(signal = 'SIGTERM') {
          if (child.exitCode === null && child.signalCode === null) child.kill(signal);
          await gone;
        },
      });
    });
  });
}
