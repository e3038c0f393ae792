import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { pointIndexOf, sweepValues } from '../../../../shared/study/expand.ts';
import { meanAndSpread } from '../../../../shared/study/ensemble.ts';
import { defaultStudyDisplay, type StudyDisplay } from './display.ts';
import type { StudyView } from './study-view.ts';

/**
 * Finished columns for the study charts (no number crunching inside the chart components).
 */

/**
 * Comfort against grip as aligned columns: one x entry per point (sorted by comfort), each
 * series holding y only where its points are. Series: within limits, breaking a limit, the
 * Pareto front (joined across the gaps, through the base setup when it is on it), the base
 * setup, the best compromise, the baseline.
 * `pointAt[i]` is the sweep index at x entry i (−1 for the base).
 */
export interface TradeOffColumns {
  x: number[];
  feasible: (number | null)[];
  infeasible: (number | null)[];
  front: (number | null)[];
  base: (number | null)[];
  best: (number | null)[];
  baseline: (number | null)[];
  pointAt: number[];
  /**
   * Over several seeds: each entry's comfort and grip ±1 standard deviation (display units),
   * for the range bars; absent in a one-seed study.
   */
  range?: { xLo: (number | null)[]; xHi: (number | null)[]; yLo: (number | null)[]; yHi: (number | null)[] };
}

export function tradeOffColumns(view: StudyView, baselineIndex: number | null, d: StudyDisplay = defaultStudyDisplay): TradeOffColumns {
  const { figureToDisplay } = d;
  const { comfortFigure: cf, gripFigure: gf } = view.definition;
  const frontIdx = new Set((view.tradeOff?.front ?? []).map((pos) => view.points[pos]?.index));
  const bestIdx = view.compromise?.ok ? view.points[view.compromise.winner]?.index : undefined;
  const entries: { x: number; y: number; p: StudyPointResult | null; index: number; of: StudyPointResult }[] = [];
  for (const p of view.points) {
    const c = p.figures[cf];
    const g = p.figures[gf];
    if (c !== undefined && g !== undefined) entries.push({ x: figureToDisplay(cf, c), y: figureToDisplay(gf, g), p, index: p.index, of: p });
  }
  const bc = view.base?.figures[cf];
  const bg = view.base?.figures[gf];
  if (view.base && bc !== undefined && bg !== undefined) entries.push({ x: figureToDisplay(cf, bc), y: figureToDisplay(gf, bg), p: null, index: -1, of: view.base });
  entries.sort((a, b) => a.x - b.x || a.y - b.y);
  const anyFeasible = view.points.some((p) => p.feasible);
  const pick = (keep: (e: (typeof entries)[number]) => boolean) => entries.map((e) => (keep(e) ? e.y : null));
  return {
    x: entries.map((e) => e.x),
    feasible: pick((e) => e.p !== null && e.p.feasible),
    infeasible: pick((e) => e.p !== null && !e.p.feasible),
    // The base competes for the front like any point within the limits.
    // No front at all when no swept point meets the limits: a base alone is no trade-off.
    front: anyFeasible ? pick((e) => (e.p !== null && frontIdx.has(e.index)) || (e.index === -1 && view.tradeOff?.baseOnFront === true)) : entries.map(() => null),
    base: pick((e) => e.index === -1),
    best: pick((e) => e.p !== null && e.index === bestIdx),
    baseline: pick((e) => e.p !== null && e.index === baselineIndex),
    pointAt: entries.map((e) => e.index),
    ...((view.definition.seeds ?? 1) > 1 ? { range: seedRanges(entries, cf, gf, figureToDisplay) } : {}),
  };
}

function seedRanges(entries: readonly { of: StudyPointResult }[], cf: StudyFigureKey, gf: StudyFigureKey, figureToDisplay: StudyDisplay['figureToDisplay']): NonNullable<TradeOffColumns['range']> {
  const side = (f: StudyFigureKey, sign: 1 | -1) =>
    entries.map(({ of }) => {
      const mean = of.figures[f];
      const sd = of.spread?.[f]?.sd;
      return mean === undefined || sd === undefined ? null : figureToDisplay(f, mean + sign * sd);
    });
  return { xLo: side(cf, -1), xHi: side(cf, 1), yLo: side(gf, -1), yHi: side(gf, 1) };
}

/** A 2-D slice of the sweep as a grid of one figure: cells[i][j] for x-axis value i and y-axis value j (display units). */
export interface HeatGrid {
  xs: number[];
  ys: number[];
  /** null where the point is missing (cancelled run) or has no such figure. */
  cells: (number | null)[][];
  /** Points breaking a limit. */
  infeasible: boolean[][];
  /** Sweep index of each cell. */
  index: number[][];
  min: number;
  max: number;
}

/**
 * Which slice of a sweep of more than two parameters a chart shows: the two axes of the map
 * (indices into the definition's axes), the axis the lines run along, and the position each
 * other axis is held at (an index into its values).
 */
export interface StudySlice {
  mapAxes: [number, number];
  along: number;
  holdAt: number[];
}

