import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { type DriveFitRequest, type DriveFitRequestInput, DriveFitRequest as DriveFitRequestSchema, type FitParameterKey } from '../schemas/drive-fit.ts';
import { type DriveChannel, driveChannels } from '../schemas/drive.ts';
import type { Setup } from '../schemas/setup.ts';
import { quantityLabel } from './drive-header.ts';
import { elevationExcitation, estimateRoad, roadFromProfile } from './drive-road.ts';
import { applyParameters, fitParameterOf, fitParameters } from './fit-parameters.ts';
import { bandCoherence, centred, normalisedError, pairSpectra, rms } from './fit-figures.ts';
import { invertSymmetric } from './invert.ts';
import { simulateDrive } from './simulate-drive.ts';

/**
 * Thresholds of a fit worth keeping (stated in README and on the page): every compared signal
 * within 35 % normalised error and above 0.6 mean coherence over 0.5–20 Hz. A drive fitted over
 * the wrong road lands far outside both (about 100 % and below 0.3 in the checks).
 */
export const GOOD_FIT = { maxNormalisedError: 0.35, minCoherence: 0.6 } as const;
/** The fit moves each parameter within these factors of where it started. */
const FACTOR_RANGE = { min: 0.2, max: 5 } as const;
/** Relative step of the finite differences (of the optimiser and of the bounds). */
const STEP = 1e-3;
/** Points kept per trace and per spectrum for display. */
const SHOWN_POINTS = 3000;
const SHOWN_MAX_FREQ = 50;
/** Iterations per round of the optimiser, and the least relative gain of a round worth another. */
const ROUND = 3;
const RELATIVE_GAIN = 1e-4;

export interface FittedParameter {
  key: FitParameterKey;
  label: string;
  unit: string;
  start: number;
  value: number;
  /** Half-width of the 95 % interval from the Jacobian at the optimum; null when not identifiable. */
  halfWidth: number | null;
}

export interface ChannelFit {
  channel: DriveChannel;
  /** Normalised error before the fit (the starting setup) and after. */
  startError: number;
  error: number;
  coherence: number;
  /** Thinned for display: every `stride`-th sample from the end of the settling time. */
  trace: { dt: number; measured: number[]; model: number[] };
  spectra: { freq: number[]; measured: number[]; model: number[]; coherence: number[] };
}

export type DriveFitOutcome =
  | {
      ok: true;
      setup: Setup;
      roadMethod: string;
      parameters: FittedParameter[];
      channels: ChannelFit[];
      verdict: { good: boolean; reasons: string[] };
      iterations: number;
      simulations: number;
      elapsedMs: number;
      /** Lag-1 autocorrelation of the residuals used to widen the bounds. */
      residualCorrelation: number;
    }
  | { ok: false; reason: string };

const cap = (s: string) => s[0].toUpperCase() + s.slice(1);

function issuePath(path: PropertyKey[]): string {
  return path.map(String).join('.') || '(request)';
}

/** Refuses parameter sets the drive cannot tell apart; null when the choice is fine. */
export function parameterProblem(keys: readonly FitParameterKey[], road: DriveFitRequest['road']['kind']): string | null {
  const params = keys.map(fitParameterOf);
  const scaling = fitParameters.filter((p) => p.scalesWithMotion);
  if (scaling.every((p) => keys.includes(p.key))) {
    return 'parameters: scaling every mass and rate by one factor gives the same motion; keep at least one fixed (usually the sprung mass, from the corner weights)';
  }
  const assumed = params.filter((p) => p.inRoadEstimate);
  if (road === 'estimated' && assumed.length) {
    return `parameters: the estimated road is worked out from ${assumed.map((p) => p.label.toLowerCase()).join(' and ')}; fit those against a measured profile instead`;
  }
  return null;
}

/**
 * Least-squares fit of chosen corner parameters to a measured drive (Levenberg–Marquardt,
 * ml-levenberg-marquardt). Each parameter is fitted as a factor on its starting value, so one
 * finite-difference step suits masses and rates alike. The residual of each signal is its
 * mean-removed difference divided by the measured RMS, so signals in different units count alike
 * and the sum of squares is the sum of squared normalised errors.
 *
 * Bounds: the covariance of the factors is s²·(JᵀJ)⁻¹, J the Jacobian of the residuals at the
 * optimum (central differences), s² = SSR/(N − p), widened by (1 + ρ)/(1 − ρ) for the lag-1
 * autocorrelation ρ of the residuals (an AR(1) effective sample count; common practice); the
 * 95 % interval is ±1.96 standard deviations (normal approximation). They describe the noise in
 * this drive, not what the model leaves out.
 */
