import type { RunRequestInput, RunResult } from '../../../../shared/schemas/run.ts';
import type { TraceColumns } from '../../../../shared/sim/trace.ts';
import { simulate } from '../../../lib/simulate-client.ts';
import type { RunView } from './run-view.ts';

/** Output rates offered for a trace export, Hz (the request schema allows 200–5000). */
export const TRACE_RATES = [500, 1000, 2000] as const;

/** `rerun` holds the figures of a run made again (absent when the page already held every sample). */
export type FullRateOutcome = { ok: true; trace: TraceColumns; rerun?: RunResult } | { ok: false; reason: string };

/**
 * Every sample of a run at `rate`, evenly spaced. A run computed in this page at that rate
 * already holds them; otherwise (a saved run keeps only thinned traces, or another rate is
 * asked for) the stored inputs are run again in a worker: the simulation is deterministic
 * from setup, road, seed, speed and duration, so the figures are those that were saved.
 */
export async function fullRateTrace(view: RunView, request: RunRequestInput, rate: number, signal?: AbortSignal): Promise<FullRateOutcome> {
  if (view.full && Math.abs(1 / view.full.dt - rate) < 1e-9 * rate) return { ok: true, trace: view.full };
  const outcome = await simulate({ ...request, outputRate: rate }, { signal, spectra: false, response: false });
  if (outcome.ok) return { ok: true, trace: outcome.trace, rerun: outcome.result };
  return { ok: false, reason: outcome.reason };
}

/**
 * The `#` line a re-run trace file carries: the re-run's Wk-weighted body acceleration beside the
 * stored one, so a reader sees the traces belong to the saved figures (or that the simulation has
 * changed since the run was saved). At another output rate the figure moves slightly, since
 * the weighting filter runs on the output grid.
 */
export function rerunNote(stored: RunResult, rerun: RunResult): string {
  const a = stored.metrics.bodyAccelWkRms;
  const b = rerun.metrics.bodyAccelWkRms;
  const diff = a > 0 ? (Math.abs(b - a) / a) * 100 : 0;
  return `computed again from the stored inputs: Wk-weighted body acceleration ${+b.toPrecision(5)} m/s² (stored run ${+a.toPrecision(5)} m/s², ${diff < 0.005 ? 'the same' : `${+diff.toPrecision(2)} % apart`})`;
}
