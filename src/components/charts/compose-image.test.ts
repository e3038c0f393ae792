import { describe, expect, it } from 'vitest';
import { composeChartImage, exportDate, wrapText, type CanvasLike } from './compose-image.ts';

/** A canvas that records what is drawn; text is 6 px per character at 11 px (a fixed-width stand-in). */
function recordingCanvas() {
  const texts: { text: string; x: number; y: number; font: string }[] = [];
  let font = '';
  const ctx = {
    fillStyle: '',
    textBaseline: 'alphabetic',
    get font() {
      return font;
    },
    set font(f: string) {
      font = f;
    },
    fillRect: () => {},
    drawImage: () => {},
    fillText: (text: string, x: number, y: number) => texts.push({ text, x, y, font }),
    measureText: (text: string) => ({ width: text.length * (Number(/(\d+)px/.exec(font)?.[1] ?? 11) * 6) / 11 }) as TextMetrics,
  };
  const canvas = { width: 0, height: 0, getContext: () => ctx } as unknown as CanvasLike;
  return { canvas, texts };
}

const parts = (legend: { label: string; color: string }[], plotWidth = 300) => ({
  plot: {} as CanvasImageSource,
  plotWidth,
  plotHeight: 200,
  title: 'Body acceleration',
  context: 'Front left r3 · ISO 8608 class C, seed 7 · 60 km/h · exported 2026-12-05',
  legend,
  colors: { paper: '#fff', ink: '#000', inkSoft: '#444' },
  font: 'sans-serif',
  scale: 1,
});

describe('composeChartImage', () => {
  it('draws the title, the context line and every legend name in full', () => {
    const { canvas, texts } = recordingCanvas();
    const legend = [
      { label: "Baseline (lead's pick)", color: '#0072b2' },
      { label: 'Picked', color: '#d55e00' },
      { label: 'Front left r3', color: '#009e73' },
    ];
    composeChartImage(parts(legend, 600), () => canvas);
    const drawn = texts.map((t) => t.text);
    expect(drawn).toContain('Body acceleration');
    expect(drawn).toContain('Front left r3 · ISO 8608 class C, seed 7 · 60 km/h · exported 2026-12-05');
    for (const e of legend) expect(drawn).toContain(e.label);
  });

  it('wraps legend entries to new rows inside the image instead of running off its edge', () => {
    const { canvas, texts } = recordingCanvas();
    const legend = Array.from({ length: 6 }, (_, i) => ({ label: `Setup number ${i + 1} with a long name`, color: '#000' }));
    const out = composeChartImage(parts(legend, 300), () => canvas);
    const entries = texts.filter((t) => t.text.startsWith('Setup number'));
    expect(entries).toHaveLength(6);
    for (const t of entries) expect(t.x + t.text.length * 6).toBeLessThanOrEqual(out.width);
    expect(new Set(entries.map((t) => t.y)).size).toBeGreaterThan(1);
    expect(Math.max(...entries.map((t) => t.y))).toBeLessThan(out.height);
  });

  it('wraps one name longer than the plot word by word, keeping every word', () => {
    const { canvas, texts } = recordingCanvas();
    const long = 'Baseline chosen by the lead for the spring programme of the Pipit front corner in winter trim';
    const out = composeChartImage(parts([{ label: long, color: '#000' }], 200), () => canvas);
    // the legend sits under the 200 px plot; title and context lines above it
    const lines = texts.filter((t) => t.y > 200);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.map((t) => t.text).join(' ')).toBe(long);
    for (const t of lines) expect(t.x + t.text.length * 6).toBeLessThanOrEqual(out.width);
  });
});

describe('wrapText and exportDate', () => {
  it('breaks at spaces within the width', () => {
    expect(wrapText('aa bb cc', 5, (s) => s.length)).toEqual(['aa bb', 'cc']);
  });
  it('writes the date as year-month-day', () => {
    expect(exportDate(new Date(2026, 11, 5))).toBe('exported 2026-12-05');
  });
});
