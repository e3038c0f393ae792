import { useEffect, useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import { linearX } from '../../../../components/charts/axes.ts';
import { themedAxis, themedSeries } from '../../../../components/charts/chart-theme.ts';
import { syncedCursor } from '../../../../components/charts/sync.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import type { Setup } from '../../../../../shared/schemas/setup.ts';
import type { DisplayUnit } from '../../../../lib/format.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import type { DrawnTraces } from '../../model/run-view.ts';
import { ChartCard } from './chart-card.tsx';
import { refLinesHook, type RefLine } from './draw-hooks.ts';

interface Lane {
  key: 'bodyAccel' | 'travel' | 'tyreLoad' | 'road';
  title: string;
  unit: string;
  /** SI → shown. */
  scale: number;
  colorOf: (t: ReturnType<typeof useChartTheme>) => string;
  refs: (setup: Setup, staticLoad: number, t: ReturnType<typeof useChartTheme>) => RefLine[];
}

/** The four lanes, travel and road in the person's length unit (`length`). */
const lanesIn = (length: DisplayUnit): Lane[] => [
  { key: 'bodyAccel', title: 'Body acceleration', unit: 'm/s²', scale: 1, colorOf: (t) => t.comfort, refs: () => [] },
  {
    key: 'travel',
    title: 'Travel',
    unit: length.symbol,
    scale: length.fromSI(1),
    colorOf: (t) => t.ink,
    refs: (s, _l, t) => [
      ...(s.bumpStop ? [{ axis: 'y' as const, value: length.fromSI(s.bumpStop.clearance), color: t.signal }] : []),
      ...(s.reboundStop ? [{ axis: 'y' as const, value: -length.fromSI(s.reboundStop.clearance), color: t.signal }] : []),
    ],
  },
  {
    key: 'tyreLoad',
    title: 'Tyre load',
    unit: 'N',
    scale: 1,
    colorOf: (t) => t.grip,
    refs: (_s, load, t) => [
      { axis: 'y', value: load, color: t.inkFaint, dash: [2, 3] },
      { axis: 'y', value: 0, color: t.signal },
    ],
  },
  { key: 'road', title: 'Road', unit: length.symbol, scale: length.fromSI(1), colorOf: (t) => t.inkSoft, refs: () => [] },
];

/**
 * Four stacked time histories with one cursor: drag to zoom any of them and all follow;
 * double-click to zoom back out. Dashed lines: stop clearances on travel, static load and zero
 * (lift-off) on tyre load.
 */
export function TimeHistoryCharts({ traces, setup, staticLoad, settleTime, syncKey = 'rw-run-time' }: { traces: DrawnTraces; setup: Setup; staticLoad: number; settleTime: number; syncKey?: string }) {
  const theme = useChartTheme();
  const length = useUnits().length;
  const lanes = useMemo(() => lanesIn(length), [length]);
  const charts = useRef<(uPlot | null)[]>([]);
  const syncing = useRef(false);

  const options = useMemo(
    () =>
      lanes.map((lane, i): ChartOptions => {
        const refs = lane.refs(setup, staticLoad, theme);
        if (settleTime > 0) refs.push({ axis: 'x', value: settleTime, color: theme.inkFaint, dash: [1, 3] });
        return {
          height: i === lanes.length - 1 ? 200 : 150,
          scales: { x: linearX },
          axes: [themedAxis(theme, i === lanes.length - 1 ? { label: 'Time', unit: 's' } : {}), themedAxis(theme, { label: lane.title, unit: lane.unit, size: 64 })],
          series: [{ label: 'Time' }, themedSeries({ label: lane.title, unit: lane.unit, color: lane.colorOf(theme) })],
          cursor: syncedCursor(syncKey),
          hooks: {
            draw: [refLinesHook(refs)],
            setScale: [
              (u: uPlot, key: string) => {
                if (key !== 'x' || syncing.current) return;
                syncing.current = true;
                const { min, max } = u.scales.x;
                for (const other of charts.current) if (other && other !== u && min != null && max != null) other.setScale('x', { min, max });
                syncing.current = false;
              },
            ],
          },
        };
      }),
    [theme, setup, staticLoad, settleTime, syncKey, lanes],
  );

  const data = useMemo(() => lanes.map((lane): uPlot.AlignedData => [traces.time, lane.scale === 1 ? traces[lane.key] : traces[lane.key].map((v) => v * lane.scale)]), [traces, lanes]);

  useEffect(() => () => void (charts.current = []), []);

  return (
    <ChartCard title="Time histories" detail="Travel positive in compression. Dashed: stop clearances, static load and zero load. Dotted: end of the settling time. Drag across a chart to zoom all four; double-click to zoom out.">
      <div className="flex flex-col">
        {lanes.map((lane, i) => (
          <UChart key={lane.key} options={options[i]} data={data[i]} label={lane.title} exportName={`time-${lane.key}`} onReady={(u) => (charts.current[i] = u)} />
        ))}
      </div>
    </ChartCard>
  );
}
