import type { ComfortGrading, ComfortLabel } from '../../schemas/metrics.ts';

/**
 * ISO 2631-1:1997 Annex A vertical weighting Wk (constants from memory): the product of a
 * band limit (0.4 Hz high-pass, 100 Hz low-pass, both Q = 1/√2), an acceleration–velocity
 * transition (f3 = f4 = 12.5 Hz, Q4 = 0.63) and an upward step (f5 = 2.37 Hz, Q5 = 0.91;
 * f6 = 3.35 Hz, Q6 = 0.91).
 */
const TWO_PI = 2 * Math.PI;

/** s-domain biquad (b2 s² + b1 s + b0) / (a2 s² + a1 s + a0) with the frequency to pre-warp at. */
export interface AnalogStage {
  b: [number, number, number];
  a: [number, number, number];
  warpHz: number;
}

/** Annex A's band limit (0.4 Hz high-pass, 100 Hz low-pass, Q = 1/√2) and an acceleration–velocity transition (f3, f4, Q4), common to several weightings. */
export function bandAndTransitionStages(f3: number, f4: number, q4: number): AnalogStage[] {
  const w1 = TWO_PI * 0.4;
  const w2 = TWO_PI * 100;
  const w3 = TWO_PI * f3;
  const w4 = TWO_PI * f4;
  const q1 = Math.SQRT1_2;
  const q2 = Math.SQRT1_2;
  const k3 = (w4 * w4) / w3;
  return [
    { b: [1, 0, 0], a: [1, w1 / q1, w1 * w1], warpHz: 0.4 },
    { b: [0, 0, w2 * w2], a: [1, w2 / q2, w2 * w2], warpHz: 100 },
    { b: [0, k3, k3 * w3], a: [1, w4 / q4, w4 * w4], warpHz: f4 },
  ];
}

function wkStages(): AnalogStage[] {
  const w5 = TWO_PI * 2.37;
  const w6 = TWO_PI * 3.35;
  const q5 = 0.91;
  const q6 = 0.91;
  return [
    ...bandAndTransitionStages(12.5, 12.5, 0.63),
    // One pre-warp frequency for a stage with two corners: their geometric mean.
    { b: [1, w5 / q5, w5 * w5], a: [1, w6 / q6, w6 * w6], warpHz: Math.sqrt(2.37 * 3.35) },
  ];
}

const STAGES = wkStages();

/** Complex Wk(j2πf) as [re, im]. */
export function wkComplex(fHz: number): [number, number] {
  return cascadeComplex(STAGES, fHz);
}

/** Complex response of a cascade of analog stages at f, [re, im]. */
export function cascadeComplex(stages: readonly AnalogStage[], fHz: number): [number, number] {
  const w = TWO_PI * fHz;
  let re = 1;
  let im = 0;
  for (const { b, a } of stages) {
    // Polynomial in s = jw: p2 s² + p1 s + p0 = (p0 − p2 w²) + j p1 w
    const nr = b[2] - b[0] * w * w;
    const ni = b[1] * w;
    const dr = a[2] - a[0] * w * w;
    const di = a[1] * w;
    const d = dr * dr + di * di;
    const hr = (nr * dr + ni * di) / d;
    const hi = (ni * dr - nr * di) / d;
    const r = re * hr - im * hi;
    im = re * hi + im * hr;
    re = r;
  }
  return [re, im];
}

/** |Wk(f)|. */
export function wkResponse(fHz: number): number {
  const [re, im] = wkComplex(fHz);
  return Math.hypot(re, im);
}

/** Digital biquad y = (b0 + b1 z⁻¹ + b2 z⁻²)/(1 + a1 z⁻¹ + a2 z⁻²). */
export interface DigitalBiquad {
  b0: number;
  b1: number;
  b2: number;
  a1: number;
  a2: number;
}

/**
 * Bilinear transform of each stage, pre-warped at the stage's own corner so that corner lands
 * exactly (the upward step at the geometric mean of its two corners). Warping shows only above
 * the 12.5 Hz transition, where it lowers the gain: at 400 Hz sampling the cascade is within
 * 0.5 % of the analog |Wk| up to 20 Hz, −1.5 % at 31.5 Hz and −3.5 % at 50 Hz; at 1 kHz within
 * 0.5 % up to 50 Hz (checked in iso2631.test.ts). Body acceleration of a car corner has little
 * energy above 20 Hz, so the effect on aw is far below these figures.
 */
export function wkDigitalStages(dt: number): DigitalBiquad[] {
  return digitalStages(STAGES, dt);
}

/** Bilinear transform of each stage, pre-warped at its own `warpHz`. */
export function digitalStages(stages: readonly AnalogStage[], dt: number): DigitalBiquad[] {
  return stages.map(({ b, a, warpHz }) => {
    const wp = TWO_PI * warpHz;
    const k = wp / Math.tan((wp * dt) / 2);
    const k2 = k * k;
    // Substitute s = k (1 − z⁻¹)/(1 + z⁻¹) and multiply through by (1 + z⁻¹)².
    const nb0 = b[0] * k2 + b[1] * k + b[2];
    const nb1 = 2 * (b[2] - b[0] * k2);
    const nb2 = b[0] * k2 - b[1] * k + b[2];
    const na0 = a[0] * k2 + a[1] * k + a[2];
    const na1 = 2 * (a[2] - a[0] * k2);
    const na2 = a[0] * k2 - a[1] * k + a[2];
    return { b0: nb0 / na0, b1: nb1 / na0, b2: nb2 / na0, a1: na1 / na0, a2: na2 / na0 };
  });
}

