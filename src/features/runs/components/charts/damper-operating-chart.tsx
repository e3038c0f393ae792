import { useMemo } from 'react';
import type uPlot from 'uplot';
import { linearX } from '../../../../components/charts/axes.ts';
import { themedAxis, themedSeries } from '../../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../../components/charts/uplot-chart.tsx';
import type { Damper } from '../../../../../shared/schemas/setup.ts';
import { damperForce } from '../../../../../shared/sim/damper-force.ts';
import { useUnits } from '../../../../lib/units/use-units.tsx';
import { refLinesHook } from './draw-hooks.ts';

export interface CurveSeries {
  label: string;
  color: string;
  damper: Pick<Damper, 'compression' | 'rebound'>;
}

/** Curve sample grid: signed piston velocity from −vMax to vMax, m/s, with every table point on it. */
export function curveGrid(dampers: CurveSeries['damper'][], vMax: number, steps = 160): Float64Array {
  const set = new Set<number>();
  for (let i = 0; i <= steps; i++) set.add(-vMax + (2 * vMax * i) / steps);
  for (const d of dampers) {
    for (const [v] of d.compression) if (v <= vMax) set.add(v);
    for (const [v] of d.rebound) if (v <= vMax) set.add(-v);
  }
  set.add(0);
  return Float64Array.from([...set].sort((a, b) => a - b));
}

export interface OperatingPoints {
  velocity: Float64Array;
  force: Float64Array;
}

/**
 * Damper force against signed piston velocity (compression positive, rebound negative: signed,
 * not mirrored), one curve per setup. With `points`, the run's operating points are dotted over
 * the curve, so the part of the curve the road actually used shows at a glance.
 */
export function DamperOperatingChart({ curves, points, vMax, bandEdges, label = 'Damper curve', exportName = 'damper-curve', height = 240 }: { curves: CurveSeries[]; points?: OperatingPoints; vMax: number; bandEdges?: [number, number]; label?: string; exportName?: string; height?: number }) {
  const theme = useChartTheme();
  const vu = useUnits().damperVelocity;
  const options = useMemo((): ChartOptions => {
    const refs = (bandEdges ?? []).flatMap((e) => [e, -e]).map((e) => ({ axis: 'x' as const, value: vu.fromSI(e), color: theme.inkFaint, dash: [2, 3] }));
    return {
      height,
      scales: { x: linearX },
      axes: [themedAxis(theme, { label: 'Piston velocity, + compression', unit: vu.symbol }), themedAxis(theme, { label: 'Damper force, + compression', unit: 'N', size: 60 })],
      series: [
        { label: vu.symbol },
        ...curves.map((c) => ({ ...themedSeries({ label: c.label, unit: 'N', color: c.color, width: 1.75 }), spanGaps: true })),
        ...(points ? [{ label: 'Operating points', stroke: theme.accent, width: 0, paths: () => null, points: { show: true, size: 7, width: 0, fill: `${theme.accent}66`, stroke: `${theme.accent}66` } } satisfies uPlot.Series] : []),
      ],
      hooks: { draw: [refLinesHook([...refs, { axis: 'y', value: 0, color: theme.inkFaint, dash: [1, 0] }, { axis: 'x', value: 0, color: theme.inkFaint, dash: [1, 0] }])] },
    };
  }, [theme, curves, points, bandEdges, height, vu]);

  const data = useMemo((): uPlot.AlignedData => {
    const grid = curveGrid(curves.map((c) => c.damper), vMax);
    if (!points) return [Array.from(grid, vu.fromSI), ...curves.map((c) => Array.from(grid, (v) => damperForce(c.damper, v)))];
    // one sorted x for curves and dots: curve values on the grid, dots where the run was
    const rows: [number, number, boolean][] = [];
    for (const v of grid) rows.push([v, 0, true]);
    for (let i = 0; i < points.velocity.length; i++) rows.push([points.velocity[i], points.force[i], false]);
    rows.sort((a, b) => a[0] - b[0]);
    return [
      rows.map((r) => vu.fromSI(r[0])),
      ...curves.map((c) => rows.map((r) => (r[2] ? damperForce(c.damper, r[0]) : null))),
      rows.map((r) => (r[2] ? null : r[1])),
    ];
  }, [curves, points, vMax, vu]);

  return <UChart options={options} data={data} label={label} exportName={exportName} />;
}
