import { type ChildProcess, spawn } from 'node:child_process';
import { createServer } from 'node:net';
import { fileURLToPath } from 'node:url';
import type { Queryable } from '../db/database.ts';

/** A free TCP port on loopback (asked of the OS, then released). */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

/** Resolves when `pattern` shows on the child's stdout; rejects if it exits first. */
function waitForLine(child: ChildProcess, pattern: RegExp, what: string): Promise<void> {
  return new Promise((resolve, reject) => {
    let out = '';
    const onData = (chunk: Buffer) => {
      out += chunk.toString();
      if (pattern.test(out)) {
        child.stdout?.off('data', onData);
        resolve();
      }
    };
    child.stdout?.on('data', onData);
    child.once('exit', (code) => reject(new Error(`${what} exited (${code}) before it was ready:\n${out.slice(-2000)}`)));
  });
}

const exited = (child: ChildProcess) => new Promise<void>((resolve) => (child.exitCode !== null || child.signalCode !== null ? resolve() : child.once('exit', () => resolve())));

export interface RedisProcess {
  url: string;
  /** Stops it (SIGTERM; with --save '' nothing is kept) and starts a fresh one on the same port. */
  restart(): Promise<void>;
  stop(): Promise<void>;
}

/** redis-server on 127.0.0.1 at a free port, keeping nothing on disk, in `dir`; stopped by `stop()`. */
export async function startRedis(dir: string): Promise<RedisProcess> {
  const port = await freePort();
  let child: ChildProcess;
  const launch = async () => {
    child = spawn('redis-server', ['--port', String(port), '--bind', '127.0.0.1', '--save', '', '--appendonly', 'no', '--dir', dir], { stdio: ['ignore', 'pipe', 'inherit'] });
    await waitForLine(child, /Ready to accept connections/, 'redis-server');
  };
  await launch();
  const stop = async () => {
    child.kill('SIGTERM');
    await exited(child);
  };
  return { url: `redis://127.0.0.1:${port}`, stop, restart: async () => (await stop(), await launch()) };
}

export interface WorkerProcess {
  child: ChildProcess;
  /** Lines of stdout so far. */
  lines: string[];
  /** Resolves at the next line matching `pattern`. */
  nextLine(pattern: RegExp): Promise<string>;
  kill(signal?: NodeJS.Signals): Promise<void>;
}

const root = fileURLToPath(new URL('../../', import.meta.url));

/** `npm run worker` (server/fleet/worker-main.ts) as its own process, on one thread unless told. */
export async function startWorker(env: Record<string, string>): Promise<WorkerProcess> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'server/fleet/worker-main.ts'], {
    cwd: root,
    env: { ...process.env, FLEET_THREADS: '1', FLEET_LOG_CHUNKS: '1', LOG_LEVEL: 'warn', ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  });
  const lines: string[] = [];
  const waiters: { pattern: RegExp; resolve: (l: string) => void }[] = [];
  let partial = '';
  child.stdout!.on('data', (chunk: Buffer) => {
    partial += chunk.toString();
    const parts = partial.split('\n');
    partial = parts.pop()!;
    for (const line of parts) {
      lines.push(line);
      for (const w of [...waiters]) {
        if (!w.pattern.test(line)) continue;
        waiters.splice(waiters.indexOf(w), 1);
        w.resolve(line);
      }
    }
  });
  const nextLine = (pattern: RegExp) => new Promise<string>((resolve) => waiters.push({ pattern, resolve }));
  const ready = nextLine(/worker ready/);
  await Promise.race([ready, exited(child).then(() => Promise.reject(new Error('the worker exited before it was ready')))]);
  return {
    child,
    lines,
    nextLine,
    kill: async (signal = 'SIGTERM') => {
      child.kill(signal);
      await exited(child);
    },
  };
}

/**
 * The demo's first setup revision, its workspace and an engineer of it: what the fleet benches
 * make their study from, on a database just seeded with the demo.
 */
export function demoEngineerRevision(db: Queryable) {
  return db
    .selectFrom('setup_revision as r')
    .innerJoin('setup as s', 's.id', 'r.setup_id')
    .innerJoin('membership as m', 'm.workspace_id', 's.workspace_id')
    .innerJoin('user as u', 'u.id', 'm.user_id')
    .select(['r.id as revisionId', 'r.setup_id as setupId', 'r.document', 's.workspace_id as workspaceId', 'u.id as userId', 'u.name as userName'])
    .where('m.role', '=', 'engineer')
    .orderBy('r.created_at')
    .executeTakeFirstOrThrow();
}
