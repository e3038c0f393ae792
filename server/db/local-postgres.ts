import { spawn, spawnSync } from 'node:child_process';
import { chownSync, existsSync, mkdirSync, mkdtempSync, readdirSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import pg from 'pg';

/**
 * A throwaway PostgreSQL cluster from Debian's `postgresql` package, for tests, benchmarks and
 * trying the team setup on one machine: `initdb` in a temp folder, listening on 127.0.0.1 only,
 * trust authentication for the one local user. It stops when `stop()` is called, and by itself
 * when the process that started it is gone (a watchdog shell checks once a second), so a
 * crashed test run leaves no server behind. PostgreSQL refuses to run as root; as root the
 * cluster runs as the package's `postgres` user.
 */
export interface LocalPostgres {
  /** postgres://ridewright@127.0.0.1:<port>/<database> */
  url(database?: string): string;
  port: number;
  binDir: string;
  stop(): Promise<void>;
}

const USER = 'ridewright';

export function postgresBinDir(): string | null {
  const root = '/usr/lib/postgresql';
  if (!existsSync(root)) return null;
  const versions = readdirSync(root)
    .filter((v) => existsSync(join(root, v, 'bin', 'initdb')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? join(root, versions[0], 'bin') : null;
}

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const s = createServer();
    s.once('error', reject);
    s.listen(0, '127.0.0.1', () => {
      const { port } = s.address() as { port: number };
      s.close(() => resolve(port));
    });
  });
}

const asRoot = process.getuid?.() === 0;
/** The command line, run as the `postgres` user when we are root. */
const asOwner = (cmd: string[]): [string, string[]] => (asRoot ? ['runuser', ['-u', 'postgres', '--', ...cmd]] : [cmd[0], cmd.slice(1)]);

export interface LocalPostgresOptions {
  /** Relax durability (fsync off): for tests and benchmarks that never crash PostgreSQL itself. */
  fast?: boolean;
  /** Keep the cluster in this folder (created by initdb the first time) instead of a temp folder removed on stop. */
  dataDir?: string;
  port?: number;
}

export async function startLocalPostgres(opts: LocalPostgresOptions = {}): Promise<LocalPostgres> {
  const binDir = postgresBinDir();
  if (!binDir) throw new Error('PostgreSQL is not installed: install Debian\'s "postgresql" package (see README, "Running for a team")');
  const kept = opts.dataDir ? resolve(opts.dataDir) : null;
  if (kept) mkdirSync(kept, { recursive: true });
  const dir = kept ?? mkdtempSync(join(tmpdir(), 'ridewright-pg-'));
  const data = join(dir, 'data');
  const removeDir = () => {
    if (!kept) rmSync(dir, { recursive: true, force: true });
  };
  if (asRoot) {
    const id = spawnSync('id', ['-u', 'postgres'], { encoding: 'utf8' });
    const gid = spawnSync('id', ['-g', 'postgres'], { encoding: 'utf8' });
    if (id.status !== 0) throw new Error('running as root needs the "postgres" user that Debian\'s postgresql package creates');
    chownSync(dir, Number(id.stdout.trim()), Number(gid.stdout.trim()));
  }
  if (!existsSync(join(data, 'PG_VERSION'))) {
    const [initCmd, initArgs] = asOwner([join(binDir, 'initdb'), '-D', data, '-U', USER, '--auth=trust', '-E', 'UTF8', '--locale=C', ...(kept ? [] : ['--no-sync'])]);
    const init = spawnSync(initCmd, initArgs, { encoding: 'utf8' });
    if (init.status !== 0) throw new Error(`initdb failed: ${init.stderr || init.stdout}`);
  }

  const port = opts.port ?? (await freePort());
  // Tests and benchmarks never crash PostgreSQL itself, only the server processes in front of it,
  // so durability to disk can be relaxed there for speed; a commit is still a commit.
  const tuning = opts.fast ? ['-c', 'fsync=off', '-c', 'synchronous_commit=off', '-c', 'full_page_writes=off'] : [];
  const postgres = [join(binDir, 'postgres'), '-D', data, '-h', '127.0.0.1', '-p', String(port), '-k', dir, '-c', 'max_connections=200', ...tuning]
    .map((a) => `'${a.replace(/'/g, `'\\''`)}'`)
    .join(' ');
  const watchdog = `${postgres} & pg=$!; trap 'kill -INT $pg; wait $pg; exit 0' TERM INT; while [ -d /proc/${process.pid} ] && kill -0 $pg 2>/dev/null; do sleep 1; done; kill -INT $pg 2>/dev/null; wait $pg`;
  const [cmd, args] = asOwner(['sh', '-c', watchdog]);
  const child = spawn(cmd, args, { stdio: ['ignore', 'ignore', 'pipe'], detached: true });
  let log = '';
  child.stderr?.on('data', (d: Buffer) => (log = (log + d.toString()).slice(-4000)));
  child.unref();

  const url = (database = 'postgres') => `postgres://${USER}@127.0.0.1:${port}/${database}`;
  const deadline = Date.now() + 30_000;
  for (;;) {
    const client = new pg.Client({ connectionString: url() });
    try {
      await client.connect();
      await client.end();
      break;
    } catch (err) {
      await client.end().catch(() => undefined);
      if (Date.now() > deadline || child.exitCode !== null) {
        removeDir();
        throw new Error(`PostgreSQL did not start: ${String(err)}\n${log}`, { cause: err });
      }
      await new Promise((r) => setTimeout(r, 100));
    }
  }

  return {
    url,
    port,
    binDir,
    async stop() {
      if (child.exitCode === null && child.pid) {
        const exited = new Promise((r) => child.once('exit', r));
        // The whole process group: runuser, the watchdog shell and PostgreSQL.
        try {
          process.kill(-child.pid, 'SIGTERM');
        } catch {
          /* already gone */
        }
        await Promise.race([exited, new Promise((r) => setTimeout(r, 10_000))]);
      }
      removeDir();
    },
  };
}

/** Runs `statement` (DDL such as CREATE DATABASE, which cannot run in a transaction) once. */
export async function adminQuery(url: string, statement: string): Promise<void> {
  const client = new pg.Client({ connectionString: url });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}
