import * as Comlink from 'comlink';
import type { RunRequestInput } from '../shared/schemas/run.ts';
import { simulateJob, transferablesOf, type SimulateExtras, type SimulateOutcome } from '../shared/runs/simulate-job.ts';
import type { VehicleRunRequestInput, VehicleRunResult } from '../shared/schemas/vehicle-run.ts';
import { runVehicle } from '../shared/sim/vehicle/run-vehicle.ts';

/**
 * Comlink shell around `simulateJob` (shared/runs/simulate-job.ts): the request is validated
 * there with the shared RunRequest schema, failures come back as values with their reason, and
 * the Float64Array columns are transferred, not copied.
 */
const api = {
  simulate(input: RunRequestInput, extras?: SimulateExtras): SimulateOutcome {
    const outcome = simulateJob(input, extras);
    return outcome.ok ? Comlink.transfer(outcome, transferablesOf(outcome)) : outcome;
  },
  /** A whole vehicle in the pitch plane: the figures only (its time histories stay here). */
  simulateVehicle(input: VehicleRunRequestInput): VehicleSimulateOutcome {
    const started = performance.now();
    const out = runVehicle(input);
    return out.ok ? { ok: true, result: out.result, workerMs: performance.now() - started } : { ok: false, reason: out.reason };
  },
  /** Answers once the module (and the simulation code) has loaded: used to warm a fresh worker. */
  ping(): 'ready' {
    return 'ready';
  },
};

export type SimulateApi = typeof api;

export type VehicleSimulateOutcome = { ok: true; result: VehicleRunResult; workerMs: number } | { ok: false; reason: string };

Comlink.expose(api);
