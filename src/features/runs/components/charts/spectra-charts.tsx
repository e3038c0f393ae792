import { useMemo } from 'react';
import type uPlot from 'uplot';
import { logScale } from '../../../../components/charts/axes.ts';
import { themedAxis, themedSeries } from '../../../../components/charts/chart-theme.ts';
import { syncedCursor } from '../../../../components/charts/sync.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import type { Spectra } from '../../../../../shared/sim/metrics/compute-metrics.ts';
import { ChartCard } from './chart-card.tsx';
import { positiveOrNull } from './draw-hooks.ts';

/** Upper frequency drawn, Hz: past the wheel hop, well inside the Wk weighting. */
export const SPECTRUM_MAX_HZ = 50;

const panels = [
  { key: 'bodyAccel', title: 'Body acceleration', unit: '(m/s²)²/Hz', pick: (t: ReturnType<typeof useChartTheme>) => t.comfort },
  { key: 'travel', title: 'Travel', unit: 'm²/Hz', pick: (t: ReturnType<typeof useChartTheme>) => t.ink },
  { key: 'tyreLoad', title: 'Tyre load', unit: 'N²/Hz', pick: (t: ReturnType<typeof useChartTheme>) => t.grip },
] as const;

/** Log-log scales; y keeps five decades below the peak, so roll-off past the road's band does not squash the rest. */
export function psdScales() {
  return { x: logScale(), y: { ...logScale(), range: (_u: unknown, min: number, max: number): [number, number] => [Math.max(min, max * 1e-5), max * 2] } };
}

/** Indices of bins strictly above 0 Hz and up to `maxHz`. */
export function spectrumWindow(freq: Float64Array, maxHz = SPECTRUM_MAX_HZ): [number, number] {
  let from = 0;
  while (from < freq.length && freq[from] <= 0) from++;
  let to = from;
  while (to < freq.length && freq[to] <= maxHz) to++;
  return [from, to];
}

/** Welch PSDs of the analysed part, log-log, one chart per quantity (their units differ). */
export function SpectraCharts({ spectra }: { spectra: Spectra | null }) {
  const theme = useChartTheme();
  const options = useMemo(
    () =>
      panels.map(
        (p): ChartOptions => ({
          height: 200,
          scales: psdScales(),
          axes: [themedAxis(theme, { label: 'Frequency', unit: 'Hz', log: true }), themedAxis(theme, { label: p.title, unit: p.unit, size: 64, log: true })],
          series: [{ label: 'Hz' }, themedSeries({ label: p.title, unit: p.unit, color: p.pick(theme) })],
          cursor: syncedCursor('rw-run-psd'),
        }),
      ),
    [theme],
  );
  const data = useMemo(() => {
    if (!spectra) return null;
    const [from, to] = spectrumWindow(spectra.freq);
    const f = spectra.freq.subarray(from, to);
    return panels.map((p): uPlot.AlignedData => [f, positiveOrNull(spectra[p.key].subarray(from, to))]);
  }, [spectra]);

  return (
    <ChartCard title="Spectra" detail={`Welch PSD of the analysed part, up to ${SPECTRUM_MAX_HZ} Hz (Hann window, half overlap).`}>
      {data ? (
        <div className="grid gap-2 lg:grid-cols-3">
          {panels.map((p, i) => (
            <UChart key={p.key} options={options[i]} data={data[i]} label={`${p.title} spectrum`} exportName={`psd-${p.key}`} />
          ))}
        </div>
      ) : (
        <p className="py-6 text-sm text-ink-faint">This run was saved without its spectra.</p>
      )}
    </ChartCard>
  );
}
