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

/** `y` of another run read at the reference's `x` by linear interpolation; null outside its span. */
export function resampleAt(xRef: ArrayLike<number>, x: ArrayLike<number>, y: ArrayLike<number>): (number | null)[] {
  const out: (number | null)[] = [];
  let j = 0;
  for (let i = 0; i < xRef.length; i++) {
    const t = xRef[i]!;
    while (j < x.length - 2 && x[j + 1]! < t) j++;
    const x0 = x[j]!;
    const x1 = x[j + 1];
    if (x1 === undefined || t < x0 || t > x1) {
      out.push(t === x0 ? y[j]! : null);
      continue;
    }
    const f = x1 === x0 ? 0 : (t - x0) / (x1 - x0);
    out.push(y[j]! + f * (y[j + 1]! - y[j]!));
  }
  return out;
}

/**
 * Several runs on one chart even when their x grids differ (saved runs are thinned their own
 * way): uPlot.join aligns them on the union of x values, leaving gaps the lines span.
 */
export function OverlayChart({ lines, xLabel, xUnit, yLabel, yUnit, log = false, difference = false, height = 190, syncKey, exportName }: { lines: OverlayLine[]; xLabel: string; xUnit: string; yLabel: string; yUnit: string; log?: boolean; difference?: boolean; height?: number; syncKey: string; exportName: string }) {
  // each other run minus the reference (the first), on the reference's x: a dashed line at zero
  // means no change, so a small change shows even where two lines lie on top of each other
  const diffs = useMemo(() => {
    const [ref, ...others] = lines;
    if (!difference || !ref) return [];
    return others.map((l) => ({ label: `Δ ${l.label} − ${ref.label}`, slot: l.slot, x: ref.x, y: resampleAt(ref.x, l.x, l.y).map((v, i) => (v == null ? null : v - ref.y[i]!)) }));
  }, [lines, difference]);
  const theme = useChartTheme();
  const options = useMemo(
    (): ChartOptions => ({
      height,
      scales: log ? psdScales() : { x: linearX },
      axes: [themedAxis(theme, { label: xLabel, unit: xUnit, log }), themedAxis(theme, { label: yLabel, unit: yUnit, size: 64, log })],
      series: [
        { label: xUnit },
        // the reference is drawn wider so a later run on top of it leaves its edges showing
        ...lines.map((l, i) => ({ ...themedSeries({ label: l.label, unit: yUnit, color: seriesColor(theme, l.slot), width: i === 0 && lines.length > 1 ? 2.5 : 1.25 }), spanGaps: true })),
        ...diffs.map((d) => ({ ...themedSeries({ label: d.label, unit: yUnit, color: seriesColor(theme, d.slot), width: 1, dash: [5, 3] }), spanGaps: true })),
      ],
      cursor: syncedCursor(syncKey),
    }),
    [theme, lines, diffs, xLabel, xUnit, yLabel, yUnit, log, height, syncKey],
  );
  const data = useMemo(() => {
    const tables = lines.map((l) => [Array.from(l.x), Array.from(l.y, (v) => (log && !(v > 0) ? null : v))] as uPlot.AlignedData);
    for (const d of diffs) tables.push([Array.from(d.x), d.y] as uPlot.AlignedData);
    return tables.length === 1 ? tables[0] : uPlot.join(tables);
  }, [lines, diffs, log]);
  return <UChart options={options} data={data} label={`${yLabel} overlaid`} exportName={exportName} />;
}
