import { Worker } from 'node:worker_threads';
import type { RunRequestInput } from '../shared/schemas/run.ts';
import type { StudyRunJob } from '../shared/study/run-jobs.ts';

type RunSummary = { aw: number; evals: number } | { error: string };

/** A pool of worker threads that each run their share of a list of run requests. */
export async function startPool(size: number) {
  const workers = await Promise.all(
    Array.from({ length: size }, () => {
      // The worker is TypeScript too: a small bootstrap registers tsx's loader inside the
      // thread (Node 20 does not carry the main thread's loader into workers), then imports it.
      const url = new URL('./sweep-worker.ts', import.meta.url).href;
      const boot = `import('tsx/esm/api').then((tsx) => { tsx.register(); return import(${JSON.stringify(url)}); });`;
      const w = new Worker(boot, { eval: true });
      return new Promise<Worker>((resolve, reject) => {
        w.once('message', () => resolve(w));
        w.once('error', reject);
      });
    }),
  );
  async function spread<T>(items: T[], message: (part: T[]) => unknown): Promise<RunSummary[]> {
    const share = Math.ceil(items.length / workers.length);
    const parts = await Promise.all(
      workers.map(
        (w, i) =>
          new Promise<RunSummary[]>((resolve, reject) => {
            w.once('message', resolve);
            w.once('error', reject);
            w.postMessage(message(items.slice(i * share, (i + 1) * share)));
          }),
      ),
    );
    return parts.flat();
  }
  return {
    /** Splits the requests evenly, runs each through `runCorner`, and returns every summary in order. */
    run(requests: RunRequestInput[]): Promise<RunSummary[]> {
      return spread(requests, (part) => ({ kind: 'single', requests: part }));
    },
    /** The same split for study jobs, run as a study worker runs them (shared/study/run-jobs.ts). */
    runStudy(jobs: StudyRunJob[]): Promise<RunSummary[]> {
      return spread(jobs, (part) => ({ kind: 'study', jobs: part }));
    },
    async close() {
      await Promise.all(workers.map((w) => w.terminate()));
    },
  };
}
