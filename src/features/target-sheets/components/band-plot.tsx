import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { useMemo } from 'react';
import type uPlot from 'uplot';
import type { DynoPeakPoints } from '../../../../shared/schemas/dyno.ts';
import type { TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { bandPlotColumns } from '../model/band-plot-data.ts';

export interface BandPlotProps {
  compression: readonly TargetPoint[];
  rebound: readonly TargetPoint[];
  /** Measured dampers to overlay, each with its label. */
  measured?: readonly { label: string; peaks: DynoPeakPoints }[];
  height?: number;
  /** Offers the chart as a PNG download. */
  exportName?: string;
  /** Legend with values under the cursor (screen); off gives a plain key (print). */
  liveLegend?: boolean;
}

/** `#rrggbb` with an alpha, for canvas fills; anything else falls back to the accent's wash. */
function withAlpha(color: string, alpha: number): string {
  const m = /^#([0-9a-f]{2})([0-9a-f]{2})([0-9a-f]{2})$/i.exec(color.trim());
  if (!m) return `rgba(15, 90, 78, ${alpha})`;
  return `rgba(${parseInt(m[1], 16)}, ${parseInt(m[2], 16)}, ${parseInt(m[3], 16)}, ${alpha})`;
}

/**
 * Target forces with their tolerance band as a shaded area, measured dampers on top. Velocity
 * and force are signed, compression positive: rebound is the lower-left half.
 */
export function BandPlot({ compression, rebound, measured = [], height = 300, exportName, liveLegend = true }: BandPlotProps) {
  const theme = useChartTheme();
  const vu = useUnits().damperVelocity;
  const columns = useMemo(() => bandPlotColumns({ compression, rebound }, measured.map((m) => m.peaks)), [compression, rebound, measured]);
  const labels = measured.map((m) => m.label).join('\u0000');

  const options = useMemo<ChartOptions>(() => {
    const edge = (label: string) => themedSeries({ label, unit: 'N', color: theme.accent, width: 1, dash: [4, 3] });
    const series: uPlot.Series[] = [
      { label: 'Piston speed', value: (_u, v) => (v == null ? '–' : `${formatSig(v, 3)} ${vu.symbol}`) },
      { ...themedSeries({ label: 'Target', unit: 'N', color: theme.ink, width: 1.5, points: true }) },
      edge('Band upper'),
      edge('Band lower'),
      ...labels
        .split('\u0000')
        .filter(Boolean)
        .map((label, i) => themedSeries({ label, unit: 'N', color: seriesColor(theme, i), width: 1.5, points: true })),
    ];
    return {
      height,
      scales: { x: linearX },
      axes: [themedAxis(theme, { label: 'Piston speed, compression positive', unit: vu.symbol }), themedAxis(theme, { label: 'Damper force', unit: 'N', size: 60 })],
      series,
      bands: [{ series: [2, 3], fill: withAlpha(theme.accent, 0.16) }],
      legend: { show: true, live: liveLegend },
    };
  }, [theme, height, labels, liveLegend, vu]);

  const data = useMemo(
    () => [columns.x.map(vu.fromSI), columns.target, columns.upper, columns.lower, ...columns.measured] as unknown as uPlot.AlignedData,
    [columns, vu],
  );

  return <UChart options={options} data={data} label="Target band and measured dampers" exportName={exportName} />;
}
