import * as Comlink from 'comlink';

/**
 * A small pool of comlink workers, generic over the worker's API.
 *
 * ```ts
 * const pool = createWorkerPool<SimulateApi>({
 *   create: () => new Worker(new URL('../../workers/simulate.worker.ts', import.meta.url), { type: 'module' }),
 *   size: 3,
 *   warm: (api) => api.ping(),
 * });
 * const outcome = await pool.run((api) => api.simulate(request), { signal });
 * if (outcome.status === 'done') use(outcome.value);
 * ```
 * - Workers are created on first use, up to `size`; tasks beyond that wait in a queue (FIFO).
 * - `run` never throws for expected trouble: it resolves `{ status: 'done', value }`,
 *   `{ status: 'cancelled' }` (the signal fired) or `{ status: 'failed', reason }` (the worker
 *   threw, or died). A task's own failure values (e.g. `{ ok: false }`) come back as `done`.
 * - Cancelling a running task terminates its worker (the only way to stop JavaScript that is
 *   busy computing) and, with `warm`, starts a replacement at once so the next task does not pay
 *   for loading the module. Cancelling a queued task just removes it.
 * - After `idleMs` with nothing running or queued, every worker is released (`releaseProxy`)
 *   and terminated; the next task starts them again.
 */

export type TaskOutcome<T> = { status: 'done'; value: T } | { status: 'cancelled' } | { status: 'failed'; reason: string };

export interface PoolOptions<Api> {
  /** Makes one worker; called lazily. */
  create: () => Worker;
  /** Most workers alive at once (≥ 1). */
  size: number;
  /** Terminate all workers after this long with no work, ms; default 60 000. 0 keeps them. */
  idleMs?: number;
  /** Called on each new worker (e.g. a ping that loads the module) so it is ready for real work. */
  warm?: (api: Comlink.Remote<Api>) => Promise<unknown>;
}

export interface RunOptions {
  signal?: AbortSignal;
}

export interface WorkerPool<Api> {
  run<T>(task: (api: Comlink.Remote<Api>) => Promise<T>, options?: RunOptions): Promise<TaskOutcome<T>>;
  /** Starts workers (up to `count`, default one) ahead of the first task. */
  prewarm(count?: number): void;
  /** Workers alive, busy ones, and tasks waiting. */
  stats(): { alive: number; busy: number; queued: number };
  /** Cancels everything and terminates every worker. */
  dispose(): void;
}

interface Pending<Api> {
  task: (api: Comlink.Remote<Api>) => Promise<unknown>;
  resolve: (outcome: TaskOutcome<unknown>) => void;
  slot: Slot<Api> | null;
  settled: boolean;
  detach: () => void;
}

interface Slot<Api> {
  worker: Worker;
  api: Comlink.Remote<Api>;
  current: Pending<Api> | null;
}

function reasonOf(error: unknown): string {
  if (error instanceof Error) return error.message;
  return typeof error === 'string' ? error : 'the worker failed without a message';
}

export function createWorkerPool<Api>(options: PoolOptions<Api>): WorkerPool<Api> {
  const size = Math.max(1, Math.floor(options.size));
  const idleMs = options.idleMs ?? 60_000;
  const slots: Slot<Api>[] = [];
  const queue: Pending<Api>[] = [];
  let idleTimer: ReturnType<typeof setTimeout> | undefined;
  let disposed = false;

  function spawn(): Slot<Api> {
    const worker = options.create();
    const api = Comlink.wrap<Api>(worker);
    const slot: Slot<Api> = { worker, api, current: null };
    // A worker that cannot load its module, or dies, fails its task instead of hanging it.
    worker.addEventListener('error', (event: ErrorEvent) => {
      event.preventDefault?.();
      crash(slot, event.message || 'the simulation worker stopped unexpectedly');
    });
    slots.push(slot);
    if (options.warm) options.warm(api).catch(() => undefined);
    return slot;
  }

  function retire(slot: Slot<Api>): void {
    const i = slots.indexOf(slot);
    if (i >= 0) slots.splice(i, 1);
    slot.api[Comlink.releaseProxy]();
    slot.worker.terminate();
  }

  function settle(p: Pending<Api>, outcome: TaskOutcome<unknown>): void {
    if (p.settled) return;
    p.settled = true;
    p.detach();
    p.resolve(outcome);
  }

  function crash(slot: Slot<Api>, reason: string): void {
    const p = slot.current;
    retire(slot);
    if (p) settle(p, { status: 'failed', reason });
    pump();
  }

  function start(slot: Slot<Api>, p: Pending<Api>): void {
    slot.current = p;
    p.slot = slot;
    p.task(slot.api).then(
      (value) => finish(slot, p, { status: 'done', value }),
      (error: unknown) => finish(slot, p, { status: 'failed', reason: reasonOf(error) }),
    );
  }

  function finish(slot: Slot<Api>, p: Pending<Api>, outcome: TaskOutcome<unknown>): void {
    if (slot.current === p) slot.current = null;
    settle(p, outcome);
    pump();
  }

  function cancel(p: Pending<Api>): void {
    if (p.settled) return;
    const slot = p.slot;
    if (slot) {
      slot.current = null;
      retire(slot);
      if (options.warm && !disposed && slots.length < size) spawn();
    } else {
      const i = queue.indexOf(p);
      if (i >= 0) queue.splice(i, 1);
    }
    settle(p, { status: 'cancelled' });
    pump();
  }

  function pump(): void {
    if (idleTimer !== undefined) clearTimeout(idleTimer);
    idleTimer = undefined;
    if (disposed) return;
    while (queue.length > 0) {
      const slot = slots.find((s) => s.current === null) ?? (slots.length < size ? spawn() : null);
      if (!slot) break;
      start(slot, queue.shift()!);
    }
    const idle = queue.length === 0 && slots.every((s) => s.current === null);
    if (idle && idleMs > 0 && slots.length > 0) {
      idleTimer = setTimeout(() => {
        idleTimer = undefined;
        for (const s of [...slots]) if (s.current === null) retire(s);
      }, idleMs);
    }
  }

  return {
    run<T>(task: (api: Comlink.Remote<Api>) => Promise<T>, runOptions: RunOptions = {}): Promise<TaskOutcome<T>> {
      const { signal } = runOptions;
      if (signal?.aborted || disposed) return Promise.resolve({ status: 'cancelled' });
      return new Promise<TaskOutcome<T>>((resolve) => {
        const p: Pending<Api> = {
          task,
          resolve: resolve as (o: TaskOutcome<unknown>) => void,
          slot: null,
          settled: false,
          detach: () => signal?.removeEventListener('abort', onAbort),
        };
        const onAbort = () => cancel(p);
        signal?.addEventListener('abort', onAbort, { once: true });
        queue.push(p);
        pump();
      });
    },
    prewarm(count = 1) {
      while (slots.length < Math.min(size, count)) spawn();
      pump();
    },
    stats() {
      return { alive: slots.length, busy: slots.filter((s) => s.current !== null).length, queued: queue.length };
    },
    dispose() {
      disposed = true;
      for (const p of [...queue]) cancel(p);
      for (const s of [...slots]) {
        const p = s.current;
        retire(s);
        if (p) settle(p, { status: 'cancelled' });
      }
      if (idleTimer !== undefined) clearTimeout(idleTimer);
    },
  };
}
