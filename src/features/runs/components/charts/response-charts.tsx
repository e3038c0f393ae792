import { useMemo, useState } from 'react';
import type uPlot from 'uplot';
import { logScale } from '../../../../components/charts/axes.ts';
import { themedAxis, themedSeries } from '../../../../components/charts/chart-theme.ts';
import { syncedCursor } from '../../../../components/charts/sync.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import type { FrequencyResponse } from '../../../../../shared/sim/linear/frequency-response.ts';
import { ChartCard } from './chart-card.tsx';
import { refLinesHook } from './draw-hooks.ts';

export const responseOutputs = [
  { key: 'bodyAccel', label: 'Body acceleration', unit: '(m/s²)/m' },
  { key: 'travel', label: 'Travel', unit: 'm/m' },
  { key: 'tyreLoad', label: 'Tyre load', unit: 'N/m' },
] as const;
export type ResponseOutput = (typeof responseOutputs)[number]['key'];

export interface ResponseSeries {
  label: string;
  color: string;
  response: FrequencyResponse;
}

const toDegrees = (rad: Float64Array) => Array.from(rad, (r) => (r * 180) / Math.PI);

/**
 * Gain and phase from road displacement to one output, 0.1–50 Hz on a log axis, for one or
 * several setups (each in its own colour). Marks the body and wheel-hop frequencies when given.
 */
export function ResponseCharts({ series, marks = [], title = 'Frequency response' }: { series: ResponseSeries[]; marks?: number[]; title?: string }) {
  const theme = useChartTheme();
  const [output, setOutput] = useState<ResponseOutput>('bodyAccel');
  const meta = responseOutputs.find((o) => o.key === output)!;

  const [gainOptions, phaseOptions] = useMemo((): [ChartOptions, ChartOptions] => {
    const lines = series.map((s) => themedSeries({ label: s.label, color: s.color, width: 1.5 }));
    const draw = [refLinesHook(marks.map((f) => ({ axis: 'x' as const, value: f, color: theme.inkFaint, dash: [2, 3] })))];
    const common = { cursor: syncedCursor('rw-run-response'), hooks: { draw } };
    return [
      {
        ...common,
        height: 210,
        scales: { x: logScale([0.1, 50]), y: logScale() },
        axes: [themedAxis(theme, { label: 'Frequency', unit: 'Hz', log: true }), themedAxis(theme, { label: `Gain, ${meta.label.toLowerCase()}`, unit: meta.unit, size: 64, log: true })],
        series: [{ label: 'Hz' }, ...lines],
      },
      {
        ...common,
        height: 150,
        scales: { x: logScale([0.1, 50]), y: { range: (_u, min, max) => [Math.floor(Math.min(min, -180) / 90) * 90, Math.ceil(Math.max(max, 0) / 90) * 90] } },
        axes: [themedAxis(theme, { label: 'Frequency', unit: 'Hz', log: true }), themedAxis(theme, { label: 'Phase', unit: '°', size: 64, splits: (_u, _a, min, max) => ticks90(min, max) })],
        series: [{ label: 'Hz' }, ...series.map((s) => themedSeries({ label: s.label, unit: '°', color: s.color, width: 1.5 }))],
        legend: { show: false },
      },
    ];
  }, [theme, series, marks, meta]);

  const gainData = useMemo((): uPlot.AlignedData => [series[0]?.response.freq ?? new Float64Array(), ...series.map((s) => s.response[output].gain)], [series, output]);
  const phaseData = useMemo((): uPlot.AlignedData => [series[0]?.response.freq ?? new Float64Array(), ...series.map((s) => toDegrees(s.response[output].phase))], [series, output]);

  return (
    <ChartCard
      title={title}
      detail="Linearised corner, road displacement in. Dotted lines: body and wheel-hop natural frequencies."
      controls={
        <div role="radiogroup" aria-label="Response output" className="flex overflow-hidden rounded border border-rule-strong text-xs">
          {responseOutputs.map((o) => (
            <button
              key={o.key}
              type="button"
              role="radio"
              aria-checked={output === o.key}
              onClick={() => setOutput(o.key)}
              className={`px-2 py-0.5 ${output === o.key ? 'bg-accent text-paper-raised' : 'bg-paper-raised text-ink-soft hover:bg-accent-wash'}`}
            >
              {o.label}
            </button>
          ))}
        </div>
      }
    >
      <UChart options={gainOptions} data={gainData} label={`${meta.label} gain`} exportName={`response-gain-${output}`} />
      <UChart options={phaseOptions} data={phaseData} label={`${meta.label} phase`} exportName={`response-phase-${output}`} />
    </ChartCard>
  );
}

function ticks90(min: number, max: number): number[] {
  const out: number[] = [];
  for (let v = Math.ceil(min / 90) * 90; v <= max; v += 90) out.push(v);
  return out;
}
