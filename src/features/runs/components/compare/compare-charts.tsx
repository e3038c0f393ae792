import { useMemo } from 'react';
import { seriesColor } from '../../../../components/charts/chart-theme.ts';
import { useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import type { ComparedRun } from '../../model/compare.ts';
import { ChartCard } from '../charts/chart-card.tsx';
import { DamperOperatingChart } from '../charts/damper-operating-chart.tsx';
import { ResponseCharts } from '../charts/response-charts.tsx';
import { spectrumWindow } from '../charts/spectra-charts.tsx';
import { OverlayChart, type OverlayLine } from './overlay-chart.tsx';

const scaled = (x: Float64Array, k: number) => (k === 1 ? x : x.map((v) => v * k));

/** Damper curves, responses, time histories and spectra of every compared run, one colour each. */
export function CompareCharts({ runs }: { runs: ComparedRun[] }) {
  const theme = useChartTheme();
  const length = useUnits().length;
  const curves = useMemo(() => runs.map((r) => ({ label: r.label, color: seriesColor(theme, r.slot), damper: r.view.setup.damper })), [runs, theme]);
  const responses = useMemo(() => runs.map((r) => ({ label: r.label, color: seriesColor(theme, r.slot), response: r.view.response })), [runs, theme]);
  const vMax = useMemo(() => Math.max(0.3, ...runs.map((r) => r.view.traces.damperVelocity.reduce((a, v) => Math.max(a, Math.abs(v)), 0) * 1.15)), [runs]);

  const lanes = useMemo(() => {
    const lane = (key: 'bodyAccel' | 'travel' | 'tyreLoad', k: number): OverlayLine[] => runs.map((r) => ({ label: r.label, slot: r.slot, x: r.view.traces.time, y: scaled(r.view.traces[key], k) }));
    return { accel: lane('bodyAccel', 1), travel: lane('travel', length.fromSI(1)), load: lane('tyreLoad', 1) };
  }, [runs, length]);
  const spectra = useMemo(() => {
    const psd = (key: 'bodyAccel' | 'tyreLoad'): OverlayLine[] =>
      runs.flatMap((r) => {
        const s = r.view.spectra;
        if (!s) return [];
        const [from, to] = spectrumWindow(s.freq);
        return [{ label: r.label, slot: r.slot, x: s.freq.subarray(from, to), y: s[key].subarray(from, to) }];
      });
    return { accel: psd('bodyAccel'), load: psd('tyreLoad') };
  }, [runs]);

  return (
    <div className="grid gap-3">
      <div className="grid gap-3 lg:grid-cols-2">
        <ChartCard title="Damper curves" detail="Force against signed piston velocity: compression right, rebound left.">
          <DamperOperatingChart curves={curves} vMax={vMax} height={300} exportName="compare-damper-curves" label="Damper curves compared" />
        </ChartCard>
        <ResponseCharts series={responses} title="Frequency responses" />
      </div>
      <ChartCard title="Time histories" detail="Drag to zoom; the cursor is shared. Dashed: each run minus the reference (the first run), so zero means no change. Saved runs show their stored (thinned) traces.">
        <OverlayChart lines={lanes.accel} xLabel="Time" xUnit="s" yLabel="Body acceleration" yUnit="m/s²" syncKey="rw-compare-time" difference exportName="compare-body-accel" />
        <OverlayChart lines={lanes.travel} xLabel="Time" xUnit="s" yLabel="Travel (+ compression)" yUnit={length.symbol} syncKey="rw-compare-time" difference exportName="compare-travel" />
        <OverlayChart lines={lanes.load} xLabel="Time" xUnit="s" yLabel="Tyre load" yUnit="N" syncKey="rw-compare-time" difference exportName="compare-tyre-load" />
      </ChartCard>
      <ChartCard title="Spectra" detail="Welch PSD of the analysed part, log axes.">
        <div className="grid gap-2 lg:grid-cols-2">
          <OverlayChart lines={spectra.accel} xLabel="Frequency" xUnit="Hz" yLabel="Body acceleration" yUnit="(m/s²)²/Hz" log syncKey="rw-compare-psd" exportName="compare-psd-body-accel" />
          <OverlayChart lines={spectra.load} xLabel="Frequency" xUnit="Hz" yLabel="Tyre load" yUnit="N²/Hz" log syncKey="rw-compare-psd" exportName="compare-psd-tyre-load" />
        </div>
      </ChartCard>
    </div>
  );
}