/** |H(e^{j2πf dt})| of the digital cascade, for checking the discretisation. */
export function wkDigitalResponse(fHz: number, dt: number): number {
  const th = TWO_PI * fHz * dt;
  const c1 = Math.cos(th);
  const s1 = Math.sin(th);
  const c2 = Math.cos(2 * th);
  const s2 = Math.sin(2 * th);
  let mag = 1;
  for (const q of wkDigitalStages(dt)) {
    const num = Math.hypot(q.b0 + q.b1 * c1 + q.b2 * c2, -(q.b1 * s1 + q.b2 * s2));
    const den = Math.hypot(1 + q.a1 * c1 + q.a2 * c2, -(q.a1 * s1 + q.a2 * s2));
    mag *= num / den;
  }
  return mag;
}

/**
 * Wk-weighted copy of an acceleration sampled every `dt`, filtered from rest (transposed
 * direct form II, the four sections fused into one pass with coefficients in locals: this runs
 * on every trace). Discard the first second or so: the 0.4 Hz high-pass settles with a time
 * constant near 0.6 s.
 */
export function wkFilter(x: Float64Array, dt: number, out: Float64Array = new Float64Array(x.length)): Float64Array {
  const [p, q, r, u] = wkDigitalStages(dt);
  const pb0 = p.b0, pb1 = p.b1, pb2 = p.b2, pa1 = p.a1, pa2 = p.a2;
  const qb0 = q.b0, qb1 = q.b1, qb2 = q.b2, qa1 = q.a1, qa2 = q.a2;
  const rb0 = r.b0, rb1 = r.b1, rb2 = r.b2, ra1 = r.a1, ra2 = r.a2;
  const ub0 = u.b0, ub1 = u.b1, ub2 = u.b2, ua1 = u.a1, ua2 = u.a2;
  let p1 = 0, p2 = 0, q1 = 0, q2 = 0, r1 = 0, r2 = 0, u1 = 0, u2 = 0;
  const n = x.length;
  for (let i = 0; i < n; i++) {
    const v0 = x[i];
    const v1 = pb0 * v0 + p1;
    p1 = pb1 * v0 - pa1 * v1 + p2;
    p2 = pb2 * v0 - pa2 * v1;
    const v2 = qb0 * v1 + q1;
    q1 = qb1 * v1 - qa1 * v2 + q2;
    q2 = qb2 * v1 - qa2 * v2;
    const v3 = rb0 * v2 + r1;
    r1 = rb1 * v2 - ra1 * v3 + r2;
    r2 = rb2 * v2 - ra2 * v3;
    const v4 = ub0 * v3 + u1;
    u1 = ub1 * v3 - ua1 * v4 + u2;
    u2 = ub2 * v3 - ua2 * v4;
    out[i] = v4;
  }
  return out;
}

/** Weighted RMS `aw` and VDV of a Wk-filtered signal over samples [from, end), in one pass. */
export function rmsAndVdv(weighted: Float64Array, dt: number, from = 0): { rms: number; vdv: number } {
  let s2 = 0;
  let s4 = 0;
  for (let i = from; i < weighted.length; i++) {
    const a2 = weighted[i] * weighted[i];
    s2 += a2;
    s4 += a2 * a2;
  }
  const n = weighted.length - from;
  return { rms: n > 0 ? Math.sqrt(s2 / n) : 0, vdv: Math.pow(s4 * dt, 0.25) };
}

/** Vibration dose value (∫ a⁴ dt)^¼ over samples [from, end), m/s^1.75. */
export function vdv(weighted: Float64Array, dt: number, from = 0): number {
  let sum = 0;
  for (let i = from; i < weighted.length; i++) {
    const a2 = weighted[i] * weighted[i];
    sum += a2 * a2;
  }
  return Math.pow(sum * dt, 0.25);
}

/** ISO 2631-1:1997 Annex C bands in m/s² (from memory); Infinity marks the open top band. */
export const comfortBands: ReadonlyArray<{ label: ComfortLabel; from: number; to: number }> = [
  { label: 'not uncomfortable', from: 0, to: 0.315 },
  { label: 'a little uncomfortable', from: 0.315, to: 0.63 },
  { label: 'fairly uncomfortable', from: 0.5, to: 1 },
  { label: 'uncomfortable', from: 0.8, to: 1.6 },
  { label: 'very uncomfortable', from: 1.25, to: 2.5 },
  { label: 'extremely uncomfortable', from: 2, to: Infinity },
];

/**
 * Every band containing `aw` (the standard's bands overlap), plus a primary label: the band
 * `aw` sits deepest inside on a log scale. Band edges belong to both neighbours.
 */
export function comfortGrading(aw: number): ComfortGrading {
  const matches = comfortBands.filter((b) => aw >= b.from && aw <= b.to);
  if (matches.length === 0) throw new Error(`comfortGrading: aw must be a non-negative number, got ${aw}`);
  let primary = matches[0];
  let best = -Infinity;
  for (const b of matches) {
    const below = b.from > 0 ? Math.log(aw / b.from) : Infinity;
    const above = Number.isFinite(b.to) ? Math.log(b.to / aw) : Infinity;
    const depth = Math.min(below, above);
    if (depth > best) {
      best = depth;
      primary = b;
    }
  }
  return { bands: matches.map((b) => b.label), primary: primary.label };
}
