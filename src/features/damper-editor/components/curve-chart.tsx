import { useCallback, useMemo, useRef, useState, type KeyboardEvent, type PointerEvent } from 'react';
import type uPlot from 'uplot';
import type { Damper } from '../../../../shared/schemas/setup.ts';
import { linearX } from '../../../components/charts/axes.ts';
import { seriesColor, themedAxis, themedSeries } from '../../../components/charts/chart-theme.ts';
import { type ChartOptions, UChart, useChartTheme } from '../../../components/charts/uplot-chart.tsx';
import { formatSig, type DisplayUnit } from '../../../lib/format.ts';
import { useUnits } from '../../../lib/units/use-units.tsx';
import { signedCurveData } from '../model/chart-data.ts';
import type { Direction } from '../model/draft.ts';

export interface PointMove {
  direction: Direction;
  row: number;
  /** New force magnitude, N. */
  force: number;
}

interface Handle {
  direction: Direction;
  row: number;
  left: number;
  top: number;
  velocity: number;
  force: number;
}

/**
 * The force-velocity chart of the editor. Each table point has a handle over it: drag it up or
 * down (or focus it and use the arrow keys) to change that point's force. The force is held
 * between its neighbours' so the curve stays valid while it moves.
 */
/** Velocity ranges offered for the chart (m/s): the whole table, or a closer look at low speeds. */
export const chartSpans = [0, 0.6, 0.3, 0.15] as const;

export const chartSpanLabel = (span: number, unit: DisplayUnit) => (span === 0 ? 'all speeds' : `±${formatSig(unit.fromSI(span), 3)} ${unit.symbol}`);

