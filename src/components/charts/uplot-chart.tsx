/**
 * `<UChart>`: the one uPlot wrapper of the app.
 *
 * Usage:
 * ```tsx
 * const theme = useChartTheme();
 * const options = useMemo<ChartOptions>(() => ({
 *   height: 240,
 *   scales: { x: linearX },                       // or logLogScales() for a PSD
 *   axes: [themedAxis(theme, { label: 'Time', unit: 's' }), themedAxis(theme, { label: 'Body acceleration', unit: 'm/s²' })],
 *   series: [{ label: 'Time' }, themedSeries({ label: 'Body', unit: 'm/s²', color: seriesColor(theme, 0) })],
 *   cursor: syncedCursor(),                        // stacked time charts share one cursor
 * }), [theme]);
 * <UChart options={options} data={[t, a]} exportName="body-acceleration" onReady={(u) => (ref.current = u)} />
 * ```
 * - Memoise `options`: a new options object re-creates the chart; a new `data` array only calls
 *   `setData` on the existing one.
 * - Width follows the container (ResizeObserver); height comes from `options.height` (260 px default).
 * - Clicking a legend entry toggles its series (uPlot's own legend).
 * - `exportName` adds a small "Save PNG" button; the image carries the chart's label as its title,
 *   the context line of the surrounding `ChartExportProvider` (setup, road, speed) and the date.
 * - Log axes: give the scale a finite range (`logDecadeRange(values)` in axes.ts) and null out
 *   values below it; uPlot's log ticks can loop forever on ranges reaching below about 1e−16.
 */
import { useEffect, useMemo, useRef } from 'react';
import uPlot from 'uplot';
import 'uplot/dist/uPlot.min.css';
import './uplot-chart.css';
import { readChartTheme, type ChartTheme } from './chart-theme.ts';
import { useChartExport } from './export-context.tsx';
import { exportPng } from './export-png.ts';
import { exportFileName } from '../../lib/export-name.ts';
import { withDotMarkers } from './legend-markers.ts';
import { withLevelYTitles } from './y-titles.ts';

export type ChartOptions = Omit<uPlot.Options, 'width' | 'height'> & { height?: number };

export interface UChartProps {
  options: ChartOptions;
  data: uPlot.AlignedData;
  className?: string;
  /** Called with the chart after each (re)creation, e.g. to keep a ref for hooks or export. */
  onReady?: (chart: uPlot) => void;
  /** Rescale axes to the new data on every update (default). Off keeps the user's zoom. */
  resetScales?: boolean;
  /** Shows a "Save PNG" button; the file is `<stem>_<exportName>.png`, the stem from the surrounding `ChartExportProvider`. */
  exportName?: string;
  /** Accessible name of the chart region. */
  label?: string;
}

const DEFAULT_HEIGHT = 260;

/** The theme read once per mounted component (tokens do not change while the page is open). */
export function useChartTheme(): ChartTheme {
  return useMemo(() => readChartTheme(), []);
}

export function UChart({ options, data, className = '', onReady, resetScales = true, exportName, label }: UChartProps) {
  const hostRef = useRef<HTMLDivElement>(null);
  const chartRef = useRef<uPlot | null>(null);
  const dataRef = useRef(data);
  const onReadyRef = useRef(onReady);
  dataRef.current = data;
  onReadyRef.current = onReady;
  const about = useChartExport();

  useEffect(() => {
    const host = hostRef.current;
    if (!host) return;
    const { height = DEFAULT_HEIGHT, ...rest } = withDotMarkers(withLevelYTitles(options));
    const width = Math.max(120, Math.floor(host.clientWidth));
    const chart = new uPlot({ ...rest, width, height }, dataRef.current, host);
    chartRef.current = chart;
    onReadyRef.current?.(chart);

    const observer = new ResizeObserver(() => {
      const w = Math.max(120, Math.floor(host.clientWidth));
      if (w !== chart.width) chart.setSize({ width: w, height });
    });
    observer.observe(host);
    return () => {
      observer.disconnect();
      chart.destroy();
      if (chartRef.current === chart) chartRef.current = null;
    };
  }, [options]);

  useEffect(() => {
    const chart = chartRef.current;
    if (chart && chart.data !== data) chart.setData(data, resetScales);
  }, [data, resetScales]);

  // the axis titles are drawn on the canvas; this gives them to screen readers (and to tests)
  const axisTitles = (options.axes ?? []).flatMap((a) => (typeof a.label === 'string' && a.label ? [a.label] : []));

  return (
    <div className={`rw-chart relative ${className}`} role="figure" aria-label={label}>
      {axisTitles.length > 0 && (
        <p className="sr-only" data-axis-titles>
          Axes: {axisTitles.join('; ')}
        </p>
      )}
      {exportName && (
        <button
          type="button"
          className="absolute right-0 top-0 z-10 rounded border border-rule bg-paper-raised px-1.5 py-0.5 text-xs text-ink-soft hover:text-ink"
          onClick={() => chartRef.current && exportPng(chartRef.current, exportFileName(about?.stem ?? '', exportName, 'png'), label, about?.context)}
        >
          Save PNG
        </button>
      )}
      <div ref={hostRef} className="w-full" />
    </div>
  );
}
