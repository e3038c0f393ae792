/**
 * Non-dominated points of a set where every objective is minimised. Point a dominates b when a
 * is no worse in every objective and better in at least one; equal points do not dominate each
 * other, so duplicates on the front all stay on it.
 */

/** True when `a` dominates `b` (all objectives minimised). */
export function dominates(a: readonly number[], b: readonly number[]): boolean {
  let better = false;
  for (let k = 0; k < a.length; k++) {
    if (a[k] > b[k]) return false;
    if (a[k] < b[k]) better = true;
  }
  return better;
}

/**
 * Indices of the non-dominated points of a two-objective set, ordered by rising first objective
 * (the order to draw the front in). O(n log n): sort by (f1, f2), then one sweep keeping the
 * lowest f2 seen at a strictly smaller f1.
 */
export function paretoFront2d(points: readonly (readonly [number, number] | readonly number[])[]): number[] {
  const order = points.map((_, i) => i).sort((i, j) => points[i][0] - points[j][0] || points[i][1] - points[j][1] || i - j);
  const front: number[] = [];
  let bestBefore = Infinity; // lowest f2 among points with a strictly smaller f1
  let g = 0;
  while (g < order.length) {
    const f1 = points[order[g]][0];
    let end = g;
    while (end < order.length && points[order[end]][0] === f1) end++;
    const groupMin = points[order[g]][1]; // sorted: the group's first has its lowest f2
    if (groupMin < bestBefore) {
      for (let k = g; k < end && points[order[k]][1] === groupMin; k++) front.push(order[k]);
    }
    bestBefore = Math.min(bestBefore, groupMin);
    g = end;
  }
  return front;
}

/**
 * Indices of the non-dominated points for any number of objectives, in input order. Two
 * objectives use the O(n log n) sweep (then re-sorted to input order); more use pairwise
 * checks, O(n²·d), fine for the few thousand points of a study.
 */
export function paretoFront(points: readonly (readonly number[])[]): number[] {
  if (points.length === 0) return [];
  const d = points[0].length;
  if (points.some((p) => p.length !== d || p.some((x) => Number.isNaN(x)))) throw new Error('paretoFront: points must share one length and hold no NaN');
  if (d === 1) {
    const best = Math.min(...points.map((p) => p[0]));
    return points.flatMap((p, i) => (p[0] === best ? [i] : []));
  }
  if (d === 2) return paretoFront2d(points).sort((a, b) => a - b);
  return points.flatMap((p, i) => (points.some((q, j) => j !== i && dominates(q, p)) ? [] : [i]));
}
