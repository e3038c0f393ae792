import { useMemo } from 'react';
import uPlot from 'uplot';
import { linearX } from '../../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../../components/charts/chart-theme.ts';
import { syncedCursor } from '../../../../components/charts/sync.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import { psdScales } from '../charts/spectra-charts.tsx';

export interface OverlayLine {
  label: string;
  slot: number;
  x: ArrayLike<number>;
  y: ArrayLike<number>;
}

/**
 * Several runs on one chart even when their x grids differ (saved runs are thinned their own
 * way): uPlot.join aligns them on the union of x values, leaving gaps the lines span.
 */
export function OverlayChart({ lines, xLabel, xUnit, yLabel, yUnit, log = false, height = 190, syncKey, exportName }: { lines: OverlayLine[]; xLabel: string; xUnit: string; yLabel: string; yUnit: string; log?: boolean; height?: number; syncKey: string; exportName: string }) {
  const theme = useChartTheme();
  const options = useMemo(
    (): ChartOptions => ({
      height,
      scales: log ? psdScales() : { x: linearX },
      axes: [themedAxis(theme, { label: xLabel, unit: xUnit, log }), themedAxis(theme, { label: yLabel, unit: yUnit, size: 64, log })],
      series: [{ label: xUnit }, ...lines.map((l) => ({ ...themedSeries({ label: l.label, unit: yUnit, color: seriesColor(theme, l.slot) }), spanGaps: true }))],
      cursor: syncedCursor(syncKey),
    }),
    [theme, lines, xLabel, xUnit, yLabel, yUnit, log, height, syncKey],
  );
  const data = useMemo(() => {
    const tables = lines.map((l) => [Array.from(l.x), Array.from(l.y, (v) => (log && !(v > 0) ? null : v))] as uPlot.AlignedData);
    return tables.length === 1 ? tables[0] : uPlot.join(tables);
  }, [lines, log]);
  return <UChart options={options} data={data} label={`${yLabel} overlaid`} exportName={exportName} />;
}
