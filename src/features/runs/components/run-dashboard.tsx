import { useMemo } from 'react';
import { useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { roadLabel } from '../../../../shared/runs/road-label.ts';
import { ResultsCaution } from '../../../components/ui/results-caution.tsx';
import { useUnits } from '../../../lib/units/use-units.tsx';
import type { RunView } from '../model/run-view.ts';
import { ChartCard } from './charts/chart-card.tsx';
import { DamperOperatingChart } from './charts/damper-operating-chart.tsx';
import { HistogramChart } from './charts/histogram-chart.tsx';
import { ResponseCharts } from './charts/response-charts.tsx';
import { SpectraCharts } from './charts/spectra-charts.tsx';
import { TimeHistoryCharts } from './charts/time-history-charts.tsx';
import { FigurePanels } from './figure-panels.tsx';
import { HeadlineStrip } from './headline-strip.tsx';
import { RunWarnings } from './run-warnings.tsx';

/** Everything one run shows: warnings, figures by group, then the charts; the caution closes it. */
export function RunDashboard({ view }: { view: RunView }) {
  const theme = useChartTheme();
  const vu = useUnits().damperVelocity;
  const { result, traces, setup } = view;
  const m = result.metrics;
  const bands = m.damperVelocityBands;

  const responseSeries = useMemo(() => [{ label: setup.name, color: theme.accent, response: view.response }], [setup.name, theme, view.response]);
  const marks = useMemo(() => [result.modal.body.naturalHz, result.modal.wheel.naturalHz], [result.modal]);
  const curves = useMemo(() => [{ label: 'Damper curve', color: theme.ink, damper: setup.damper }], [setup.damper, theme]);
  const points = useMemo(() => ({ velocity: traces.damperVelocity, force: traces.damperForce }), [traces]);
  const peakV = useMemo(() => traces.damperVelocity.reduce((a, v) => Math.max(a, Math.abs(v)), 0), [traces]);
  const bandRefs = useMemo(
    () => [bands.lowEdge, bands.highEdge].flatMap((e) => [e, -e]).map((e) => ({ axis: 'x' as const, value: vu.fromSI(e), color: theme.inkFaint, dash: [2, 3] })),
    [bands, theme, vu],
  );
  const loadRefs = useMemo(() => [{ axis: 'x' as const, value: m.tyreLoadStatic, color: theme.inkFaint, dash: [2, 3] }], [m.tyreLoadStatic, theme]);

  return (
    <div data-testid="run-dashboard">
      <RunWarnings metrics={m} />
      <HeadlineStrip result={result} />
      <FigurePanels result={result} setup={setup} roadName={roadLabel(view.road, view.seed)} />

      <div className="mt-4 grid gap-3">
        <TimeHistoryCharts traces={traces} setup={setup} staticLoad={m.tyreLoadStatic} settleTime={result.settleTime} />
        <SpectraCharts spectra={view.spectra} />
        <div className="grid gap-3 lg:grid-cols-2">
          <ResponseCharts series={responseSeries} marks={marks} />
          <ChartCard title="Damper curve and where the run used it" detail="Signed velocity: compression right, rebound left. Dots: the run’s operating points; dotted lines: speed band edges.">
            <DamperOperatingChart curves={curves} points={points} vMax={Math.max(0.1, peakV * 1.15)} bandEdges={[bands.lowEdge, bands.highEdge]} height={330} />
          </ChartCard>
        </div>
        <div className="grid gap-3 lg:grid-cols-2">
          <ChartCard title="Piston velocity distribution" detail="Share of the analysed time per velocity bin; + compression. Dotted lines: speed band edges.">
            <HistogramChart histogram={m.damperVelocityHistogram} scale={vu.fromSI(1)} xLabel="Piston velocity" xUnit={vu.symbol} color={theme.accent} refs={bandRefs} label="Piston velocity histogram" exportName="damper-velocity-histogram" />
          </ChartCard>
          <ChartCard title="Tyre load distribution" detail="Share of the analysed time per load bin. Dotted line: static load Fz0.">
            <HistogramChart histogram={view.tyreLoadHistogram} scale={1} xLabel="Tyre load" xUnit="N" color={theme.grip} refs={loadRefs} label="Tyre load distribution" exportName="tyre-load-distribution" />
          </ChartCard>
        </div>
      </div>
      <ResultsCaution />
    </div>
  );
}
