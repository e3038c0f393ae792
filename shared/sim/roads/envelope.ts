import type { DistanceProfile } from './excitation.ts';
import type { EventShape } from './event-shape.ts';
import { gridSpline } from './spline.ts';

/** Window samples across the tyre's contact circle (each side of the centre: half of these). */
const WINDOW_SAMPLES = 400;
/** Grid points over the event at most (a long gentle bump gets a coarser grid). */
const MAX_GRID = 20_000;

/**
 * The path of the wheel centre (less the radius) as a rigid circle of radius R rolls over an
 * event: at each position x the circle rests on the highest point beneath it,
 *   z_env(x) = max over |u| ≤ R of [ z(x + u) − (R − √(R² − u²)) ].
 * Over a sharp step of height h the centre therefore rises along h − (R − √(R² − d²)) from
 * d = √(2Rh − h²) before the corner (the geometry of a circle meeting an edge; the first check
 * of tyre enveloping in vehicle-dynamics texts, from memory), and a pothole shorter than the
 * tyre is bridged in part. The envelope is worked out once on a grid over the event (±R) and
 * read through a cubic spline, so the integrator sees a smooth input; outside, the road is level.
 */
export function envelopedProfile(shape: EventShape, radius: number): DistanceProfile {
  const first = Math.min(...shape.kinks);
  const last = Math.max(...shape.kinks);
  const start = first - radius;
  const end = last + radius;
  const dx = Math.max((2 * radius) / WINDOW_SAMPLES, (end - start) / MAX_GRID);
  const n = Math.ceil((end - start) / dx) + 1;
  const half = Math.ceil(radius / dx);
  // the circle's drop below its lowest point at each window offset
  const drop = new Float64Array(2 * half + 1);
  for (let j = -half; j <= half; j++) {
    const u = Math.min(Math.abs(j * dx), radius);
    drop[j + half] = radius - Math.sqrt(radius * radius - u * u);
  }
  const z = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const x = start + i * dx;
    let best = -Infinity;
    for (let j = -half; j <= half; j++) {
      const v = shape.value(x + j * dx) - drop[j + half];
      if (v > best) best = v;
    }
    // The corners of the shape (where its slope jumps) are where a circle rests on an edge; the
    // window's grid would step over them, so each is tried at its exact place.
    for (const k of shape.kinks) {
      const u = k - x;
      if (Math.abs(u) > radius) continue;
      const v = shape.value(k) - (radius - Math.sqrt(radius * radius - u * u));
      if (v > best) best = v;
    }
    z[i] = best;
  }
  const spline = gridSpline(z, dx, false);
  return {
    at(x, out) {
      spline.at(x - start, out);
    },
    kinks: [],
  };
}
