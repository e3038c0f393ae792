import { useEffect, useMemo, useRef, useState } from 'react';
import type { StudyFigureKey } from '../../../../shared/schemas/study.ts';
import { readChartTheme } from '../../../components/charts/chart-theme.ts';
import { formatSig } from '../../../lib/format.ts';
import { heatGrid, type StudySlice } from '../model/chart-data.ts';
import { useStudyDisplay } from '../model/display.ts';
import { positionOf, type StudyView } from '../model/study-view.ts';
import { studyFigureInfo } from '../../../../shared/study/figures.ts';
import { useChartExport } from '../../../components/charts/export-context.tsx';
import { saveImage } from '../../../components/charts/export-png.ts';
import { exportFileName } from '../../../lib/export-name.ts';

/** Sequential ramp, light (low) to deep (high): sand, teal, ink-blue. Our own stops, read in order by lightness. */
const RAMP: [number, number, number][] = [
  [246, 238, 208],
  [121, 186, 160],
  [38, 118, 120],
  [22, 52, 74],
];

function rampColour(t: number): string {
  const x = Math.min(1, Math.max(0, t)) * (RAMP.length - 1);
  const i = Math.min(RAMP.length - 2, Math.floor(x));
  const f = x - i;
  const c = RAMP[i].map((a, k) => Math.round(a + (RAMP[i + 1][k] - a) * f));
  return `rgb(${c[0]} ${c[1]} ${c[2]})`;
}

const PAD = { left: 64, right: 86, top: 10, bottom: 46 };

export interface HeatMapProps {
  view: StudyView;
  figure: StudyFigureKey;
  baselineIndex: number | null;
  selected: number | null;
  onSelect: (index: number) => void;
  /** With more than two swept parameters: which two the map shows and where the others are held. */
  slice?: StudySlice;
}

/**
 * A 2-D sweep as a grid of one figure: colour from light (lowest) to deep (highest), points
 * breaking a limit hatched in the warning colour, the best compromise and the baseline outlined.
 * Drawn on a canvas (a grid of cells is not what a line-chart library is for).
 */
