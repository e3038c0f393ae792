/**
 * Figures for shocks and single events, where an RMS over the whole run says little: it falls as
 * the run gets longer while the event stays the same.
 */

/** Integration time of the running RMS for MTVV, s (ISO 2631-1:1997 §6.3.1, from memory: τ = 1 s). */
export const MTVV_INTEGRATION_TIME = 1;

/**
 * Maximum transient vibration value, ISO 2631-1:1997 §6.3.1 formulas (4) and (5) (from memory):
 * the running RMS with linear integration
 *   a_w(t0) = [ (1/τ) ∫_{t0−τ}^{t0} a_w²(t) dt ]^½
 * and MTVV = max over t0 of a_w(t0). The window ends at every analysed sample; samples before
 * `from` count as zero (they belong to the settling time, not to the run being judged), so the
 * first second is divided by τ like every other.
 */
export function mtvv(weighted: Float64Array, dt: number, from = 0, tau = MTVV_INTEGRATION_TIME): number {
  const width = Math.max(1, Math.round(tau / dt));
  let sum = 0;
  let best = 0;
  for (let i = from; i < weighted.length; i++) {
    sum += weighted[i] * weighted[i];
    const leaving = i - width;
    if (leaving >= from) sum -= weighted[leaving] * weighted[leaving];
    // The running sum can drift a hair below zero after a loud stretch leaves the window.
    const value = sum > 0 ? sum / width : 0;
    if (value > best) best = value;
  }
  return Math.sqrt(best);
}

/**
 * Settling band after an event: ±5 % of the run's peak body acceleration, never tighter than
 * ±0.05 m/s². 5 % is the usual settling-time band of control engineering (common practice);
 * the floor keeps a gentle event from waiting on figures below anything a rider feels.
 */
export const SETTLE_BAND_SHARE = 0.05;
export const SETTLE_BAND_FLOOR = 0.05;

export function settleBand(peak: number): number {
  return Math.max(SETTLE_BAND_SHARE * peak, SETTLE_BAND_FLOOR);
}

/**
 * Time after `eventEnd` (s from the start of the trace) until |a| stays inside ±band for the
 * rest of the run: 0 when it already is, null when the last sample is still outside (the run
 * ended before the body settled).
 */
export function settlingTime(accel: Float64Array, dt: number, eventEnd: number, band: number): number | null {
  const n = accel.length;
  if (n === 0) return null;
  if (Math.abs(accel[n - 1]) > band) return null;
  let last = -1;
  for (let i = n - 1; i >= 0; i--) {
    if (Math.abs(accel[i]) > band) {
      last = i;
      break;
    }
  }
  // The body is inside the band from the sample after the last one outside it.
  const settledAt = (last + 1) * dt;
  return Math.max(0, settledAt - eventEnd);
}
