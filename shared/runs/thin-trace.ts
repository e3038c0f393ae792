/**
 * Thinning a long trace to at most `cap` points per column for storage and plotting.
 *
 * Choice: every column is cut into the same `cap / 2` time buckets and each bucket keeps its
 * minimum and its maximum, in the order they occurred. A uniform stride would alias the
 * wheel-hop motion of a long run into a false low-frequency wave and drop the peaks; a
 * per-column method (LTTB, per-column extremes with their own times) keeps shapes but gives
 * every column its own time axis, which a shared cursor cannot follow. Here the columns share
 * one time axis (the two points of a bucket sit at its quarter and three-quarter times), every
 * extreme survives exactly, and the time of a point is off by at most half a bucket.
 */

export type ThinMethod = 'all-samples' | 'bucket-extremes';

export interface ThinnedColumns {
  method: ThinMethod;
  /** Time of each kept point, s from the start of the run. */
  time: Float64Array;
  columns: Float64Array[];
}

/**
 * Thins columns sampled every `dt` (all the same length). With `n ≤ cap` the samples are kept
 * as they are. `cap` must be even and ≥ 4.
 */
export function thinColumns(columns: ArrayLike<number>[], dt: number, cap: number): ThinnedColumns {
  if (cap < 4 || cap % 2 !== 0) throw new Error(`thinColumns: cap must be even and ≥ 4, got ${cap}`);
  const n = columns[0]?.length ?? 0;
  if (n <= cap) {
    const time = new Float64Array(n);
    for (let i = 0; i < n; i++) time[i] = i * dt;
    return { method: 'all-samples', time, columns: columns.map((c) => Float64Array.from(c)) };
  }
  const buckets = cap / 2;
  const time = new Float64Array(cap);
  const edges = new Int32Array(buckets + 1);
  for (let b = 0; b <= buckets; b++) edges[b] = Math.round((b * n) / buckets);
  for (let b = 0; b < buckets; b++) {
    const t0 = edges[b] * dt;
    const width = (edges[b + 1] - edges[b]) * dt;
    time[2 * b] = t0 + 0.25 * width;
    time[2 * b + 1] = t0 + 0.75 * width;
  }
  const out = columns.map((column) => {
    const kept = new Float64Array(cap);
    for (let b = 0; b < buckets; b++) {
      let iMin = edges[b];
      let iMax = edges[b];
      for (let i = edges[b] + 1; i < edges[b + 1]; i++) {
        if (column[i] < column[iMin]) iMin = i;
        if (column[i] > column[iMax]) iMax = i;
      }
      const first = Math.min(iMin, iMax);
      const second = Math.max(iMin, iMax);
      kept[2 * b] = column[first];
      kept[2 * b + 1] = column[second];
    }
    return kept;
  });
  return { method: 'bucket-extremes', time, columns: out };
}
