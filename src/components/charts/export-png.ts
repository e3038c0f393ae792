import type uPlot from 'uplot';
import { readChartTheme } from './chart-theme.ts';
import { composeChartImage, exportDate, type CanvasLike, type LegendEntry } from './compose-image.ts';
import { downloadBlob } from '../../lib/download.ts';

const newCanvas = (): CanvasLike => document.createElement('canvas');

/** The shown series of a chart as legend entries (uPlot's legend is HTML, so it is drawn again). */
function legendOf(chart: uPlot, fallback: string): LegendEntry[] {
  const entries: LegendEntry[] = [];
  chart.series.forEach((s, i) => {
    if (i === 0 || !s.show || !s.label) return;
    const stroke = typeof s.stroke === 'function' ? s.stroke(chart, i) : s.stroke;
    entries.push({ label: String(s.label), color: typeof stroke === 'string' ? stroke : fallback });
  });
  return entries;
}

/** A canvas image (plot of a chart or any canvas) as a PNG download, with title, context line and legend. */
export function saveImage(plot: HTMLCanvasElement, filename: string, opts: { title?: string; context?: string; legend?: LegendEntry[] }): void {
  const theme = readChartTheme();
  const canvas = composeChartImage(
    {
      plot,
      plotWidth: plot.width,
      plotHeight: plot.height,
      title: opts.title,
      context: [opts.context, exportDate()].filter(Boolean).join(' · '),
      legend: opts.legend ?? [],
      colors: { paper: theme.paper, ink: theme.ink, inkSoft: theme.inkSoft },
      font: theme.sansFont,
      scale: devicePixelRatio,
    },
    newCanvas,
  ) as HTMLCanvasElement;
  canvas.toBlob((blob) => {
    if (blob) downloadBlob(blob, filename);
  }, 'image/png');
}

/** Saves a chart as `filename` (a `.png` name): the plot canvas on the paper colour with its legend under it. */
export function exportPng(chart: uPlot, filename: string, title?: string, context?: string): void {
  saveImage(chart.ctx.canvas, filename, { title, context, legend: legendOf(chart, readChartTheme().ink) });
}
