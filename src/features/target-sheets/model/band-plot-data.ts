import type { DynoPeakPoints } from '../../../../shared/schemas/dyno.ts';
import type { TargetPoint } from '../../../../shared/schemas/target-sheet.ts';
import { toleranceBand } from '../../../../shared/target-sheet/band.ts';

/** A value of an aligned column: a number, `undefined` (no reading here, line carries on) or `null` (break the line). */
export type Cell = number | null | undefined;

export interface BandPlotColumns {
  /** Signed piston velocity, m/s: compression positive, rebound negative; ascending. */
  x: number[];
  target: Cell[];
  /** Upper and lower band edges in signed force (upper ≥ lower everywhere). */
  upper: Cell[];
  lower: Cell[];
  /** One column per measured damper, signed like the targets. */
  measured: Cell[][];
}

/**
 * The columns of the band plot. Velocity and force are signed in the project's convention
 * (compression positive), so rebound sits in the lower-left quadrant. The sheet's points and
 * every damper's points are merged onto one ascending x; where a series has no reading the cell
 * is `undefined` so its line carries on, and at 0 m/s every series holds `null` so the
 * compression and rebound halves are drawn apart (the sheet says nothing about zero speed).
 */
export function bandPlotColumns(sheet: { compression: readonly TargetPoint[]; rebound: readonly TargetPoint[] }, dampers: readonly DynoPeakPoints[] = []): BandPlotColumns {
  const rows = new Map<number, { target?: number; upper?: number; lower?: number; measured: Map<number, number> }>();
  const row = (x: number) => {
    let r = rows.get(x);
    if (!r) rows.set(x, (r = { measured: new Map() }));
    return r;
  };
  for (const [direction, sign] of [['compression', 1], ['rebound', -1]] as const) {
    for (const p of sheet[direction]) {
      const band = toleranceBand(p);
      const r = row(sign * p.velocity);
      r.target = sign * p.force;
      r.upper = sign > 0 ? band.upper : -band.lower;
      r.lower = sign > 0 ? band.lower : -band.upper;
    }
    dampers.forEach((d, i) => {
      for (const m of d[direction]) if (m.velocity > 0) row(sign * m.velocity).measured.set(i, sign * m.force);
    });
  }
  row(0);
  const x = [...rows.keys()].sort((a, b) => a - b);
  const at = (v: number) => rows.get(v)!;
  const pick = (v: number, value: number | undefined): Cell => (v === 0 ? null : value);
  return {
    x,
    target: x.map((v) => pick(v, at(v).target)),
    upper: x.map((v) => pick(v, at(v).upper)),
    lower: x.map((v) => pick(v, at(v).lower)),
    measured: dampers.map((_, i) => x.map((v) => pick(v, at(v).measured.get(i)))),
  };
}
