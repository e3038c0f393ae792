import type { RunRequestInput } from '../../shared/schemas/run.ts';
import type { SimulateExtras, SimulateOutcome } from '../../shared/runs/simulate-job.ts';
import type { VehicleRunRequestInput } from '../../shared/schemas/vehicle-run.ts';
import type { SimulateApi, VehicleSimulateOutcome } from '../../workers/simulate.worker.ts';
import { createWorkerPool, type RunOptions, type WorkerPool } from './worker-pool.ts';

/**
 * Simulation in the browser, always off the main thread.
 *
 * ```ts
 * const controller = new AbortController();
 * const outcome = await simulate({ setup, road, speed, duration }, { signal: controller.signal });
 * if (outcome.ok) show(outcome.result, outcome.trace);      // Float64Array columns, transferred
 * else if (outcome.cancelled) idle();                        // the signal fired
 * else showReason(outcome.reason, outcome.issues);           // bad input or a run that gave up
 * ```
 * - `simulate(request, { signal, spectra, response })` → `SimulateResult` (never throws for
 *   expected trouble). `spectra`/`response` default to true; live mode turns spectra off.
 * - `simulatePool()` is the shared pool (a few `workers/simulate.worker.ts` workers, created on
 *   first use, idle ones stopped after a minute). Studies run their own tasks on it:
 *   `simulatePool().run((api) => api.simulate(req, { spectra: false }), { signal })`, or create a
 *   pool of another worker with `createWorkerPool` from `./worker-pool.ts`.
 * - Pool size: `navigator.hardwareConcurrency − 1`, at least 2 (one can be replaced while the
 *   other works) and at most 4.
 */

export type SimulateResult = SimulateOutcome | { ok: false; cancelled: true; reason: string };

export interface SimulateOptions extends RunOptions, SimulateExtras {}

export function poolSize(hardwareConcurrency: number | undefined): number {
  return Math.max(2, Math.min(4, (hardwareConcurrency ?? 2) - 1));
}

let pool: WorkerPool<SimulateApi> | undefined;

export function simulatePool(): WorkerPool<SimulateApi> {
  pool ??= createWorkerPool<SimulateApi>({
    create: () => new Worker(new URL('../../workers/simulate.worker.ts', import.meta.url), { type: 'module', name: 'ridewright-simulate' }),
    size: poolSize(typeof navigator === 'undefined' ? undefined : navigator.hardwareConcurrency),
    idleMs: 60_000,
    warm: (api) => api.ping(),
  });
  return pool;
}

/** Runs one request in a worker. Cancelling (the signal) stops the computation itself, not just the wait. */
export async function simulate(request: RunRequestInput, options: SimulateOptions = {}): Promise<SimulateResult> {
  const { signal, spectra, response } = options;
  // Comlink's Remote<> rewrites the return type structurally; the value is the worker's SimulateOutcome.
  const outcome = await simulatePool().run((api) => api.simulate(request, { spectra, response }) as unknown as Promise<SimulateOutcome>, { signal });
  if (outcome.status === 'done') return outcome.value;
  if (outcome.status === 'cancelled') return { ok: false, cancelled: true, reason: 'cancelled' };
  return { ok: false, reason: `The simulation stopped: ${outcome.reason}` };
}

export type VehicleSimulateResult = VehicleSimulateOutcome | { ok: false; cancelled: true; reason: string };

/** Runs one pitch-plane vehicle in a worker of the same pool; cancelling stops the computation. */
export async function simulateVehicle(request: VehicleRunRequestInput, options: RunOptions = {}): Promise<VehicleSimulateResult> {
  const outcome = await simulatePool().run((api) => api.simulateVehicle(request) as unknown as Promise<VehicleSimulateOutcome>, { signal: options.signal });
  if (outcome.status === 'done') return outcome.value;
  if (outcome.status === 'cancelled') return { ok: false, cancelled: true, reason: 'cancelled' };
  return { ok: false, reason: `The simulation stopped: ${outcome.reason}` };
}
