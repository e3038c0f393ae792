import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { studyParameterInfo } from '../../../../shared/study/describe-point.ts';
import { figureLines, type FigureLines } from '../model/chart-data.ts';
import { useStudyDisplay } from '../model/display.ts';
import type { StudyView } from '../model/study-view.ts';

/** Fills each line's ±1 sd band under the plot's clip, in the line's own colour. */
function drawBands(u: uPlot, lines: FigureLines, colour: (i: number) => string) {
  const ctx = u.ctx;
  ctx.save();
  ctx.beginPath();
  ctx.rect(u.bbox.left, u.bbox.top, u.bbox.width, u.bbox.height);
  ctx.clip();
  lines.lines.forEach((line, i) => {
    if (!line.lo || !line.hi) return;
    const xs = lines.x;
    let open = false;
    const flush = (upTo: number, from: number) => {
      // Close the run of samples [from, upTo) along hi, back along lo.
      ctx.beginPath();
      for (let k = from; k < upTo; k++) ctx.lineTo(u.valToPos(xs[k], 'x', true), u.valToPos(line.hi![k]!, 'y', true));
      for (let k = upTo - 1; k >= from; k--) ctx.lineTo(u.valToPos(xs[k], 'x', true), u.valToPos(line.lo![k]!, 'y', true));
      ctx.closePath();
      ctx.fillStyle = colour(i);
      ctx.globalAlpha = 0.16;
      ctx.fill();
      ctx.globalAlpha = 1;
    };
    let start = 0;
    for (let k = 0; k <= xs.length; k++) {
      const has = k < xs.length && line.lo[k] !== null && line.hi[k] !== null;
      if (has && !open) {
        open = true;
        start = k;
      } else if (!has && open) {
        open = false;
        flush(k, start);
      }
    }
  });
  ctx.restore();
}

/**
 * One figure against one swept parameter, a line per road and speed (the runs themselves, before
 * they are combined); over several seeds each line is the mean over the seeds in a ±1 sd band.
 */
export function FigureLinesChart({ view, figure, along, holdAt, roadNames }: { view: StudyView; figure: StudyFigureKey; along: number; holdAt: readonly number[]; roadNames: readonly string[] }) {
  const theme = useChartTheme();
  const d = useStudyDisplay();
  const lines = useMemo(() => figureLines(view, figure, along, holdAt, roadNames, d), [view, figure, along, holdAt, roadNames, d]);
  const linesRef = useRef(lines);
  linesRef.current = lines;
  const parameter = (view.definition.axes[along] ?? view.definition.axes[0]).parameter;
  const labels = lines.lines.map((l) => l.label).join('|');
  const options = useMemo<ChartOptions>(() => {
    const fUnit = d.figureSymbol(figure);
    const pUnit = d.parameterSymbol(parameter);
    return {
      height: 260,
      scales: { x: linearX },
      axes: [themedAxis(theme, { label: studyParameterInfo[parameter].label, unit: pUnit }), themedAxis(theme, { label: studyFigureInfo[figure].label, unit: fUnit, size: 60 })],
      series: [{ label: studyParameterInfo[parameter].label }, ...labels.split('|').filter(Boolean).map((label, i) => themedSeries({ label, unit: fUnit, color: seriesColor(theme, i), points: true, width: 1.5 }))],
      hooks: { drawSeries: [(u, i) => i === 1 && drawBands(u, linesRef.current, (k) => seriesColor(theme, k))] },
    };
  }, [theme, figure, parameter, labels, d]);
  // The y scale must take the bands in: hidden min and max columns would show in the legend, so widen through the data instead.
  const data = useMemo<uPlot.AlignedData>(() => [lines.x, ...lines.lines.map((l) => l.y)], [lines]);
  const banded = useMemo<ChartOptions>(() => {
    const all = lines.lines.flatMap((l) => [...(l.lo ?? []), ...(l.hi ?? [])]).filter((v): v is number => v !== null);
    if (!all.length) return options;
    const lo = Math.min(...all, ...lines.lines.flatMap((l) => l.y.filter((v): v is number => v !== null)));
    const hi = Math.max(...all, ...lines.lines.flatMap((l) => l.y.filter((v): v is number => v !== null)));
    const pad = (hi - lo) * 0.05 || Math.abs(hi) * 0.05 || 1;
    return { ...options, scales: { ...options.scales, y: { range: [lo - pad, hi + pad] } } };
  }, [options, lines]);
  return <UChart options={banded} data={data} exportName={studyFigureInfo[figure].label} label={`${studyFigureInfo[figure].label} against ${studyParameterInfo[parameter].label}`} />;
}
