import {
  SPECTRUM_BIN_CAP,
  storedSpectrumColumns,
  type StoredSpectra,
  type StoredSpectrumColumn,
  storedTraceColumns,
  type StoredTraceColumn,
  type StoredTraces,
  TRACE_POINT_CAP,
} from '../schemas/run-record.ts';
import type { Spectra } from '../sim/metrics/compute-metrics.ts';
import type { TraceColumns } from '../sim/trace.ts';
import { decodeColumns, encodeColumns } from './float-codec.ts';
import { rangeHistogram } from './range-histogram.ts';
import { thinColumns } from './thin-trace.ts';

/** Bins of the stored tyre load distribution. */
export const TYRE_LOAD_BINS = 40;

/** Thinned, encoded time histories of a run, ready to save; `settleTime` starts the load distribution. */
export function toStoredTraces(trace: TraceColumns, settleTime: number, cap = TRACE_POINT_CAP): StoredTraces {
  const source = storedTraceColumns.slice(1).map((name) => trace[name as Exclude<StoredTraceColumn, 'time'>]);
  const thinned = thinColumns(source, trace.dt, cap);
  return {
    method: thinned.method,
    fullLength: trace.bodyAccel.length,
    length: thinned.time.length,
    data: encodeColumns([thinned.time, ...thinned.columns]),
    tyreLoadHistogram: rangeHistogram(trace.tyreLoad, TYRE_LOAD_BINS, Math.min(trace.tyreLoad.length - 1, Math.round(settleTime / trace.dt))),
  };
}

export type StoredColumns<K extends string> = { ok: true; columns: Record<K, Float64Array> } | { ok: false; reason: string };

function named<K extends string>(names: readonly K[], columns: Float64Array[]): Record<K, Float64Array> {
  const out = {} as Record<K, Float64Array>;
  names.forEach((name, i) => (out[name] = columns[i]));
  return out;
}

/** Stored traces back to named columns (`time`, `bodyAccel`, …). */
export function fromStoredTraces(stored: StoredTraces): StoredColumns<StoredTraceColumn> {
  const decoded = decodeColumns(stored.data, storedTraceColumns.length, stored.length);
  return decoded.ok ? { ok: true, columns: named(storedTraceColumns, decoded.columns) } : decoded;
}

/**
 * Spectra to store. Above `cap` bins, neighbouring bins are averaged in groups: the mean of a
 * density over a group is still a density, so areas (mean squares) are kept.
 */
export function toStoredSpectra(spectra: Spectra, cap = SPECTRUM_BIN_CAP): StoredSpectra {
  const n = spectra.freq.length;
  const cols = [spectra.freq, spectra.bodyAccel, spectra.travel, spectra.tyreLoad];
  if (n <= cap) return { length: n, data: encodeColumns(cols) };
  const group = Math.ceil(n / cap);
  const m = Math.ceil(n / group);
  const out = cols.map((col) => {
    const avg = new Float64Array(m);
    for (let g = 0; g < m; g++) {
      const from = g * group;
      const to = Math.min(n, from + group);
      let sum = 0;
      for (let i = from; i < to; i++) sum += col[i];
      avg[g] = sum / (to - from);
    }
    return avg;
  });
  return { length: m, data: encodeColumns(out) };
}

export function fromStoredSpectra(stored: StoredSpectra): StoredColumns<StoredSpectrumColumn> {
  const decoded = decodeColumns(stored.data, storedSpectrumColumns.length, stored.length);
  return decoded.ok ? { ok: true, columns: named(storedSpectrumColumns, decoded.columns) } : decoded;
}
