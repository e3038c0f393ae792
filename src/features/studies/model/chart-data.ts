import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../../../shared/schemas/study-result.ts';
import { sweepValues } from '../../../../shared/study/expand.ts';
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
}

export function tradeOffColumns(view: StudyView, baselineIndex: number | null, d: StudyDisplay = defaultStudyDisplay): TradeOffColumns {
  const { figureToDisplay } = d;
  const { comfortFigure: cf, gripFigure: gf } = view.definition;
  const frontIdx = new Set((view.tradeOff?.front ?? []).map((pos) => view.points[pos]?.index));
  const bestIdx = view.compromise?.ok ? view.points[view.compromise.winner]?.index : undefined;
  const entries: { x: number; y: number; p: StudyPointResult | null; index: number }[] = [];
  for (const p of view.points) {
    const c = p.figures[cf];
    const g = p.figures[gf];
    if (c !== undefined && g !== undefined) entries.push({ x: figureToDisplay(cf, c), y: figureToDisplay(gf, g), p, index: p.index });
  }
  const bc = view.base?.figures[cf];
  const bg = view.base?.figures[gf];
  if (bc !== undefined && bg !== undefined) entries.push({ x: figureToDisplay(cf, bc), y: figureToDisplay(gf, bg), p: null, index: -1 });
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
  };
}

/** A 2-D sweep as a grid of one figure: cells[i][j] for first-axis value i and second-axis value j (display units). */
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

export function heatGrid(view: StudyView, figure: StudyFigureKey, d: StudyDisplay = defaultStudyDisplay): HeatGrid | null {
  const { figureToDisplay, parameterToDisplay } = d;
  const [a, b] = view.definition.axes;
  if (!b) return null;
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
      const k = i * ys.length + j;
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
 * A figure against one swept parameter, one line per road and speed (runs, not aggregated).
 * With two axes the other parameter is held at `holdAt` (an index into its values).
 */
export interface FigureLines {
  x: number[];
  lines: { label: string; roadIndex: number; speed: number; y: (number | null)[] }[];
}

export function figureLines(view: StudyView, figure: StudyFigureKey, along: 0 | 1, holdAt: number, roadNames: readonly string[], d: StudyDisplay = defaultStudyDisplay): FigureLines {
  const { figureToDisplay, parameterToDisplay } = d;
  const speedUnit = d.units.speed;
  const axes = view.definition.axes;
  const axis = axes[along] ?? axes[0];
  const inner = axes[1]?.steps ?? 1;
  const values = sweepValues(axis);
  const byIndex = new Map(view.points.map((p) => [p.index, p]));
  const indexAt = (k: number) => (axes.length === 1 ? k : along === 0 ? k * inner + holdAt : holdAt * inner + k);
  const combos = new Map<string, { label: string; roadIndex: number; speed: number; y: (number | null)[] }>();
  values.forEach((_, k) => {
    const p = byIndex.get(indexAt(k));
    for (const run of p?.runs ?? []) {
      const key = `${run.roadIndex}|${run.speed}`;
      let line = combos.get(key);
      if (!line) {
        line = { label: `${roadNames[run.roadIndex] ?? `road ${run.roadIndex + 1}`} · ${+speedUnit.fromSI(run.speed).toPrecision(3)} ${speedUnit.symbol}`, roadIndex: run.roadIndex, speed: run.speed, y: values.map(() => null) };
        combos.set(key, line);
      }
      const v = run.figures?.[figure];
      line.y[k] = v === undefined ? null : figureToDisplay(figure, v);
    }
  });
  const lines = [...combos.values()].sort((a, b) => a.roadIndex - b.roadIndex || a.speed - b.speed);
  const x = values.map((v) => parameterToDisplay(axis.parameter, v));
  // Charts need x rising; a falling sweep is drawn the same, read left to right.
  if (x.length > 1 && x[0] > x[x.length - 1]) {
    x.reverse();
    for (const l of lines) l.y.reverse();
  }
  return { x, lines };
}
