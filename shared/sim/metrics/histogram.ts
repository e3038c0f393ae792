import type { Histogram, VelocityBands } from '../../schemas/metrics.ts';

/**
 * Histogram of x[from..] on `bins` equal bins spanning ±halfWidth (values outside fall in the
 * end bins, so the counts always sum to the number of samples).
 */
export function symmetricHistogram(x: Float64Array, halfWidth: number, bins: number, from = 0): Histogram {
  if (!(bins >= 2 && Number.isInteger(bins))) throw new Error(`symmetricHistogram: bins must be an integer ≥ 2, got ${bins}`);
  if (!(halfWidth > 0)) throw new Error(`symmetricHistogram: halfWidth must be positive, got ${halfWidth}`);
  const counts = new Array<number>(bins).fill(0);
  const scale = bins / (2 * halfWidth);
  const counts32 = new Int32Array(bins);
  const top = bins - 1;
  for (let i = from; i < x.length; i++) {
    // Clamp in floating point before truncating, so far outliers cannot overflow int32.
    let t = (x[i] + halfWidth) * scale;
    t = t < 0 ? 0 : t > top ? top : t;
    counts32[t | 0]++;
  }
  for (let k = 0; k < bins; k++) counts[k] = counts32[k];
  const edges = new Array<number>(bins + 1);
  for (let k = 0; k <= bins; k++) edges[k] = halfWidth * ((2 * k) / bins - 1);
  return { edges, counts };
}

/** A half-width that covers max|x| and reads well on an axis: 1, 2 or 5 × 10ⁿ. */
export function niceHalfWidth(peak: number): number {
  if (!(peak > 0)) return 0.01;
  const decade = 10 ** Math.floor(Math.log10(peak));
  for (const m of [1, 2, 5, 10]) if (m * decade >= peak) return m * decade;
  return 10 * decade;
}

/**
 * Share of samples with |v| below `low`, between, and above `high`, plus the share moving in
 * compression (v > 0). Samples exactly on an edge count in the band above it.
 */
export function velocityBands(v: Float64Array, low: number, high: number, from = 0): VelocityBands {
  if (!(low > 0 && high > low)) throw new Error(`velocityBands: need 0 < low < high, got ${low}, ${high}`);
  let nLow = 0;
  let nHigh = 0;
  let nComp = 0;
  // Conditional adds rather than branches: velocities alternate bands often.
  for (let i = from; i < v.length; i++) {
    const x = v[i];
    const a = Math.abs(x);
    nLow += a < low ? 1 : 0;
    nHigh += a >= high ? 1 : 0;
    nComp += x > 0 ? 1 : 0;
  }
  const n = v.length - from;
  if (n <= 0) return { lowEdge: low, highEdge: high, low: 0, mid: 0, high: 0, compression: 0 };
  return { lowEdge: low, highEdge: high, low: nLow / n, mid: (n - nLow - nHigh) / n, high: nHigh / n, compression: nComp / n };
}
