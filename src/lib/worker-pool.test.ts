import * as Comlink from 'comlink';
import { afterEach, describe, expect, it } from 'vitest';
import { createWorkerPool, type WorkerPool } from './worker-pool.ts';

/**
 * A stand-in for a Web Worker in Node: a MessageChannel with a comlink-exposed API on the far
 * end. `terminate` closes both ports, as a real worker stops answering.
 */
const api = {
  async add(a: number, b: number) {
    return a + b;
  },
  /** Resolves after `ms` (a long computation the test can cancel). */
  wait(ms: number) {
    return new Promise<string>((r) => setTimeout(() => r(`waited ${ms}`), ms));
  },
  boom(): number {
    throw new Error('bug inside the worker');
  },
  ping() {
    return 'ready';
  },
};
type Api = typeof api;

let created = 0;
let terminated = 0;
class FakeWorker extends EventTarget {
  private readonly channel = new MessageChannel();
  constructor() {
    super();
    created++;
    Comlink.expose(api, this.channel.port2 as unknown as Comlink.Endpoint);
    this.channel.port1.addEventListener('message', (e) => this.dispatchEvent(new MessageEvent('message', { data: (e as MessageEvent).data })));
    this.channel.port1.start();
  }
  postMessage(data: unknown, transfer?: Transferable[]) {
    this.channel.port1.postMessage(data, transfer ?? []);
  }
  terminate() {
    terminated++;
    this.channel.port1.close();
    this.channel.port2.close();
  }
}

let pool: WorkerPool<Api> | undefined;
function makePool(size: number, idleMs = 0, warm = true) {
  created = 0;
  terminated = 0;
  pool = createWorkerPool<Api>({ create: () => new FakeWorker() as unknown as Worker, size, idleMs, warm: warm ? (a) => a.ping() : undefined });
  return pool;
}
afterEach(() => pool?.dispose());

describe('worker pool', () => {
  it('creates no worker until the first task, then runs tasks and returns their values', async () => {
    const p = makePool(2);
    expect(created).toBe(0);
    const [a, b, c] = await Promise.all([p.run((w) => w.add(1, 2)), p.run((w) => w.add(3, 4)), p.run((w) => w.add(5, 6))]);
    expect([a, b, c]).toEqual([
      { status: 'done', value: 3 },
      { status: 'done', value: 7 },
      { status: 'done', value: 11 },
    ]);
    expect(created).toBe(2); // the third task waited for a free worker
  });

  it('cancels a running task by terminating its worker and starts a warm replacement', async () => {
    const p = makePool(1);
    const controller = new AbortController();
    const long = p.run((w) => w.wait(10_000), { signal: controller.signal });
    await new Promise((r) => setTimeout(r, 20));
    expect(p.stats().busy).toBe(1);
    controller.abort();
    expect(await long).toEqual({ status: 'cancelled' });
    expect(terminated).toBe(1);
    expect(p.stats().alive).toBe(1); // the replacement
    expect(await p.run((w) => w.add(2, 2))).toEqual({ status: 'done', value: 4 });
    expect(created).toBe(2);
  });

  it('drops a queued task on cancel without touching the busy worker', async () => {
    const p = makePool(1);
    const first = p.run((w) => w.wait(50));
    const controller = new AbortController();
    const queued = p.run((w) => w.add(1, 1), { signal: controller.signal });
    expect(p.stats().queued).toBe(1);
    controller.abort();
    expect(await queued).toEqual({ status: 'cancelled' });
    expect(await first).toEqual({ status: 'done', value: 'waited 50' });
    expect(terminated).toBe(0);
  });

  it('reports a task that throws inside the worker as failed, with the message', async () => {
    const p = makePool(1);
    const outcome = await p.run((w) => w.boom());
    expect(outcome.status).toBe('failed');
    if (outcome.status === 'failed') expect(outcome.reason).toMatch(/bug inside the worker/);
    expect(await p.run((w) => w.add(1, 2))).toEqual({ status: 'done', value: 3 });
  });

  it('resolves an already aborted signal as cancelled without starting a worker', async () => {
    const p = makePool(1);
    expect(await p.run((w) => w.add(1, 2), { signal: AbortSignal.abort() })).toEqual({ status: 'cancelled' });
    expect(created).toBe(0);
  });

  it('terminates idle workers after the idle time and starts again on the next task', async () => {
    const p = makePool(2, 30, false);
    await Promise.all([p.run((w) => w.add(1, 1)), p.run((w) => w.add(1, 1))]);
    expect(p.stats().alive).toBe(2);
    await new Promise((r) => setTimeout(r, 80));
    expect(p.stats().alive).toBe(0);
    expect(terminated).toBe(2);
    expect(await p.run((w) => w.add(2, 3))).toEqual({ status: 'done', value: 5 });
  });
});
