import { useMemo, useRef, useState } from 'react';
import type uPlot from 'uplot';
import { linearX } from '../../../components/charts/axes.ts';
import { themedAxis } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { tradeOffColumns } from '../model/chart-data.ts';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

export interface TradeOffChartProps {
  view: StudyView;
  baselineIndex: number | null;
  /** Sweep index of the highlighted point (−1: the base setup). */
  selected: number | null;
  onSelect: (index: number) => void;
  /** Words for a point, for the hover line. */
  describe: (index: number) => string;
}

const dot = (size: number, stroke: string, fill: string, width = 1.5): uPlot.Series['points'] => ({ show: true, size, stroke, fill, width });

/**
 * Comfort against grip: every point, those breaking a limit hollow and in the warning colour,
 * the Pareto front joined, the base setup as a large ring, the best compromise and the baseline
 * marked. Axes in the comfort and grip hues. Lower is better on both (for the usual figures):
 * the good corner is bottom left. Clicking picks the nearest point.
 */
export function TradeOffChart({ view, baselineIndex, selected, onSelect, describe }: TradeOffChartProps) {
  const theme = useChartTheme();
  const d = useStudyDisplay();
  const cols = useMemo(() => tradeOffColumns(view, baselineIndex, d), [view, baselineIndex, d]);
  const colsRef = useRef(cols);
  colsRef.current = cols;
  const onSelectRef = useRef(onSelect);
  onSelectRef.current = onSelect;
  const [hover, setHover] = useState<number | null>(null);
  const { comfortFigure: cf, gripFigure: gf } = view.definition;

  const options = useMemo<ChartOptions>(() => {
    const noLine = () => null;
    const cfUnit = d.figureSymbol(cf);
    const gfUnit = d.figureSymbol(gf);
    const axisX = { ...themedAxis(theme, { label: `Comfort: ${studyFigureInfo[cf].label}`, unit: cfUnit }), stroke: theme.comfort };
    const axisY = { ...themedAxis(theme, { label: `Grip: ${studyFigureInfo[gf].label}`, unit: gfUnit, size: 60 }), stroke: theme.grip };
    /** Index of the point nearest the mouse, in pixels, within 24 px. */
    const nearest = (u: uPlot): number | null => {
      const { left, top } = u.cursor;
      if (left === undefined || top === undefined || left < 0) return null;
      const c = colsRef.current;
      let best: number | null = null;
      let bestD = 24 * 24;
      for (let i = 0; i < c.x.length; i++) {
        const y = c.feasible[i] ?? c.infeasible[i] ?? c.base[i];
        if (y === null) continue;
        const dx = u.valToPos(c.x[i], 'x') - left;
        const dy = u.valToPos(y, 'y') - top;
        if (dx * dx + dy * dy < bestD) {
          bestD = dx * dx + dy * dy;
          best = i;
        }
      }
      return best;
    };
    return {
      height: 400,
      scales: { x: linearX, y: { auto: true } },
      legend: { live: false },
      cursor: { drag: { x: false, y: false }, points: { show: false } },
      axes: [axisX, axisY],
      series: [
        { label: 'Comfort' },
        { label: 'Within the limits', stroke: theme.inkSoft, paths: noLine, points: dot(7, theme.inkSoft, theme.inkSoft) },
        { label: 'Breaks a limit', stroke: theme.signal, paths: noLine, points: dot(7, theme.signal, theme.paper) },
        { label: 'Trade-off front (Pareto)', stroke: theme.accent, width: 2, spanGaps: true, points: dot(9, theme.accent, theme.accent) },
        { label: 'Base setup', stroke: theme.ink, paths: noLine, points: dot(15, theme.ink, 'transparent', 2.5) },
        { label: 'Best compromise', stroke: theme.comfort, paths: noLine, points: dot(20, theme.comfort, 'transparent', 3) },
        { label: 'Baseline (lead’s pick)', stroke: theme.grip, paths: noLine, points: dot(26, theme.grip, 'transparent', 2.5) },
      ],
      hooks: {
        // Over several seeds each point carries its ±1 sd range both ways, drawn under the dots.
        drawSeries: [
          (u, si) => {
            const c = colsRef.current;
            if (si !== 1 || !c.range) return;
            const { xLo, xHi, yLo, yHi } = c.range;
            const ctx = u.ctx;
            ctx.save();
            ctx.beginPath();
            ctx.rect(u.bbox.left, u.bbox.top, u.bbox.width, u.bbox.height);
            ctx.clip();
            ctx.strokeStyle = theme.inkFaint;
            ctx.globalAlpha = 0.55;
            ctx.lineWidth = Math.max(1, devicePixelRatio);
            ctx.beginPath();
            for (let i = 0; i < c.x.length; i++) {
              const y = c.feasible[i] ?? c.infeasible[i] ?? c.base[i];
              if (y === null) continue;
              const px = u.valToPos(c.x[i], 'x', true);
              const py = u.valToPos(y, 'y', true);
              if (xLo[i] !== null && xHi[i] !== null) {
                ctx.moveTo(u.valToPos(xLo[i]!, 'x', true), py);
                ctx.lineTo(u.valToPos(xHi[i]!, 'x', true), py);
              }
              if (yLo[i] !== null && yHi[i] !== null) {
                ctx.moveTo(px, u.valToPos(yLo[i]!, 'y', true));
                ctx.lineTo(px, u.valToPos(yHi[i]!, 'y', true));
              }
            }
            ctx.stroke();
            ctx.restore();
          },
        ],
        ready: [
          (u) => {
            u.over.addEventListener('click', () => {
              const i = nearest(u);
              if (i !== null) onSelectRef.current(colsRef.current.pointAt[i]);
            });
          },
        ],
        setCursor: [
          (u) => {
            const i = nearest(u);
            setHover(i === null ? null : colsRef.current.pointAt[i]);
          },
        ],
      },
    };
  }, [theme, cf, gf, d]);

  const selectedCol = useMemo(() => cols.pointAt.map((p, i) => (p === selected ? (cols.feasible[i] ?? cols.infeasible[i] ?? cols.base[i]) : null)), [cols, selected]);
  const data = useMemo<uPlot.AlignedData>(() => [cols.x, cols.feasible, cols.infeasible, cols.front, cols.base, cols.best, cols.baseline, selectedCol], [cols, selectedCol]);
  const withSelection = useMemo<ChartOptions>(
    () => ({ ...options, series: [...options.series, { label: 'Picked', stroke: theme.ink, paths: () => null, points: dot(11, theme.ink, theme.accent, 2) }] }),
    [options, theme],
  );

  return (
    <div>
      <UChart options={withSelection} data={data} exportName="comfort against grip" label="Comfort against grip, with the trade-off front" />
      <p className="mt-1 min-h-5 text-xs text-ink-soft" aria-live="polite">
        {hover !== null
          ? `${describe(hover)} — click to pick it`
          : `Lower is better on both axes: the front is where more comfort costs grip.${cols.range ? ` Dots are the mean over ${view.definition.seeds} road seeds; bars span ±1 standard deviation.` : ''} Hover a point to name it; click to pick it.`}
      </p>
    </div>
  );
}
