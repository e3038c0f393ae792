import type { FieldIssue } from '../errors.ts';
import type { RunRequestInput, RunResult } from '../schemas/run.ts';
import { frequencyResponse, type FrequencyResponse } from '../sim/linear/frequency-response.ts';
import { computeSpectra, type Spectra } from '../sim/metrics/compute-metrics.ts';
import { runCorner } from '../sim/run-corner.ts';
import type { TraceColumns } from '../sim/trace.ts';

/**
 * One simulation as the browser asks for it: the run (validated by `runCorner` with the shared
 * `RunRequest` schema), plus, on request, the Welch spectra and the linear frequency responses.
 * Pure, so the worker stays a shell and Node tests run exactly what the browser runs.
 */

export interface SimulateExtras {
  /** Welch PSDs of the analysed part (they cost about as much as all the metrics together). Default true. */
  spectra?: boolean;
  /** Gain and phase, 0.1–50 Hz, of the linearised corner. Default true. */
  response?: boolean;
}

export type SimulateOutcome =
  | {
      ok: true;
      result: RunResult;
      trace: TraceColumns;
      spectra: Spectra | null;
      response: FrequencyResponse | null;
      /** Wall time inside the worker, ms. */
      workerMs: number;
    }
  | { ok: false; reason: string; issues?: FieldIssue[] };

export function simulateJob(input: RunRequestInput, extras: SimulateExtras = {}): SimulateOutcome {
  const started = performance.now();
  const run = runCorner(input);
  if (!run.ok) return run;
  const spectra = extras.spectra === false ? null : computeSpectra(run.trace, { settleTime: run.result.settleTime });
  const response = extras.response === false ? null : frequencyResponse(run.result.linear);
  return { ok: true, result: run.result, trace: run.trace, spectra, response, workerMs: performance.now() - started };
}

/** Every distinct ArrayBuffer of a successful outcome, to hand to postMessage as transferables. */
export function transferablesOf(outcome: SimulateOutcome): ArrayBuffer[] {
  if (!outcome.ok) return [];
  const arrays: Float64Array[] = [];
  const { trace, spectra, response } = outcome;
  for (const value of Object.values(trace)) if (value instanceof Float64Array) arrays.push(value);
  if (spectra) arrays.push(spectra.freq, spectra.bodyAccel, spectra.travel, spectra.tyreLoad);
  if (response) {
    arrays.push(response.freq);
    for (const r of [response.bodyAccel, response.travel, response.tyreLoad]) arrays.push(r.gain, r.phase);
  }
  // A buffer listed twice makes postMessage throw; views sharing one buffer are sent once.
  return [...new Set(arrays.map((a) => a.buffer as ArrayBuffer))];
}