export function HeatMap({ view, figure, baselineIndex, selected, onSelect, slice }: HeatMapProps) {
  const d = useStudyDisplay();
  const { figureLabel, figureSymbol, parameterLabel } = d;
  const grid = useMemo(() => heatGrid(view, figure, slice, d), [view, figure, slice, d]);
  const canvasRef = useRef<HTMLCanvasElement>(null);
  const hostRef = useRef<HTMLDivElement>(null);
  const [width, setWidth] = useState(640);
  const height = 360;
  const bestIndex = view.compromise?.ok ? view.points[view.compromise.winner]?.index : undefined;
  const axes = view.definition.axes;
  const a = axes[slice?.mapAxes[0] ?? 0];
  const b = axes[slice?.mapAxes[1] ?? 1];
  const about = useChartExport();

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const observer = new ResizeObserver(() => setWidth(Math.max(240, Math.floor(host.clientWidth))));
    observer.observe(host);
    return () => observer.disconnect();
  }, []);

  useEffect(() => {
    const canvas = canvasRef.current;
    if (!canvas || !grid || !b) return;
    const theme = readChartTheme();
    const dpr = window.devicePixelRatio || 1;
    canvas.width = Math.round(width * dpr);
    canvas.height = Math.round(height * dpr);
    const ctx = canvas.getContext('2d')!;
    ctx.setTransform(dpr, 0, 0, dpr, 0, 0);
    ctx.fillStyle = theme.paper;
    ctx.fillRect(0, 0, width, height);
    const nx = grid.xs.length;
    const ny = grid.ys.length;
    const pw = width - PAD.left - PAD.right;
    const ph = height - PAD.top - PAD.bottom;
    const cw = pw / nx;
    const ch = ph / ny;
    const span = grid.max > grid.min ? grid.max - grid.min : 1;
    const small = nx <= 10 && ny <= 10 && cw > 38 && ch > 20;
    ctx.font = `11px ${theme.monoFont}`;
    ctx.textAlign = 'center';
    ctx.textBaseline = 'middle';
    for (let i = 0; i < nx; i++) {
      for (let j = 0; j < ny; j++) {
        const x = PAD.left + i * cw;
        const y = PAD.top + (ny - 1 - j) * ch;
        const v = grid.cells[i][j];
        ctx.fillStyle = v === null ? theme.grid : rampColour((v - grid.min) / span);
        ctx.fillRect(x, y, cw + 0.5, ch + 0.5);
        if (grid.infeasible[i][j]) {
          ctx.save();
          ctx.beginPath();
          ctx.rect(x, y, cw, ch);
          ctx.clip();
          ctx.strokeStyle = theme.signal;
          ctx.globalAlpha = 0.75;
          ctx.lineWidth = 1.5;
          for (let d = -ch; d < cw; d += 7) {
            ctx.moveTo(x + d, y + ch);
            ctx.lineTo(x + d + ch, y);
          }
          ctx.stroke();
          ctx.restore();
        }
        if (small && v !== null) {
          const t = (v - grid.min) / span;
          ctx.fillStyle = t > 0.55 ? '#fbf9f4' : theme.ink;
          ctx.fillText(formatSig(v, 3), x + cw / 2, y + ch / 2);
        }
        const idx = grid.index[i][j];
        const ring = (colour: string, w: number, inset: number) => {
          ctx.strokeStyle = colour;
          ctx.lineWidth = w;
          ctx.strokeRect(x + inset, y + inset, cw - 2 * inset, ch - 2 * inset);
        };
        if (idx === baselineIndex) ring(theme.grip, 3, 1.5);
        if (idx === bestIndex) ring(theme.comfort, 3, idx === baselineIndex ? 5 : 1.5);
        if (idx === selected) ring(theme.ink, 1.5, 0.75);
      }
    }
    // Axes: first parameter across, second up.
    ctx.fillStyle = theme.inkSoft;
    ctx.font = `11px ${theme.monoFont}`;
    const every = (n: number, room: number) => Math.max(1, Math.ceil(n / Math.max(1, Math.floor(room))));
    const sx = every(nx, pw / 48);
    grid.xs.forEach((v, i) => {
      if (i % sx === 0 || i === nx - 1) ctx.fillText(formatSig(v, 3), PAD.left + (i + 0.5) * cw, PAD.top + ph + 12);
    });
    ctx.textAlign = 'right';
    const sy = every(ny, ph / 18);
    grid.ys.forEach((v, j) => {
      if (j % sy === 0 || j === ny - 1) ctx.fillText(formatSig(v, 3), PAD.left - 6, PAD.top + (ny - 1 - j + 0.5) * ch);
    });
    ctx.font = `12px ${theme.sansFont}`;
    ctx.fillStyle = theme.ink;
    ctx.textAlign = 'center';
    ctx.fillText(parameterLabel(a.parameter), PAD.left + pw / 2, height - 12);
    ctx.save();
    ctx.translate(14, PAD.top + ph / 2);
    ctx.rotate(-Math.PI / 2);
    ctx.fillText(parameterLabel(b.parameter), 0, 0);
    ctx.restore();
    // Colour key.
    const kx = PAD.left + pw + 18;
    for (let k = 0; k < ph; k++) {
      ctx.fillStyle = rampColour(1 - k / ph);
      ctx.fillRect(kx, PAD.top + k, 14, 1.5);
    }
    ctx.fillStyle = theme.inkSoft;
    ctx.font = `11px ${theme.monoFont}`;
    ctx.textAlign = 'left';
    ctx.fillText(formatSig(grid.max, 3), kx + 18, PAD.top + 6);
    ctx.fillText(formatSig(grid.min, 3), kx + 18, PAD.top + ph - 6);
    // the key's unit, between its ends, so a saved image reads on its own
    ctx.fillStyle = theme.ink;
    ctx.font = `11px ${theme.sansFont}`;
    ctx.fillText(figureSymbol(figure) || 'ratio', kx + 18, PAD.top + ph / 2);
  }, [grid, width, a, b, baselineIndex, bestIndex, selected, figure]);

  if (!grid || !b) return null;
  const click = (e: React.MouseEvent<HTMLCanvasElement>) => {
    const rect = e.currentTarget.getBoundingClientRect();
    const i = Math.floor(((e.clientX - rect.left - PAD.left) / (width - PAD.left - PAD.right)) * grid.xs.length);
    const jFromTop = Math.floor(((e.clientY - rect.top - PAD.top) / (height - PAD.top - PAD.bottom)) * grid.ys.length);
    const j = grid.ys.length - 1 - jFromTop;
    if (i >= 0 && i < grid.xs.length && j >= 0 && j < grid.ys.length && positionOf(view, grid.index[i][j]) >= 0) onSelect(grid.index[i][j]);
  };
  const save = () => {
    const canvas = canvasRef.current;
    if (!canvas) return;
    const theme = readChartTheme();
    saveImage(canvas, exportFileName(about?.stem ?? '', `map ${studyFigureInfo[figure].label}`, 'png'), {
      title: `${view.definition.name}: ${figureLabel(figure)} over ${parameterLabel(a.parameter, false)} and ${parameterLabel(b.parameter, false)}`,
      context: about?.context,
      legend: [
        { label: `Colour: ${figureLabel(figure)}, light lowest, deep highest`, color: rampColour(0.7) },
        { label: 'Best compromise', color: theme.comfort },
        { label: 'Baseline', color: theme.grip },
        { label: 'Hatched: breaks a limit', color: theme.signal },
      ],
    });
  };

  return (
    <div ref={hostRef} className="relative">
      <button type="button" onClick={save} className="absolute right-0 top-0 z-10 rounded border border-rule bg-paper-raised px-1.5 py-0.5 text-xs text-ink-soft hover:text-ink">
        Save PNG
      </button>
      <canvas
        ref={canvasRef}
        onClick={click}
        role="img"
        aria-label={`${figureLabel(figure)} over ${parameterLabel(a.parameter, false)} and ${parameterLabel(b.parameter, false)}; hatched cells break a limit`}
        style={{ width, height }}
        className="cursor-crosshair"
      />
    </div>
  );
}
