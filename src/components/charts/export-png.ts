import type uPlot from 'uplot';
import { readChartTheme } from './chart-theme.ts';
import { downloadBlob } from '../../lib/download.ts';

/**
 * Saves a chart as a PNG: the plot canvas on the paper colour, with an optional title above it.
 * The legend is HTML, so the series names are drawn under the plot instead.
 */
export function chartToCanvas(chart: uPlot, title?: string): HTMLCanvasElement {
  const theme = readChartTheme();
  const src = chart.ctx.canvas;
  const pad = Math.round(12 * devicePixelRatio);
  const titleH = title ? Math.round(22 * devicePixelRatio) : 0;
  const legendH = Math.round(20 * devicePixelRatio);
  const out = document.createElement('canvas');
  out.width = src.width + 2 * pad;
  out.height = src.height + 2 * pad + titleH + legendH;
  const ctx = out.getContext('2d')!;
  ctx.fillStyle = theme.paper;
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.fillStyle = theme.ink;
  ctx.textBaseline = 'top';
  if (title) {
    ctx.font = `${Math.round(14 * devicePixelRatio)}px ${theme.sansFont}`;
    ctx.fillText(title, pad, pad);
  }
  ctx.drawImage(src, pad, pad + titleH);
  let x = pad;
  const y = pad + titleH + src.height + Math.round(4 * devicePixelRatio);
  ctx.font = `${Math.round(11 * devicePixelRatio)}px ${theme.sansFont}`;
  chart.series.forEach((s, i) => {
    if (i === 0 || !s.show || !s.label) return;
    const stroke = typeof s.stroke === 'function' ? s.stroke(chart, i) : s.stroke;
    ctx.fillStyle = typeof stroke === 'string' ? stroke : theme.ink;
    ctx.fillRect(x, y + 5 * devicePixelRatio, 14 * devicePixelRatio, 2 * devicePixelRatio);
    x += 18 * devicePixelRatio;
    ctx.fillStyle = theme.ink;
    const label = String(s.label);
    ctx.fillText(label, x, y);
    x += ctx.measureText(label).width + 14 * devicePixelRatio;
  });
  return out;
}

/** Triggers a download of the chart as `<filename>.png`. */
export function exportPng(chart: uPlot, filename = 'chart', title?: string): void {
  const canvas = chartToCanvas(chart, title);
  canvas.toBlob((blob) => {
    if (blob) downloadBlob(blob, filename.endsWith('.png') ? filename : `${filename}.png`);
  }, 'image/png');
}
