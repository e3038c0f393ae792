import type uPlot from 'uplot';
import { keepAllSplits, logSplits, logTickValues } from './axes.ts';
import { formatTick } from './tick-format.ts';

export { formatTick };

/**
 * Chart colours and fonts come from the CSS design tokens in `src/index.css`, so charts follow
 * the palette wherever it changes. Read once per chart creation (tokens do not change at run time).
 */
export interface ChartTheme {
  ink: string;
  inkSoft: string;
  inkFaint: string;
  grid: string;
  paper: string;
  accent: string;
  signal: string;
  comfort: string;
  grip: string;
  /** `--color-series-1..8` (Okabe–Ito based); index 0 is series 1. */
  series: string[];
  monoFont: string;
  sansFont: string;
}

/** Fallbacks match the tokens so a chart drawn before CSS loads (or in a test) still reads. */
const FALLBACK: ChartTheme = {
  ink: '#1e1b17',
  inkSoft: '#4a443b',
  inkFaint: '#756d5f',
  grid: '#ddd5c6',
  paper: '#fbf9f4',
  accent: '#0f5a4e',
  signal: '#b4530f',
  comfort: '#74489d',
  grip: '#687a14',
  series: ['#0072b2', '#d55e00', '#009e73', '#cc79a7', '#e69f00', '#56b4e9', '#3b3631', '#b3a100'],
  monoFont: '"JetBrains Mono Variable", ui-monospace, monospace',
  sansFont: '"Inter Variable", ui-sans-serif, system-ui, sans-serif',
};

export type TokenReader = (name: string) => string;

function documentReader(): TokenReader {
  if (typeof document === 'undefined') return () => '';
  const style = getComputedStyle(document.documentElement);
  return (name) => style.getPropertyValue(name).trim();
}

/** Reads the theme from CSS custom properties; `read` is injectable for tests. */
export function readChartTheme(read: TokenReader = documentReader()): ChartTheme {
  const pick = (name: string, fallback: string) => read(name) || fallback;
  return {
    ink: pick('--color-ink', FALLBACK.ink),
    inkSoft: pick('--color-ink-soft', FALLBACK.inkSoft),
    inkFaint: pick('--color-ink-faint', FALLBACK.inkFaint),
    grid: pick('--color-rule', FALLBACK.grid),
    paper: pick('--color-paper-raised', FALLBACK.paper),
    accent: pick('--color-accent', FALLBACK.accent),
    signal: pick('--color-signal', FALLBACK.signal),
    comfort: pick('--color-comfort', FALLBACK.comfort),
    grip: pick('--color-grip', FALLBACK.grip),
    series: FALLBACK.series.map((c, i) => pick(`--color-series-${i + 1}`, c)),
    monoFont: pick('--font-mono', FALLBACK.monoFont),
    sansFont: pick('--font-sans', FALLBACK.sansFont),
  };
}

/** Series colour by index, wrapping after 8 so the same setup keeps the same colour everywhere. */
export function seriesColor(theme: ChartTheme, index: number): string {
  return theme.series[((index % theme.series.length) + theme.series.length) % theme.series.length]!;
}

/** Label with its unit in brackets: `axisLabel('Velocity', 'm/s')` → "Velocity [m/s]". */
export function axisLabel(name: string, unit?: string): string {
  return unit ? `${name} [${unit}]` : name;
}

export interface ThemedAxisOptions {
  label?: string;
  unit?: string;
  scale?: string;
  side?: uPlot.Axis.Side;
  values?: uPlot.Axis['values'];
  splits?: uPlot.Axis['splits'];
  size?: number;
  /** A base-10 log axis: decade splits, one tick notation, no labels dropped by uPlot. */
  log?: boolean;
}

/** One axis in the house style: monospace ticks, thin light grid, label with unit. */
export function themedAxis(theme: ChartTheme, opts: ThemedAxisOptions = {}): uPlot.Axis {
  const axis: uPlot.Axis = {
    stroke: theme.inkSoft,
    font: `11px ${theme.monoFont}`,
    labelFont: `12px ${theme.sansFont}`,
    grid: { stroke: theme.grid, width: 1 },
    ticks: { stroke: theme.grid, width: 1, size: 4 },
    gap: 4,
  };
  if (opts.label !== undefined) axis.label = axisLabel(opts.label, opts.unit);
  if (opts.scale !== undefined) axis.scale = opts.scale;
  if (opts.side !== undefined) {
    axis.side = opts.side;
    // a second y axis shares the grid of the first; drawing both makes a cluttered mesh
    if (opts.side === 1) axis.grid = { show: false };
  }
  if (opts.log) {
    axis.splits = logSplits;
    axis.values = logTickValues;
    axis.filter = keepAllSplits;
  }
  if (opts.values !== undefined) axis.values = opts.values;
  if (opts.splits !== undefined) axis.splits = opts.splits;
  if (opts.size !== undefined) axis.size = opts.size;
  return axis;
}

export interface ThemedSeriesOptions {
  label: string;
  unit?: string;
  color: string;
  scale?: string;
  width?: number;
  dash?: number[];
  points?: boolean;
  show?: boolean;
}

/** A thin line series; the legend shows the unit after the value. */
export function themedSeries(opts: ThemedSeriesOptions): uPlot.Series {
  const series: uPlot.Series = {
    label: opts.label,
    stroke: opts.color,
    width: opts.width ?? 1.25,
    points: { show: opts.points ?? false, size: 5, stroke: opts.color, fill: opts.color },
    show: opts.show ?? true,
  };
  if (opts.scale !== undefined) series.scale = opts.scale;
  if (opts.dash !== undefined) series.dash = opts.dash;
  if (opts.unit !== undefined) {
    const unit = opts.unit;
    series.value = (_u, v) => (v == null ? '–' : `${formatTick(v)} ${unit}`);
  }
  return series;
}