export function CurveChart({
  damper,
  readOnly,
  span = 0,
  onMove,
}: {
  damper: Pick<Damper, 'compression' | 'rebound'>;
  readOnly?: boolean;
  /** Half-width of the velocity range shown, m/s; 0 shows the whole table. */
  span?: number;
  onMove: (m: PointMove) => void;
}) {
  const theme = useChartTheme();
  const wrapRef = useRef<HTMLDivElement>(null);
  const chartRef = useRef<uPlot | null>(null);
  const [handles, setHandles] = useState<Handle[]>([]);
  const [dragging, setDragging] = useState<{ direction: Direction; row: number } | null>(null);
  const vu = useUnits().damperVelocity;
  const vuRef = useRef(vu);
  vuRef.current = vu;
  const curve = useMemo(() => {
    const c = signedCurveData(damper);
    return { ...c, data: [(c.data[0] as number[]).map(vu.fromSI), ...c.data.slice(1)] as uPlot.AlignedData };
  }, [damper, vu]);
  const curveRef = useRef(curve);
  curveRef.current = curve;
  const damperRef = useRef(damper);
  damperRef.current = damper;

  const placeHandles = useCallback((u: uPlot) => {
    const wrap = wrapRef.current;
    if (!wrap) return;
    const w = wrap.getBoundingClientRect();
    const o = u.over.getBoundingClientRect();
    const next: Handle[] = [];
    for (const direction of ['compression', 'rebound'] as const) {
      const sign = direction === 'compression' ? 1 : -1;
      damperRef.current[direction].forEach(([v, f], row) => {
        const x = u.valToPos(vuRef.current.fromSI(sign * v), 'x');
        // points off the shown velocity range get no handle
        if (v === 0 || x < -1 || x > o.width + 1) return;
        next.push({ direction, row, velocity: v, force: f, left: o.left - w.left + x, top: o.top - w.top + u.valToPos(sign * f, 'y') });
      });
    }
    setHandles(next);
  }, []);

  const options = useMemo<ChartOptions>(
    () => ({
      height: 300,
      scales: { x: span > 0 ? { ...linearX, range: () => [-vu.fromSI(span), vu.fromSI(span)] } : linearX },
      axes: [themedAxis(theme, { label: 'Piston velocity, signed: compression +, rebound −', unit: vu.symbol }), themedAxis(theme, { label: 'Damper force', unit: 'N', size: 64 })],
      series: [
        { label: 'Velocity', value: (_u, v) => (v == null ? '–' : `${formatSig(v, 3)} ${vu.symbol}`) },
        { ...themedSeries({ label: 'Compression', unit: 'N', color: seriesColor(theme, 0), width: 1.5, points: true }), spanGaps: false },
        { ...themedSeries({ label: 'Rebound', unit: 'N', color: seriesColor(theme, 1), width: 1.5, points: true }), spanGaps: false },
      ],
      cursor: { drag: { x: false, y: false }, points: { size: 7 } },
      hooks: { draw: [(u) => placeHandles(u)] },
    }),
    [theme, placeHandles, span, vu],
  );

  const forceAt = (clientY: number): number | undefined => {
    const u = chartRef.current;
    if (!u) return undefined;
    const o = u.over.getBoundingClientRect();
    return u.posToVal(clientY - o.top, 'y');
  };

  /** The force for a point, held between its neighbours so force never falls with speed. */
  const clampForce = (direction: Direction, row: number, force: number) => {
    const pts = damperRef.current[direction];
    const lo = row > 0 ? pts[row - 1][1] : 0;
    const hi = row < pts.length - 1 ? pts[row + 1][1] : Number.POSITIVE_INFINITY;
    return Math.round(Math.min(hi, Math.max(lo, force)) * 10) / 10;
  };

  const move = (direction: Direction, row: number, signedForce: number) => {
    const sign = direction === 'compression' ? 1 : -1;
    onMove({ direction, row, force: clampForce(direction, row, sign * signedForce) });
  };

  /**
   * Handles sit close together at low speed, so a press takes the handle whose centre is nearest
   * the pointer, not merely the one on top.
   */
  const nearest = (clientX: number, clientY: number): Handle | undefined => {
    const wrap = wrapRef.current?.getBoundingClientRect();
    if (!wrap) return undefined;
    let best: Handle | undefined;
    let bestD = Number.POSITIVE_INFINITY;
    for (const h of handles) {
      const d = (h.left + wrap.left - clientX) ** 2 + (h.top + wrap.top - clientY) ** 2;
      if (d < bestD) {
        bestD = d;
        best = h;
      }
    }
    return best;
  };

  const onPointerDown = (e: PointerEvent<HTMLButtonElement>) => {
    if (readOnly) return;
    const h = nearest(e.clientX, e.clientY);
    if (!h) return;
    e.currentTarget.setPointerCapture(e.pointerId);
    e.preventDefault();
    setDragging({ direction: h.direction, row: h.row });
  };
  const onPointerMove = (e: PointerEvent<HTMLButtonElement>) => {
    if (!dragging) return;
    const f = forceAt(e.clientY);
    if (f !== undefined) move(dragging.direction, dragging.row, f);
  };
  const endDrag = () => {
    if (!dragging) return;
    setDragging(null);
    // rescale once the point is let go; while it moves the axes hold still under the pointer
    const u = chartRef.current;
    if (u) u.setData(u.data, true);
  };
  const onKeyDown = (h: Handle) => (e: KeyboardEvent<HTMLButtonElement>) => {
    if (readOnly || (e.key !== 'ArrowUp' && e.key !== 'ArrowDown')) return;
    e.preventDefault();
    const step = Math.max(1, h.force * (e.shiftKey ? 0.1 : 0.01));
    onMove({ direction: h.direction, row: h.row, force: clampForce(h.direction, h.row, h.force + (e.key === 'ArrowUp' ? step : -step)) });
  };

  return (
    <div ref={wrapRef} className="relative" data-testid="damper-curve-chart">
      <UChart options={options} data={curve.data} resetScales={!dragging} onReady={(u) => (chartRef.current = u)} label="Damper force against piston velocity" exportName="damper-curve" />
      {handles.map((h) => (
        <button
          key={`${h.direction}-${h.row}`}
          type="button"
          disabled={readOnly}
          aria-label={`${h.direction} point ${h.row + 1}: ${formatSig(vu.fromSI(h.velocity), 4)} ${vu.symbol}, ${h.force} N${readOnly ? '' : '; drag or use the arrow keys to change the force'}`}
          data-handle={`${h.direction}-${h.row}`}
          className={`absolute z-10 -ml-1.5 -mt-1.5 size-3 rounded-full border-2 bg-paper-raised/60 outline-offset-1 ${readOnly ? 'pointer-events-none opacity-0' : 'cursor-ns-resize hover:bg-white'} ${dragging?.direction === h.direction && dragging.row === h.row ? 'ring-2 ring-accent' : ''}`}
          style={{ left: h.left, top: h.top, borderColor: h.direction === 'compression' ? seriesColor(theme, 0) : seriesColor(theme, 1), touchAction: 'none' }}
          onPointerDown={onPointerDown}
          onPointerMove={onPointerMove}
          onPointerUp={endDrag}
          onPointerCancel={endDrag}
          onKeyDown={onKeyDown(h)}
        />
      ))}
    </div>
  );
}
