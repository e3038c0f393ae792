import { useMemo, useRef } from 'react';
import type uPlot from 'uplot';
import type { DynoLoop, DynoPeakPoints } from '../../../../shared/schemas/dyno.ts';
import type { DamperCurve } from '../../../../shared/schemas/setup.ts';
import { curveForce } from '../../../../shared/sim/damper-force.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { formatSig } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { mergeColumns } from '../model/chart-columns.ts';

export interface FittedCurves {
  compression?: DamperCurve;
  rebound?: DamperCurve;
}

/** A scale range holding [min, max] and every value of `extra`, with 5 % air. */
function widen(min: number | null, max: number | null, extra: readonly number[] | undefined): [number, number] {
  let lo = min ?? 0;
  let hi = max ?? 1;
  for (const v of extra ?? []) {
    if (v < lo) lo = v;
    if (v > hi) hi = v;
  }
  const pad = (hi - lo || 1) * 0.05;
  return [lo - pad, hi + pad];
}

const curveXY = (curve: DamperCurve, sign: 1 | -1, vMax: number) => {
  const vs = [...new Set([0, ...curve.map(([v]) => v).filter((v) => v <= vMax), vMax])].sort((a, b) => a - b);
  return { x: vs.map((v) => sign * v), y: vs.map((v) => sign * curveForce(curve, v)) };
};

/**
 * Force against signed piston velocity (compression positive, rebound negative): the raw
 * record's loop as a thin line in time order, the measured peak points as dots and the fitted
 * tables as lines.
 */
export function DynoChart({ peaks, loop, fitted }: { peaks: DynoPeakPoints; loop: DynoLoop | null; fitted: FittedCurves }) {
  const theme = useChartTheme();
  const vu = useUnits().damperVelocity;
  // the loop in the shown velocity unit, as the axis is
  const shownLoop = useMemo(() => (loop ? { velocity: loop.velocity.map(vu.fromSI), force: loop.force } : null), [loop, vu]);
  const loopRef = useRef(shownLoop);
  loopRef.current = shownLoop;
  const vMax = Math.max(0.05, ...peaks.compression.map((p) => p.velocity), ...peaks.rebound.map((p) => p.velocity)) * 1.05;

  const options = useMemo<ChartOptions>(() => {
    const dots = (label: string, color: string): uPlot.Series => ({ label, stroke: color, width: 0, paths: () => null, points: { show: true, size: 7, width: 1.5, stroke: color, fill: `${color}55` }, value: (_u, v) => (v == null ? '–' : `${v.toFixed(0)} N`) });
    const drawLoop = (u: uPlot) => {
      const l = loopRef.current;
      if (!l || l.velocity.length < 2) return;
      const { ctx } = u;
      ctx.save();
      ctx.beginPath();
      ctx.rect(u.bbox.left, u.bbox.top, u.bbox.width, u.bbox.height);
      ctx.clip();
      ctx.strokeStyle = `${theme.ink}59`;
      ctx.lineWidth = devicePixelRatio;
      ctx.beginPath();
      l.velocity.forEach((v, i) => {
        const x = u.valToPos(v, 'x', true);
        const y = u.valToPos(l.force[i], 'y', true);
        if (i === 0) ctx.moveTo(x, y);
        else ctx.lineTo(x, y);
      });
      ctx.stroke();
      ctx.restore();
    };
    return {
      height: 300,
      scales: {
        // the loop is drawn by hand, so the scales are widened to hold it as well as the series
        x: { ...linearX, range: (_u, min, max) => widen(min, max, loopRef.current?.velocity) },
        y: { range: (_u, min, max) => widen(min, max, loopRef.current?.force) },
      },
      axes: [themedAxis(theme, { label: 'Piston velocity, signed: compression +, rebound −', unit: vu.symbol }), themedAxis(theme, { label: 'Force', unit: 'N', size: 64 })],
      series: [
        { label: 'Velocity', value: (_u, v) => (v == null ? '–' : `${formatSig(v, 3)} ${vu.symbol}`) },
        dots('Measured compression', seriesColor(theme, 0)),
        dots('Measured rebound', seriesColor(theme, 1)),
        { ...themedSeries({ label: 'Fitted compression', unit: 'N', color: seriesColor(theme, 0), width: 1.75 }), spanGaps: true },
        { ...themedSeries({ label: 'Fitted rebound', unit: 'N', color: seriesColor(theme, 1), width: 1.75 }), spanGaps: true },
      ],
      // drawn over the series: the loop mostly hugs the fitted curve and would hide under it
      hooks: { draw: [drawLoop] },
    };
  }, [theme, vu]);

  const data = useMemo(() => {
    return mergeColumns([
      { x: peaks.compression.map((p) => vu.fromSI(p.velocity)), y: peaks.compression.map((p) => p.force) },
      { x: peaks.rebound.map((p) => vu.fromSI(-p.velocity)), y: peaks.rebound.map((p) => -p.force) },
      fitted.compression ? inUnit(curveXY(fitted.compression, 1, vMax)) : { x: [], y: [] },
      fitted.rebound ? inUnit(curveXY(fitted.rebound, -1, vMax)) : { x: [], y: [] },
    ]);
    function inUnit(c: { x: number[]; y: number[] }) {
      return { x: c.x.map(vu.fromSI), y: c.y };
    }
  }, [peaks, fitted, vMax, vu]);

  return <UChart options={options} data={data} label="Dyno force against piston velocity" exportName="dyno-fit" />;
}
