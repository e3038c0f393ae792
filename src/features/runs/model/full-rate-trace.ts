import type { RunRequestInput } from '../../../../shared/schemas/run.ts';
import type { TraceColumns } from '../../../../shared/sim/trace.ts';
import { simulate } from '../../../lib/simulate-client.ts';
import type { RunView } from './run-view.ts';

/** Output rates offered for a trace export, Hz (the request schema allows 200–5000). */
export const TRACE_RATES = [500, 1000, 2000] as const;

export type FullRateOutcome = { ok: true; trace: TraceColumns } | { ok: false; reason: string };

/**
 * Every sample of a run at `rate`, evenly spaced. A run computed in this page at that rate
 * already holds them; otherwise (a saved run keeps only thinned traces, or another rate is
 * asked for) the stored inputs are run again in a worker: the simulation is deterministic
 * from setup, road, seed, speed and duration, so the figures are those that were saved.
 */
export async function fullRateTrace(view: RunView, request: RunRequestInput, rate: number, signal?: AbortSignal): Promise<FullRateOutcome> {
  if (view.full && Math.abs(1 / view.full.dt - rate) < 1e-9 * rate) return { ok: true, trace: view.full };
  const outcome = await simulate({ ...request, outputRate: rate }, { signal, spectra: false, response: false });
  if (outcome.ok) return { ok: true, trace: outcome.trace };
  return { ok: false, reason: outcome.reason };
}
