import type { Histogram } from '../../../../shared/schemas/metrics.ts';
import type { Road } from '../../../../shared/schemas/road.ts';
import type { SavedRun } from '../../../../shared/schemas/run-record.ts';
import type { RunResult } from '../../../../shared/schemas/run.ts';
import type { Setup } from '../../../../shared/schemas/setup.ts';
import type { SimulateOutcome } from '../../../../shared/runs/simulate-job.ts';
import { rangeHistogram } from '../../../../shared/runs/range-histogram.ts';
import { fromStoredSpectra, fromStoredTraces, TYRE_LOAD_BINS } from '../../../../shared/runs/stored-run.ts';
import { thinColumns } from '../../../../shared/runs/thin-trace.ts';
import { frequencyResponse, type FrequencyResponse } from '../../../../shared/sim/linear/frequency-response.ts';
import type { Spectra } from '../../../../shared/sim/metrics/compute-metrics.ts';
import type { TraceColumns } from '../../../../shared/sim/trace.ts';

/**
 * What the dashboard draws, whether the run was just computed in a worker or read back from the
 * server. Traces are already thinned for drawing (a few thousand points per column: uPlot would
 * draw more, but the eye cannot see them and the shared cursor stays smooth).
 */
export interface RunView {
  /** 'fresh' keeps the full trace for saving and export; 'saved' has only the stored one. */
  source: 'fresh' | 'saved';
  setup: Setup;
  road: Road;
  seed?: number;
  result: RunResult;
  traces: DrawnTraces;
  /** How the drawn traces were picked from the full run. */
  thinned: 'all-samples' | 'bucket-extremes';
  tyreLoadHistogram: Histogram;
  spectra: Spectra | null;
  response: FrequencyResponse;
  /** Full-resolution columns (fresh runs only). */
  full: TraceColumns | null;
}

export interface DrawnTraces {
  time: Float64Array;
  bodyAccel: Float64Array;
  travel: Float64Array;
  tyreLoad: Float64Array;
  damperVelocity: Float64Array;
  damperForce: Float64Array;
  road: Float64Array;
}

/** Points per drawn column. */
export const DRAW_POINT_CAP = 4000;

const drawnNames = ['bodyAccel', 'travel', 'tyreLoad', 'damperVelocity', 'damperForce', 'road'] as const;

export function viewOfFresh(outcome: Extract<SimulateOutcome, { ok: true }>, setup: Setup, road: Road, seed?: number): RunView {
  const { trace, result } = outcome;
  const thinned = thinColumns(
    drawnNames.map((n) => trace[n]),
    trace.dt,
    DRAW_POINT_CAP,
  );
  const traces = { time: thinned.time } as DrawnTraces;
  drawnNames.forEach((n, i) => (traces[n] = thinned.columns[i]));
  const from = Math.min(trace.tyreLoad.length - 1, Math.round(result.settleTime / trace.dt));
  return {
    source: 'fresh',
    setup,
    road,
    seed,
    result,
    traces,
    thinned: thinned.method,
    tyreLoadHistogram: rangeHistogram(trace.tyreLoad, TYRE_LOAD_BINS, from),
    spectra: outcome.spectra,
    response: outcome.response ?? frequencyResponse(result.linear),
    full: trace,
  };
}

export type SavedViewOutcome = { ok: true; view: RunView } | { ok: false; reason: string };

export function viewOfSaved(saved: SavedRun): SavedViewOutcome {
  const traces = fromStoredTraces(saved.traces);
  if (!traces.ok) return { ok: false, reason: `The stored traces of this run cannot be read: ${traces.reason}.` };
  let spectra: Spectra | null = null;
  if (saved.spectra) {
    const s = fromStoredSpectra(saved.spectra);
    if (s.ok) spectra = s.columns;
  }
  return {
    ok: true,
    view: {
      source: 'saved',
      setup: saved.request.setup,
      road: saved.request.road,
      seed: saved.request.seed,
      result: saved.result,
      traces: traces.columns,
      thinned: saved.traces.method,
      tyreLoadHistogram: saved.traces.tyreLoadHistogram,
      spectra,
      // cheap (400 frequencies), so recomputed rather than stored
      response: frequencyResponse(saved.result.linear),
      full: null,
    },
  };
}
