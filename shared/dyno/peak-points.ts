import type { DynoPoint } from '../schemas/dyno.ts';

/**
 * Points sorted by velocity with points at the same velocity (within `relTol` of it, or
 * 1e-9 m/s) replaced by one point at their mean velocity and mean force. Repeated cycles at one
 * test speed then give one reading.
 */
export function mergeSameVelocity(points: readonly DynoPoint[], relTol = 0.005): DynoPoint[] {
  const sorted = [...points].sort((a, b) => a.velocity - b.velocity);
  const out: DynoPoint[] = [];
  let group: DynoPoint[] = [];
  const flush = () => {
    if (!group.length) return;
    const n = group.length;
    out.push({
      velocity: group.reduce((s, p) => s + p.velocity, 0) / n,
      force: group.reduce((s, p) => s + p.force, 0) / n,
    });
    group = [];
  };
  for (const p of sorted) {
    const ref = group[0]?.velocity;
    if (ref !== undefined && p.velocity - ref > Math.max(relTol * ref, 1e-9)) flush();
    group.push(p);
  }
  flush();
  return out;
}

/**
 * Force at `velocity` by straight-line interpolation between the two neighbouring points of a
 * list sorted by rising, distinct velocity; `undefined` outside the measured range (no
 * extrapolation: a reading beyond the last point is not a measurement).
 */
export function interpolateMeasured(points: readonly DynoPoint[], velocity: number): number | undefined {
  const n = points.length;
  if (n === 0) return undefined;
  const lo = points[0].velocity;
  const hi = points[n - 1].velocity;
  const slack = 1e-9 * Math.max(1, Math.abs(hi));
  if (velocity < lo - slack || velocity > hi + slack) return undefined;
  if (n === 1 || velocity <= lo) return points[0].force;
  if (velocity >= hi) return points[n - 1].force;
  let a = 0;
  let b = n - 1;
  while (b - a > 1) {
    const mid = (a + b) >> 1;
    if (points[mid].velocity <= velocity) a = mid;
    else b = mid;
  }
  const p = points[a];
  const q = points[b];
  return p.force + ((q.force - p.force) * (velocity - p.velocity)) / (q.velocity - p.velocity);
}

/**
 * A short warning when rebound reads softer than compression over the speeds both were
 * measured at (rebound is usually the stiffer direction — common practice), which often means
 * the sign convention was set the wrong way round; `undefined` otherwise.
 */
export function directionSanityWarning(compression: readonly DynoPoint[], rebound: readonly DynoPoint[]): string | undefined {
  const c = mergeSameVelocity(compression);
  const r = mergeSameVelocity(rebound);
  if (c.length < 2 || r.length < 2) return undefined;
  const lo = Math.max(c[0].velocity, r[0].velocity);
  const hi = Math.min(c[c.length - 1].velocity, r[r.length - 1].velocity);
  if (!(hi > lo)) return undefined;
  let softer = 0;
  const samples = 5;
  for (let i = 0; i < samples; i++) {
    const v = lo + ((hi - lo) * (i + 0.5)) / samples;
    if (interpolateMeasured(r, v)! < interpolateMeasured(c, v)!) softer++;
  }
  return softer === samples
    ? 'rebound reads softer than compression at every shared speed; rebound is usually the stiffer direction (common practice), so check the sign convention'
    : undefined;
}
