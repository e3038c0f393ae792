import { Piscina } from 'piscina';
import type * as Tasks from './heavy-tasks.ts';
import { fail, type Failure } from '../core/outcome.ts';

/**
 * Worker threads for work that can take seconds (parsing a big CSV, resampling, spectra, class
 * fits), so one member's upload never stalls anyone else's page. At most `maxThreads` run at
 * once and `maxQueue` wait; past that a request is told to come back (503 with Retry-After), and
 * a task over its time budget is aborted. The threads load TypeScript through tsx, as the server
 * does (`heavy-worker.mjs`).
 */
export interface HeavyPoolOptions {
  maxThreads: number;
  maxQueue: number;
  /** Longest a task may run, ms. */
  budgetMs: number;
}

const defaults: HeavyPoolOptions = { maxThreads: 2, maxQueue: 8, budgetMs: 60_000 };
let options = defaults;
let pool: Piscina | null = null;

function thePool(): Piscina {
  pool ??= new Piscina({
    filename: new URL('./heavy-worker.mjs', import.meta.url).href,
    minThreads: 0,
    maxThreads: options.maxThreads,
    maxQueue: options.maxQueue,
    idleTimeout: 30_000,
  });
  return pool;
}

/** Changes the limits (tests, deployments); the next task starts a pool with them. */
export async function configureHeavyPool(next: Partial<HeavyPoolOptions>): Promise<void> {
  options = { ...defaults, ...next };
  await closeHeavyPool();
}

export async function closeHeavyPool(): Promise<void> {
  const p = pool;
  pool = null;
  await p?.destroy();
}

type TaskName = keyof typeof Tasks;
type TaskIn<K extends TaskName> = Parameters<(typeof Tasks)[K]>[0];
type TaskOut<K extends TaskName> = ReturnType<(typeof Tasks)[K]>;

const busy = (): Failure => ({ ...fail('busy', 'The server is busy with other large jobs; try again in a few seconds.'), retryAfterSeconds: 5 });

/** Runs a task in a worker thread; a full queue or a task over its budget comes back as a failure. */
export async function runHeavy<K extends TaskName>(name: K, input: TaskIn<K>): Promise<{ ok: true; value: TaskOut<K> } | Failure> {
  const p = thePool();
  if (p.queueSize >= options.maxQueue) return busy();
  const signal = AbortSignal.timeout(options.budgetMs);
  try {
    return { ok: true, value: (await p.run(input, { name, signal })) as TaskOut<K> };
  } catch (err) {
    if ((err as Error).message === 'Task queue is at limit') return busy();
    if (signal.aborted) return fail('busy', `The job took longer than ${Math.round(options.budgetMs / 1000)} s and was stopped; try a smaller file.`);
    throw err;
  }
}
