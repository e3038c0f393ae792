import type uPlot from 'uplot';

/** One series given as its own (x, y) points. */
export interface XY {
  x: readonly number[];
  y: readonly number[];
}

/**
 * Several point sets on one rising x column, as uPlot's aligned data wants: each series has its
 * values at its own x and null elsewhere. Equal x values from different sets share a row.
 */
export function mergeColumns(sets: readonly XY[]): uPlot.AlignedData {
  const xs = [...new Set(sets.flatMap((s) => s.x))].sort((a, b) => a - b);
  const row = new Map(xs.map((x, i) => [x, i]));
  const columns = sets.map((s) => {
    const col: (number | null)[] = new Array(xs.length).fill(null);
    s.x.forEach((x, i) => (col[row.get(x)!] = s.y[i]));
    return col;
  });
  return [xs, ...columns];
}