export function fitDrive(input: DriveFitRequestInput): DriveFitOutcome {
  const started = performance.now();
  const parsed = DriveFitRequestSchema.safeParse(input);
  if (!parsed.success) {
    const issue = parsed.error.issues[0];
    return { ok: false, reason: `${issuePath(issue.path)}: ${issue.message}` };
  }
  const req = parsed.data;
  const { setup, data } = req;
  const samples = data.speed.length;
  const channels = (req.channels ?? driveChannels.filter((c) => data.channels[c])).filter((c, i, all) => all.indexOf(c) === i);
  const missing = channels.find((c) => !data.channels[c] || data.channels[c].length !== samples);
  if (missing) return { ok: false, reason: `channels: the drive has no ${missing} signal of its length` };
  const from = Math.round(req.settle / data.dt);
  if (samples - from < 256) return { ok: false, reason: 'settle: leaves fewer than 256 samples to compare' };
  const problem = parameterProblem(req.parameters, req.road.kind);
  if (problem) return { ok: false, reason: problem };

  const road = req.road.kind === 'profile' ? roadFromProfile(data, req.road.road, setup.tyreFootprint, req.road.offset) : estimateRoad(data, setup);
  if (!road.ok) return road;
  const excitation = elevationExcitation(road.elevation, data.dt, road.method);

  const keys = req.parameters;
  const starts = keys.map((k) => fitParameterOf(k).read(setup));
  const setupAt = (factors: readonly number[]) => applyParameters(setup, keys, factors.map((f, i) => f * starts[i]));

  // Targets: each channel centred and scaled so that its squared residuals sum to its NRMSE².
  const measured = channels.map((c) => centred(data.channels[c] as number[], from));
  const scales = measured.map((m) => 1 / (rms(m) * Math.sqrt(m.length)));
  if (scales.some((s) => !Number.isFinite(s))) return { ok: false, reason: 'channels: a chosen signal is flat over the compared part of the drive' };
  const per = samples - from;
  const total = per * channels.length;
  const y = new Float64Array(total);
  channels.forEach((_, c) => {
    for (let i = 0; i < per; i++) y[c * per + i] = measured[c][i] * scales[c];
  });

  let simulations = 0;
  const cache = new Map<string, { values: Float64Array; model: Float64Array[] | null }>();
  const predict = (factors: readonly number[]) => {
    const key = factors.join(',');
    const hit = cache.get(key);
    if (hit) return hit;
    simulations++;
    const sim = simulateDrive(setupAt(factors), excitation, samples, data.dt);
    const values = new Float64Array(total);
    let model: Float64Array[] | null = null;
    if (sim.ok) {
      model = channels.map((c) => centred(sim.channels[c], from));
      model.forEach((m, c) => {
        for (let i = 0; i < per; i++) values[c * per + i] = m[i] * scales[c];
      });
    } else {
      // A corner the model cannot run (the gas lifting it, say) is a very poor fit, not a crash.
      for (let i = 0; i < total; i++) values[i] = y[i] + 10;
    }
    if (cache.size > 64) cache.clear();
    const entry = { values, model };
    cache.set(key, entry);
    return entry;
  };

  // The optimiser stops only on an absolute error or an iteration count; it is run a few
  // iterations at a time and stopped once a round improves the sum of squares by less than 0.01 %.
  const x = Array.from({ length: total }, (_, i) => i);
  let best = keys.map(() => 1);
  let error = Infinity;
  let iterations = 0;
  while (iterations < req.maxIterations) {
    const round = levenbergMarquardt({ x, y }, (factors) => {
      const { values } = predict(factors);
      return (i) => values[i];
    }, {
      initialValues: best,
      minValues: keys.map(() => FACTOR_RANGE.min),
      maxValues: keys.map(() => FACTOR_RANGE.max),
      gradientDifference: STEP,
      damping: 1e-3,
      maxIterations: Math.min(ROUND, req.maxIterations - iterations),
      errorTolerance: 1e-10,
    });
    iterations += round.iterations;
    const improved = error - round.parameterError;
    if (round.parameterError < error) {
      best = round.parameterValues;
      error = round.parameterError;
    }
    if (!(improved > RELATIVE_GAIN * error) || round.iterations === 0) break;
  }
  const at = predict(best);
  if (!at.model) return { ok: false, reason: 'the fitted corner cannot be run; try other starting values or fewer parameters' };

  // Bounds from the Jacobian at the optimum (central differences).
  const p = keys.length;
  const jtj = Array.from({ length: p }, () => new Float64Array(p));
  const columns: Float64Array[] = [];
  for (let k = 0; k < p; k++) {
    const up = best.slice();
    const down = best.slice();
    up[k] += STEP;
    down[k] -= STEP;
    const a = predict(up).values;
    const b = predict(down).values;
    const col = new Float64Array(total);
    for (let i = 0; i < total; i++) col[i] = (a[i] - b[i]) / (2 * STEP);
    columns.push(col);
  }
  for (let r = 0; r < p; r++) {
    for (let c = r; c < p; c++) {
      let s = 0;
      for (let i = 0; i < total; i++) s += columns[r][i] * columns[c][i];
      jtj[r][c] = s;
      jtj[c][r] = s;
    }
  }
  let ssr = 0;
  let lagged = 0;
  for (let i = 0; i < total; i++) {
    const e = y[i] - at.values[i];
    ssr += e * e;
    if (i % per !== 0) lagged += e * (y[i - 1] - at.values[i - 1]);
  }
  const rho = Math.min(0.999, Math.max(0, ssr > 0 ? lagged / ssr : 0));
  const inverse = invertSymmetric(jtj);
  const variance = (ssr / Math.max(1, total - p)) * ((1 + rho) / (1 - rho));

  const fitted = setupAt(best);
  const parameters: FittedParameter[] = keys.map((key, k) => {
    const param = fitParameterOf(key);
    const sd = inverse && inverse[k][k] > 0 ? Math.sqrt(variance * inverse[k][k]) : null;
    return { key, label: param.label, unit: param.unit, start: starts[k], value: best[k] * starts[k], halfWidth: sd === null ? null : 1.96 * sd * starts[k] };
  });

  const startModel = predict(keys.map(() => 1)).model;
  const stride = Math.max(1, Math.ceil(per / SHOWN_POINTS));
  const channelFits: ChannelFit[] = channels.map((channel, c) => {
    const m = measured[c];
    const model = (at.model as Float64Array[])[c];
    const spectra = pairSpectra(m, model, data.dt);
    const shown = spectra.freq.findIndex((f) => f > SHOWN_MAX_FREQ);
    const cut = shown === -1 ? spectra.freq.length : shown;
    const pick = (arr: Float64Array) => Array.from(arr.subarray(1, cut));
    const thin = (arr: Float64Array) => Array.from({ length: Math.ceil(arr.length / stride) }, (_, i) => arr[i * stride]);
    return {
      channel,
      startError: startModel ? normalisedError(m, startModel[c]) : Infinity,
      error: normalisedError(m, model),
      coherence: bandCoherence(spectra, data.dt),
      trace: { dt: data.dt * stride, measured: thin(m), model: thin(model) },
      spectra: { freq: pick(spectra.freq), measured: pick(spectra.measured), model: pick(spectra.model), coherence: pick(spectra.coherence) },
    };
  });

  const reasons = channelFits.flatMap((f) => [
    ...(f.error > GOOD_FIT.maxNormalisedError ? [`${cap(quantityLabel[f.channel])}: normalised error ${(f.error * 100).toFixed(0)} % is above ${GOOD_FIT.maxNormalisedError * 100} %`] : []),
    ...(f.coherence < GOOD_FIT.minCoherence ? [`${cap(quantityLabel[f.channel])}: mean coherence ${f.coherence.toFixed(2)} is below ${GOOD_FIT.minCoherence}`] : []),
  ]);
  const atLimit = parameters.filter((q, k) => best[k] <= FACTOR_RANGE.min * 1.0001 || best[k] >= FACTOR_RANGE.max * 0.9999);
  for (const q of atLimit) reasons.push(`${q.label} stopped at the edge of its range (${FACTOR_RANGE.min}× to ${FACTOR_RANGE.max}× its start)`);

  return {
    ok: true,
    setup: fitted,
    roadMethod: road.method,
    parameters,
    channels: channelFits,
    verdict: { good: reasons.length === 0, reasons },
    iterations,
    simulations,
    elapsedMs: performance.now() - started,
    residualCorrelation: rho,
  };
}
