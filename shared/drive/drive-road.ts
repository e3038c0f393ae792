import FFT from 'fft.js';
import type { DriveData } from '../schemas/drive.ts';
import type { MeasuredRoad } from '../schemas/road.ts';
import type { Setup } from '../schemas/setup.ts';
import type { RoadExcitation } from '../sim/roads/excitation.ts';
import { movingAverage, resampleMeasured } from '../sim/roads/measured.ts';
import { gridSpline } from '../sim/roads/spline.ts';

/** Road elevation under the tyre at each sample of a drive, m (starting at zero). */
export type DriveRoadOutcome = { ok: true; elevation: Float64Array; method: string } | { ok: false; reason: string };

/** Distance driven at each sample: trapezoidal integral of the logged speed, m. */
export function distanceAlong(data: DriveData): Float64Array {
  const s = new Float64Array(data.speed.length);
  for (let i = 1; i < s.length; i++) s[i] = s[i - 1] + 0.5 * (data.speed[i] + data.speed[i - 1]) * data.dt;
  return s;
}

/**
 * The profile of a measured library road read at the distance the car had covered at each sample
 * (its speed integrated), from `offset` metres into the profile. The tyre's footprint averages the
 * profile as in a constant-speed run. Fails when the drive runs past the end of the profile.
 */
export function roadFromProfile(data: DriveData, road: MeasuredRoad, footprint: number | undefined, offset = 0): DriveRoadOutcome {
  const res = resampleMeasured(road);
  if (!res.ok) return res;
  const { dx, length } = res.profile;
  const s = distanceAlong(data);
  const end = offset + s[s.length - 1];
  if (end > length + 1e-9) {
    return { ok: false, reason: `road: the drive covers ${s[s.length - 1].toFixed(1)} m from ${offset.toFixed(1)} m, past the end of the ${length.toFixed(1)} m profile` };
  }
  const raw = footprint ? movingAverage(res.profile.z, dx, footprint) : res.profile.z;
  const spline = gridSpline(raw, dx, false);
  const out = new Float64Array(2);
  const elevation = new Float64Array(s.length);
  spline.at(offset, out);
  const z0 = out[0];
  for (let i = 0; i < s.length; i++) {
    spline.at(offset + s[i], out);
    elevation[i] = out[0] - z0;
  }
  return { ok: true, elevation, method: `profile "${road.name ?? "measured"}" from ${offset} m` };
}

/** Lowest frequency kept when a displacement is integrated from an acceleration, Hz. */
export const ESTIMATE_CUT_ON = 0.5;

/**
 * Double integration in the frequency domain: X(f) = −A(f)/(2πf)², with everything below
 * `cutOn` removed (a drifting offset and slope would otherwise swamp the result). The signal is
 * mean-removed, tapered at both ends over 2 % of its length and zero-padded to a power of two.
 */
export function displacementFromAcceleration(a: ArrayLike<number>, dt: number, cutOn = ESTIMATE_CUT_ON): Float64Array {
  const n = a.length;
  let size = 16;
  while (size < 2 * n) size *= 2;
  let mean = 0;
  for (let i = 0; i < n; i++) mean += a[i];
  mean /= n;
  const taper = Math.max(1, Math.floor(0.02 * n));
  const input = new Float64Array(size);
  for (let i = 0; i < n; i++) {
    const edge = Math.min(i, n - 1 - i);
    const w = edge >= taper ? 1 : 0.5 - 0.5 * Math.cos((Math.PI * edge) / taper);
    input[i] = (a[i] - mean) * w;
  }
  const fft = new FFT(size);
  const spectrum = fft.createComplexArray() as number[];
  fft.realTransform(spectrum, input);
  fft.completeSpectrum(spectrum);
  for (let k = 0; k < size; k++) {
    const f = (k <= size / 2 ? k : size - k) / (size * dt);
    const gain = f < cutOn ? 0 : -1 / (2 * Math.PI * f) ** 2;
    spectrum[2 * k] *= gain;
    spectrum[2 * k + 1] *= gain;
  }
  const back = fft.createComplexArray() as number[];
  fft.inverseTransform(back, spectrum);
  const x = new Float64Array(n);
  for (let i = 0; i < n; i++) x[i] = back[2 * i];
  return x;
}

/**
 * The road estimated from the wheel signals, for a drive over a road nobody measured. The force
 * balance of the two masses, with the tyre as a linear spring, gives the tyre deflection from the
 * accelerations: kt·(zr − zu) = ms·as + mu·au; the wheel's own motion zu comes from integrating
 * its acceleration twice. So zr = zu + (ms·as + mu·au)/kt.
 *
 * Limits: it needs both accelerations; it uses the starting setup's masses and tyre rate (so
 * those cannot then be fitted: the fit would chase its own assumption); it ignores tyre damping
 * and cannot see a wheel off the ground; everything below 0.5 Hz is lost to the integration.
 */
export function estimateRoad(data: DriveData, setup: Setup): DriveRoadOutcome {
  const as = data.channels.bodyAccel;
  const au = data.channels.wheelAccel;
  if (!as || !au) return { ok: false, reason: 'road: an estimated road needs both body and wheel acceleration in the drive' };
  const zu = displacementFromAcceleration(au, data.dt);
  const elevation = new Float64Array(zu.length);
  const ms = setup.sprungMass;
  const mu = setup.unsprungMass;
  let meanAs = 0;
  let meanAu = 0;
  for (let i = 0; i < zu.length; i++) {
    meanAs += as[i] / zu.length;
    meanAu += au[i] / zu.length;
  }
  for (let i = 0; i < zu.length; i++) elevation[i] = zu[i] + (ms * (as[i] - meanAs) + mu * (au[i] - meanAu)) / setup.tyreRate;
  const z0 = elevation[0];
  for (let i = 0; i < elevation.length; i++) elevation[i] -= z0;
  return { ok: true, elevation, method: `estimated from the wheel signals (cut-on ${ESTIMATE_CUT_ON} Hz)` };
}

/** Elevation on the drive's time grid as the integrator's input (a C² spline in time). */
export function elevationExcitation(elevation: Float64Array, dt: number, name: string): RoadExcitation {
  const spline = gridSpline(elevation, dt, false);
  const duration = (elevation.length - 1) * dt;
  return {
    sample: spline.at,
    breakpoints: [],
    summary: { kind: 'measured', name, length: duration, spacing: dt, distance: duration },
  };
}
