import type { Histogram } from '../schemas/metrics.ts';

/**
 * Histogram of x[from..] over its own range, `bins` equal bins; the maximum falls in the last
 * bin. A constant signal gets one bin 1 wide around its value (no zero-width edges).
 */
export function rangeHistogram(x: ArrayLike<number>, bins: number, from = 0): Histogram {
  let lo = Infinity;
  let hi = -Infinity;
  for (let i = from; i < x.length; i++) {
    if (x[i] < lo) lo = x[i];
    if (x[i] > hi) hi = x[i];
  }
  if (!(hi >= lo)) return { edges: [0, 1], counts: [0] };
  if (hi === lo) return { edges: [lo - 0.5, lo + 0.5], counts: [x.length - from] };
  const width = (hi - lo) / bins;
  const edges = Array.from({ length: bins + 1 }, (_, k) => lo + k * width);
  edges[bins] = hi;
  const counts = new Array<number>(bins).fill(0);
  for (let i = from; i < x.length; i++) counts[Math.min(bins - 1, Math.floor((x[i] - lo) / width))]++;
  return { edges, counts };
}
