import { useMemo } from 'react';
import type uPlot from 'uplot';
import { linearX } from '../../../../components/charts/axes.ts';
import { themedAxis } from '../../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import type { Histogram } from '../../../../../shared/schemas/metrics.ts';
import { barPaths, refLinesHook, type RefLine } from './draw-hooks.ts';

export interface HistogramChartProps {
  histogram: Histogram;
  /** SI → shown on the x axis. */
  scale: number;
  xLabel: string;
  xUnit: string;
  color: string;
  refs?: RefLine[];
  label: string;
  exportName: string;
}

/** Share of time per bin (%), bars at bin centres. */
export function HistogramChart({ histogram, scale, xLabel, xUnit, color, refs = [], label, exportName }: HistogramChartProps) {
  const theme = useChartTheme();
  const options = useMemo(
    (): ChartOptions => ({
      height: 200,
      scales: { x: linearX, y: { range: (_u, _min, max) => [0, Math.max(1, max * 1.08)] } },
      axes: [themedAxis(theme, { label: xLabel, unit: xUnit }), themedAxis(theme, { label: 'Share of time', unit: '%', size: 52 })],
      series: [
        { label: xLabel },
        { label: 'Share', stroke: color, fill: `${color}55`, width: 1, paths: barPaths(), points: { show: false }, value: (_u, v) => (v == null ? '–' : `${v.toFixed(1)} %`) },
      ],
      hooks: { draw: [refLinesHook(refs)] },
      legend: { show: false },
    }),
    [theme, xLabel, xUnit, color, refs],
  );
  const data = useMemo((): uPlot.AlignedData => {
    const total = histogram.counts.reduce((a, b) => a + b, 0) || 1;
    const centres = histogram.counts.map((_, i) => ((histogram.edges[i] + histogram.edges[i + 1]) / 2) * scale);
    return [centres, histogram.counts.map((c) => (100 * c) / total)];
  }, [histogram, scale]);
  return <UChart options={options} data={data} label={label} exportName={exportName} />;
}