export const defaultSlice = (axisCount: number): StudySlice => ({ mapAxes: [0, Math.min(1, axisCount - 1)], along: 0, holdAt: Array.from({ length: axisCount }, () => 0) });

export function heatGrid(view: StudyView, figure: StudyFigureKey, slice: StudySlice = defaultSlice(view.definition.axes.length), d: StudyDisplay = defaultStudyDisplay): HeatGrid | null {
  const { figureToDisplay, parameterToDisplay } = d;
  const axes = view.definition.axes;
  const [ax, ay] = slice.mapAxes;
  if (axes.length < 2 || ax === ay || !axes[ax] || !axes[ay]) return null;
  const a = axes[ax];
  const b = axes[ay];
  const xs = sweepValues(a).map((v) => parameterToDisplay(a.parameter, v));
  const ys = sweepValues(b).map((v) => parameterToDisplay(b.parameter, v));
  const byIndex = new Map(view.points.map((p) => [p.index, p]));
  let min = Infinity;
  let max = -Infinity;
  const cells: (number | null)[][] = [];
  const infeasible: boolean[][] = [];
  const index: number[][] = [];
  for (let i = 0; i < xs.length; i++) {
    cells.push([]);
    infeasible.push([]);
    index.push([]);
    for (let j = 0; j < ys.length; j++) {
      const at = axes.map((_, k) => (k === ax ? i : k === ay ? j : (slice.holdAt[k] ?? 0)));
      const k = pointIndexOf(axes, at);
      const p = byIndex.get(k);
      const v = p?.figures[figure];
      const shown = v === undefined ? null : figureToDisplay(figure, v);
      if (shown !== null) {
        min = Math.min(min, shown);
        max = Math.max(max, shown);
      }
      cells[i].push(shown);
      infeasible[i].push(p ? !p.feasible : false);
      index[i].push(k);
    }
  }
  return { xs, ys, cells, infeasible, index, min, max };
}

/**
 * A figure against one swept parameter, one line per road and speed (runs, not aggregated over
 * roads and speeds). The other parameters are held at `holdAt` (an index into each one's
 * values). Over several seeds a line is the mean over the seeds, with `lo`/`hi` at ±1 standard
 * deviation for the band.
 */
export interface FigureLines {
  x: number[];
  lines: { label: string; roadIndex: number; speed: number; y: (number | null)[]; lo?: (number | null)[]; hi?: (number | null)[] }[];
}

export function figureLines(view: StudyView, figure: StudyFigureKey, along: number, holdAt: readonly number[], roadNames: readonly string[], d: StudyDisplay = defaultStudyDisplay): FigureLines {
  const { figureToDisplay, parameterToDisplay } = d;
  const speedUnit = d.units.speed;
  const axes = view.definition.axes;
  const alongAxis = axes[along] ? along : 0;
  const axis = axes[alongAxis];
  const values = sweepValues(axis);
  const byIndex = new Map(view.points.map((p) => [p.index, p]));
  const indexAt = (k: number) => pointIndexOf(axes, axes.map((_, j) => (j === alongAxis ? k : (holdAt[j] ?? 0))));
  const seeded = (view.definition.seeds ?? 1) > 1;
  type Line = FigureLines['lines'][number] & { samples: number[][] };
  const combos = new Map<string, Line>();
  values.forEach((_, k) => {
    const p = byIndex.get(indexAt(k));
    for (const run of p?.runs ?? []) {
      const key = `${run.roadIndex}|${run.speed}`;
      let line = combos.get(key);
      if (!line) {
        line = { label: `${roadNames[run.roadIndex] ?? `road ${run.roadIndex + 1}`} · ${+speedUnit.fromSI(run.speed).toPrecision(3)} ${speedUnit.symbol}`, roadIndex: run.roadIndex, speed: run.speed, y: values.map(() => null), samples: values.map(() => []) };
        combos.set(key, line);
      }
      const v = run.figures?.[figure];
      if (v !== undefined) line.samples[k].push(v);
    }
  });
  const lines = [...combos.values()]
    .sort((a, b) => a.roadIndex - b.roadIndex || a.speed - b.speed)
    .map(({ samples, ...line }) => {
      const stats = samples.map((xs) => (xs.length ? meanAndSpread(xs) : null));
      const shown = (f: (s: NonNullable<(typeof stats)[number]>) => number) => stats.map((s) => (s ? figureToDisplay(figure, f(s)) : null));
      const out: FigureLines['lines'][number] = { ...line, y: shown((s) => s.mean) };
      if (seeded) {
        out.lo = shown((s) => s.mean - s.sd);
        out.hi = shown((s) => s.mean + s.sd);
      }
      return out;
    });
  const x = values.map((v) => parameterToDisplay(axis.parameter, v));
  // Charts need x rising; a falling sweep is drawn the same, read left to right.
  if (x.length > 1 && x[0] > x[x.length - 1]) {
    x.reverse();
    for (const l of lines) {
      l.y.reverse();
      l.lo?.reverse();
      l.hi?.reverse();
    }
  }
  return { x, lines };
}
