import type { LinearCorner } from './linear-corner.ts';

/** Gain (output per metre of road) and phase (rad, unwrapped along the grid). */
export interface Response {
  gain: Float64Array;
  phase: Float64Array;
}

/** Responses from road displacement: body acceleration (1/s²), travel (m/m), dynamic tyre load (N/m). */
export interface FrequencyResponse {
  freq: Float64Array;
  bodyAccel: Response;
  travel: Response;
  tyreLoad: Response;
}

/** n log-spaced frequencies from f0 to f1 inclusive, Hz. */
export function logGrid(f0 = 0.1, f1 = 50, n = 400): Float64Array {
  const out = new Float64Array(n);
  const r = Math.log(f1 / f0);
  for (let i = 0; i < n; i++) out[i] = f0 * Math.exp((r * i) / (n - 1));
  return out;
}

export type ComplexGains = [bodyAccel: [number, number], travel: [number, number], tyreLoad: [number, number]];

/**
 * Complex responses at one frequency, from the two equations of motion in the frequency
 * domain: (K − ω²M + jωC)·[Zs, Zu] = [0, kt + jω·ct]·Zr.
 */
export function complexGains(c: LinearCorner, fHz: number): ComplexGains {
  const { sprungMass: ms, unsprungMass: mu, wheelRate: ks, wheelDamping: cs, tyreRate: kt, tyreDamping: ct } = c;
  const w = 2 * Math.PI * fHz;
  // Dynamic stiffness matrix [[a, b], [b, d]] (complex, symmetric).
  let ar = ks - ms * w * w;
  let ai = cs * w;
  let br = -ks;
  let bi = -cs * w;
  let dr = ks + kt - mu * w * w;
  let di = (cs + ct) * w;
  if (c.mountRate !== undefined || c.skyDamping !== undefined || c.groundDamping !== undefined) {
    // The damper branch as one complex stiffness: jωc in series with the mount km + jωcm
    // (a Maxwell element when cm = 0); skyhook adds jω·csky to the body alone, groundhook
    // jω·cgnd to the wheel alone.
    let kdr = 0;
    let kdi = cs * w;
    if (c.mountRate !== undefined) {
      const mr = c.mountRate;
      const mi = (c.mountDamping ?? 0) * w;
      [kdr, kdi] = cdiv(-kdi * mi, kdi * mr, mr, mi + kdi);
    }
    const sky = (c.skyDamping ?? 0) * w;
    const ground = (c.groundDamping ?? 0) * w;
    ar = ks + kdr - ms * w * w;
    ai = kdi + sky;
    br = -ks - kdr;
    bi = -kdi;
    dr = ks + kdr + kt - mu * w * w;
    di = kdi + ct * w + ground;
  }
  const fr = kt;
  const fi = ct * w;
  // det = a·d − b²
  const detr = ar * dr - ai * di - (br * br - bi * bi);
  const deti = ar * di + ai * dr - 2 * br * bi;
  // Zs = −b·f/det, Zu = a·f/det
  const [zsr, zsi] = cdiv(-(br * fr - bi * fi), -(br * fi + bi * fr), detr, deti);
  const [zur, zui] = cdiv(ar * fr - ai * fi, ar * fi + ai * fr, detr, deti);
  // body acceleration = −ω²·Zs; travel = Zu − Zs; tyre load = (kt + jωct)(1 − Zu)
  const body: [number, number] = [-w * w * zsr, -w * w * zsi];
  const travel: [number, number] = [zur - zsr, zui - zsi];
  const one = 1 - zur;
  const load: [number, number] = [fr * one + fi * zui, fi * one - fr * zui];
  return [body, travel, load];
}

/** Gains and phases on `freqsHz` (default 400 points log-spaced over 0.1–50 Hz). */
export function frequencyResponse(c: LinearCorner, freqsHz: Float64Array = logGrid()): FrequencyResponse {
  const n = freqsHz.length;
  const out = [0, 1, 2].map(() => ({ gain: new Float64Array(n), phase: new Float64Array(n) }));
  for (let i = 0; i < n; i++) {
    const gains = complexGains(c, freqsHz[i]);
    for (let k = 0; k < 3; k++) {
      const [re, im] = gains[k];
      out[k].gain[i] = Math.hypot(re, im);
      let ph = Math.atan2(im, re);
      if (i > 0) {
        const prev = out[k].phase[i - 1];
        ph += 2 * Math.PI * Math.round((prev - ph) / (2 * Math.PI));
      }
      out[k].phase[i] = ph;
    }
  }
  return { freq: freqsHz, bodyAccel: out[0], travel: out[1], tyreLoad: out[2] };
}

function cdiv(ar: number, ai: number, br: number, bi: number): [number, number] {
  const d = br * br + bi * bi;
  return [(ar * br + ai * bi) / d, (ai * br - ar * bi) / d];
}
