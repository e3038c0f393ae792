import type { Metrics } from '../../schemas/metrics.ts';
import type { TraceColumns } from '../trace.ts';
import { comfortGrading, rmsAndVdv, wkFilter } from './iso2631.ts';
import { niceHalfWidth, symmetricHistogram, velocityBands } from './histogram.ts';
import { createWelch, defaultSegmentLength } from './spectra.ts';
import { countAbove, dot, extremes, summary } from './stats.ts';
import { mtvv, settleBand, settlingTime } from './transient.ts';

export interface MetricOptions {
  /** Start of the analysed part, s; earlier samples only warm the Wk filter. */
  settleTime: number;
  /** Fz0 = (ms + mu) g, N. */
  staticTyreLoad: number;
  /** Available travel from static, m, both positive. */
  stroke?: { compression: number; extension: number };
  /**
   * Edges on |damper velocity|, m/s. The defaults 0.05 and 0.25 m/s are common practice for
   * splitting body control, mid and impact speeds, not a standard.
   */
  velocityBands?: { low: number; high: number };
  /** Bins of the damper velocity histogram; default 40. */
  histogramBins?: number;
  /** Event roads: when the event ends, s from the start; adds the settling time. */
  eventEnd?: number;
}

/** First analysed sample for a settling time (throws: callers validate settle < duration). */
export function firstSample(trace: TraceColumns, settleTime: number): number {
  const n = trace.bodyAccel.length;
  const from = Math.max(0, Math.round(settleTime / trace.dt));
  if (n - from < 2) {
    throw new Error(`computeMetrics: settleTime ${settleTime} s leaves ${Math.max(0, n - from)} samples of ${n}`);
  }
  return from;
}

/** Ride and grip figures of one trace; a few passes per column, nothing allocated per sample. */
export function computeMetrics(trace: TraceColumns, opts: MetricOptions): Metrics {
  const { dt } = trace;
  const from = firstSample(trace, opts.settleTime);
  const n = trace.bodyAccel.length - from;
  const analysedTime = n * dt;
  const fz0 = opts.staticTyreLoad;

  const accel = summary(trace.bodyAccel, from);
  const accelRms = accel.rms;
  // The filter runs from the first sample so it has settled by `from`.
  const wk = wkFilter(trace.bodyAccel, dt);
  const weighted = rmsAndVdv(wk, dt, from);
  const aw = weighted.rms;
  const wkPeak = extremes(wk, from).peak;

  const load = summary(trace.tyreLoad, from, fz0);
  const loadRms = load.rms;
  const inContact = countAbove(trace.tyreLoad, 0, from);

  const travel = summary(trace.travel, from);

  const v = trace.damperVelocity;
  const vel = summary(v, from);
  const bands = opts.velocityBands ?? { low: 0.05, high: 0.25 };
  const energy = dot(trace.damperForce, v, from) * dt;

  const metrics: Metrics = {
    analysedTime,
    bodyAccelRms: accelRms,
    bodyAccelPeak: accel.peak,
    bodyAccelCrest: accelRms > 0 ? accel.peak / accelRms : 0,
    bodyAccelWkRms: aw,
    vdv: weighted.vdv,
    comfort: comfortGrading(aw),
    bodyAccelWkPeak: wkPeak,
    bodyAccelWkCrest: aw > 0 ? wkPeak / aw : 0,
    mtvv: mtvv(wk, dt, from),
    tyreLoadStatic: fz0,
    tyreLoadRms: loadRms,
    tyreLoadRatio: loadRms / fz0,
    tyreLoadMin: Math.max(0, load.min),
    liftOffFraction: (n - inContact) / n,
    travelRms: travel.rms,
    travelMaxCompression: travel.max,
    travelMaxExtension: -travel.min,
    bumpStopTime: countAbove(trace.bumpStopForce, 0, from) * dt,
    reboundStopTime: countAbove(trace.reboundStopForce, 0, from) * dt,
    damperVelocityRms: vel.rms,
    damperVelocityHistogram: symmetricHistogram(v, niceHalfWidth(vel.peak), opts.histogramBins ?? 40, from),
    damperVelocityBands: velocityBands(v, bands.low, bands.high, from),
    damperPowerMean: energy / analysedTime,
    damperEnergy: energy,
  };
  if (opts.eventEnd !== undefined) {
    const band = settleBand(accel.peak);
    metrics.settling = { eventEnd: opts.eventEnd, band, time: settlingTime(trace.bodyAccel, dt, opts.eventEnd, band) };
  }
  if (opts.stroke) {
    metrics.strokeUsedCompression = travel.max / opts.stroke.compression;
    metrics.strokeUsedExtension = -travel.min / opts.stroke.extension;
  }
  return metrics;
}

export interface SpectraOptions {
  settleTime: number;
  /** Welch segment length (power of two); default about seven half-overlapping segments. */
  segmentLength?: number;
}

/** Welch PSDs of the analysed part: body acceleration (m²/s⁴/Hz), travel (m²/Hz), tyre load (N²/Hz). */
export interface Spectra {
  freq: Float64Array;
  bodyAccel: Float64Array;
  travel: Float64Array;
  tyreLoad: Float64Array;
}

/** Spectra on request only (they cost more than all the metrics together). */
export function computeSpectra(trace: TraceColumns, opts: SpectraOptions): Spectra {
  const from = firstSample(trace, opts.settleTime);
  const n = trace.bodyAccel.length - from;
  const welch = createWelch(opts.segmentLength ?? defaultSegmentLength(n), trace.dt);
  return {
    freq: welch.freq,
    bodyAccel: welch.psd(trace.bodyAccel, from),
    travel: welch.psd(trace.travel, from),
    // Welch removes each segment's mean, so the static load drops out by itself.
    tyreLoad: welch.psd(trace.tyreLoad, from),
  };
}
