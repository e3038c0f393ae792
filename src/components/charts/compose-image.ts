/**
 * The picture a "Save PNG" writes: title, a context line (setup, revision, road, speed, date),
 * the plot, and the legend under it. The legend is laid out in rows that wrap at the plot's
 * width, and a name too long for one row is wrapped word by word, so no entry is ever cut off.
 * Pure over a small canvas interface, so a test can record what is drawn.
 */

export interface LegendEntry {
  label: string;
  color: string;
}

export interface ImageParts {
  plot: CanvasImageSource;
  /** Size of the plot in canvas pixels. */
  plotWidth: number;
  plotHeight: number;
  title?: string;
  context: string;
  legend: readonly LegendEntry[];
  colors: { paper: string; ink: string; inkSoft: string };
  font: string;
  /** Device pixels per CSS pixel. */
  scale: number;
}

type Ctx2D = Pick<CanvasRenderingContext2D, 'fillRect' | 'fillText' | 'measureText' | 'drawImage' | 'font' | 'fillStyle' | 'textBaseline'>;

export interface CanvasLike {
  width: number;
  height: number;
  getContext(kind: '2d'): Ctx2D | null;
}

/** Words of `text` in lines no wider than `max` (a single over-long word keeps its own line). */
export function wrapText(text: string, max: number, measure: (s: string) => number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter(Boolean)) {
    const next = line ? `${line} ${word}` : word;
    if (line && measure(next) > max) {
      lines.push(line);
      line = word;
    } else line = next;
  }
  if (line) lines.push(line);
  return lines;
}

interface Placed {
  x: number;
  y: number;
  lines: string[];
  color: string;
}

export function composeChartImage(parts: ImageParts, makeCanvas: () => CanvasLike): CanvasLike {
  const s = parts.scale;
  const pad = Math.round(12 * s);
  const titleFont = `600 ${Math.round(14 * s)}px ${parts.font}`;
  const smallFont = `${Math.round(11 * s)}px ${parts.font}`;
  const titleLine = Math.round(19 * s);
  const smallLine = Math.round(15 * s);
  const swatch = 18 * s;
  const gap = 14 * s;
  const width = parts.plotWidth + 2 * pad;
  const inner = parts.plotWidth;

  const out = makeCanvas();
  const ctx = out.getContext('2d');
  if (!ctx) return out;
  const measureIn = (font: string) => (text: string) => {
    ctx.font = font;
    return ctx.measureText(text).width;
  };

  const title = parts.title ? wrapText(parts.title, inner, measureIn(titleFont)) : [];
  const context = wrapText(parts.context, inner, measureIn(smallFont));
  const measure = measureIn(smallFont);

  // Legend entries flow left to right and wrap to a new row at the plot's width.
  const placed: Placed[] = [];
  let x = 0;
  let row = 0;
  let rowLines = 1;
  for (const entry of parts.legend) {
    const lines = wrapText(entry.label, inner - swatch, measure);
    const w = swatch + Math.max(...lines.map(measure), 0);
    if (x > 0 && (x + w > inner || lines.length > 1)) {
      row += rowLines * smallLine;
      x = 0;
      rowLines = 1;
    }
    placed.push({ x, y: row, lines, color: entry.color });
    rowLines = Math.max(rowLines, lines.length);
    x += w + gap;
  }
  const legendH = placed.length ? row + rowLines * smallLine : 0;

  const top = pad + title.length * titleLine + context.length * smallLine + Math.round(6 * s);
  out.width = width;
  out.height = top + parts.plotHeight + (legendH ? Math.round(6 * s) + legendH : 0) + pad;

  ctx.fillStyle = parts.colors.paper;
  ctx.fillRect(0, 0, out.width, out.height);
  ctx.textBaseline = 'top';
  let y = pad;
  ctx.fillStyle = parts.colors.ink;
  ctx.font = titleFont;
  for (const line of title) {
    ctx.fillText(line, pad, y);
    y += titleLine;
  }
  ctx.fillStyle = parts.colors.inkSoft;
  ctx.font = smallFont;
  for (const line of context) {
    ctx.fillText(line, pad, y);
    y += smallLine;
  }
  ctx.drawImage(parts.plot, pad, top);
  const legendTop = top + parts.plotHeight + Math.round(6 * s);
  for (const p of placed) {
    ctx.fillStyle = p.color;
    ctx.fillRect(pad + p.x, legendTop + p.y + 5 * s, 14 * s, 3 * s);
    ctx.fillStyle = parts.colors.ink;
    ctx.font = smallFont;
    p.lines.forEach((line, i) => ctx.fillText(line, pad + p.x + swatch, legendTop + p.y + i * smallLine));
  }
  return out;
}

/** "exported 2026-12-05": the date every saved image carries (local calendar date). */
export function exportDate(now = new Date()): string {
  const d = (n: number) => String(n).padStart(2, '0');
  return `exported ${now.getFullYear()}-${d(now.getMonth() + 1)}-${d(now.getDate())}`;
}
