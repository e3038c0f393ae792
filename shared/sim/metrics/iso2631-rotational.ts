import { bandAndTransitionStages, cascadeComplex, digitalStages } from './iso2631.ts';

/**
 * ISO 2631-1:1997 rotational weighting We (Annex A, constants from memory): the common band
 * limit (0.4 Hz high-pass, 100 Hz low-pass) and an acceleration–velocity transition at
 * f3 = f4 = 1 Hz with Q4 = 0.63; no upward step. It applies to rotational acceleration in
 * rad/s² at the seat surface.
 */
const WE_STAGES = bandAndTransitionStages(1, 1, 0.63);

/**
 * Axis multiplying factors for comfort, seated person (ISO 2631-1:1997 clause 8.2.3, from
 * memory): vertical z at the seat 1; rotations at the seat surface roll 0.63, pitch 0.40,
 * yaw 0.20 m/rad.
 */
export const AXIS_FACTORS = { vertical: 1, roll: 0.63, pitch: 0.4, yaw: 0.2 } as const;

/** |We(f)|. */
export function weResponse(fHz: number): number {
  const [re, im] = cascadeComplex(WE_STAGES, fHz);
  return Math.hypot(re, im);
}

/** We-weighted copy of a rotational acceleration sampled every `dt`, filtered from rest (let the first second or so pass). */
export function weFilter(x: Float64Array, dt: number): Float64Array {
  const out = Float64Array.from(x);
  for (const q of digitalStages(WE_STAGES, dt)) {
    let s1 = 0;
    let s2 = 0;
    for (let i = 0; i < out.length; i++) {
      const v = out[i];
      const y = q.b0 * v + s1;
      s1 = q.b1 * v - q.a1 * y + s2;
      s2 = q.b2 * v - q.a2 * y;
      out[i] = y;
    }
  }
  return out;
}

/**
 * Point vibration total value √Σ (k·aw)² over the axes measured (ISO 2631-1:1997 clause 8.2.3,
 * from memory); in the pitch plane, vertical (Wk) and pitch (We) at the seat.
 */
export function pointVibrationTotal(verticalAw: number, pitchAw: number): number {
  return Math.hypot(AXIS_FACTORS.vertical * verticalAw, AXIS_FACTORS.pitch * pitchAw);
}
