import { useMemo } from 'react';
import type { ChannelFit } from '../../../../shared/drive/fit-drive.ts';
import { linearX, logDecadeRange, logLogScales, logScale } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { channelDisplay } from '../model/channel-display.ts';

/** Measured and model signal against time, both with their means removed, from the end of the settling time. */
export function DriveTraceChart({ fit, settle }: { fit: ChannelFit; settle: number }) {
  const theme = useChartTheme();
  const { label, unit } = channelDisplay(fit.channel, useUnits());
  const options = useMemo<ChartOptions>(
    () => ({
      height: 220,
      scales: { x: linearX },
      axes: [themedAxis(theme, { label: 'Time', unit: 's' }), themedAxis(theme, { label, unit: unit.symbol, size: 64 })],
      series: [
        { label: 'Time' },
        themedSeries({ label: 'Measured', unit: unit.symbol, color: seriesColor(theme, 0), width: 2 }),
        themedSeries({ label: 'Model', unit: unit.symbol, color: seriesColor(theme, 1), width: 1 }),
      ],
    }),
    [theme, label, unit],
  );
  const data = useMemo(() => {
    const t = fit.trace.measured.map((_, i) => settle + i * fit.trace.dt);
    return [t, fit.trace.measured.map(unit.fromSI), fit.trace.model.map(unit.fromSI)] as [number[], number[], number[]];
  }, [fit, settle, unit]);
  return <UChart options={options} data={data} label={`${label}: measured and model against time`} exportName={`drive-${fit.channel}-trace`} />;
}

/** Power spectral densities of the measured and model signal (Welch), log-log. */
export function DriveSpectrumChart({ fit }: { fit: ChannelFit }) {
  const theme = useChartTheme();
  const { label, unit } = channelDisplay(fit.channel, useUnits());
  // a PSD scales with the square of the unit
  const k = unit.fromSI(1) ** 2;
  const yRange = useMemo(() => logDecadeRange([...fit.spectra.measured, ...fit.spectra.model].map((v) => v * k), 6), [fit, k]);
  const options = useMemo<ChartOptions>(
    () => ({
      height: 220,
      scales: logLogScales(undefined, yRange),
      axes: [themedAxis(theme, { label: 'Frequency', unit: 'Hz', log: true }), themedAxis(theme, { label: `${label} PSD`, unit: `(${unit.symbol})²/Hz`, size: 70, log: true })],
      series: [
        { label: 'Frequency' },
        themedSeries({ label: 'Measured', unit: `(${unit.symbol})²/Hz`, color: seriesColor(theme, 0), width: 2.5 }),
        themedSeries({ label: 'Model', unit: `(${unit.symbol})²/Hz`, color: seriesColor(theme, 1), width: 1.25 }),
      ],
    }),
    [theme, label, unit, yRange],
  );
  const data = useMemo(() => {
    const floor = (v: number) => (v * k >= yRange[0] ? v * k : null);
    return [fit.spectra.freq, fit.spectra.measured.map(floor), fit.spectra.model.map(floor)] as [number[], (number | null)[], (number | null)[]];
  }, [fit, k, yRange]);
  return <UChart options={options} data={data} label={`${label}: spectra of measured and model`} exportName={`drive-${fit.channel}-spectra`} />;
}

/** Magnitude-squared coherence of measured and model, 0 to 1, on a log frequency axis. */
export function DriveCoherenceChart({ fit }: { fit: ChannelFit }) {
  const theme = useChartTheme();
  const { label } = channelDisplay(fit.channel, useUnits());
  const options = useMemo<ChartOptions>(
    () => ({
      height: 160,
      scales: { x: logScale([fit.spectra.freq[0], fit.spectra.freq[fit.spectra.freq.length - 1]]), y: { range: [0, 1] } },
      axes: [themedAxis(theme, { label: 'Frequency', unit: 'Hz', log: true }), themedAxis(theme, { label: 'Coherence', size: 64 })],
      series: [{ label: 'Frequency' }, themedSeries({ label: 'Coherence', unit: '', color: seriesColor(theme, 2), width: 1.25 })],
    }),
    [theme, fit],
  );
  const data = useMemo(() => [fit.spectra.freq, fit.spectra.coherence] as [number[], number[]], [fit]);
  return <UChart options={options} data={data} label={`${label}: coherence of measured and model`} exportName={`drive-${fit.channel}-coherence`} />;
}
