import type { DynoPeakPoints } from '../../../../shared/schemas/dyno.ts';
import { suggestFitKnots } from '../../../../shared/dyno/fit-curve.ts';
import { type DisplayUnit, formatSig, units } from '../../../lib/format.ts';
import { siFromShown } from '../../../lib/units/unit-table.ts';

/**
 * Speeds offered for a first fit, m/s: a coarser spread than most dyno programmes, so the
 * residuals say something about the fitted table between its points (common table speeds; no
 * standard).
 */
export const FIT_SPREAD = [0.05, 0.1, 0.2, 0.3, 0.5, 1.0] as const;

/** Fastest fit speed taken, m/s. */
const MAX_KNOT = 20;

/** Fit speeds typed as a list in `unit` ("0.05, 0.1, 0.2" m/s): rising, above 0, at most 20 m/s; returned in m/s. */
export function readKnots(text: string, unit: DisplayUnit = units.mps): { ok: true; knots: number[] } | { ok: false; message: string } {
  const parts = text
    .split(/[\s,;]+/)
    .map((p) => p.trim())
    .filter(Boolean);
  if (parts.length === 0) return { ok: false, message: 'give at least one speed' };
  const knots: number[] = [];
  for (const p of parts) {
    const typed = Number(p);
    const x = Number.isFinite(typed) ? siFromShown(unit, typed) : Number.NaN;
    if (!Number.isFinite(x) || x <= 0 || x > MAX_KNOT) return { ok: false, message: `'${p}' is not a speed above 0 and at most ${formatSig(unit.fromSI(MAX_KNOT), 3)} ${unit.symbol}` };
    if (knots.length && x <= knots[knots.length - 1]) return { ok: false, message: `speeds must rise (${p} after ${formatSig(unit.fromSI(knots[knots.length - 1]), 4)})` };
    knots.push(x);
  }
  if (knots.length > 64) return { ok: false, message: 'at most 64 speeds' };
  return { ok: true, knots };
}

/** Suggested fit speeds covering both directions' measured points (the builder's table speeds kept in range). */
export function suggestKnots(peaks: DynoPeakPoints): number[] {
  const all = [...peaks.compression, ...peaks.rebound];
  const both = suggestFitKnots(all, FIT_SPREAD);
  // keep only speeds each direction can fix, so one list serves both
  const c = new Set(suggestFitKnots(peaks.compression, both));
  const r = new Set(suggestFitKnots(peaks.rebound, both));
  const common = both.filter((k) => (peaks.compression.length === 0 || c.has(k)) && (peaks.rebound.length === 0 || r.has(k)));
  return common.length ? common : both;
}

export const knotsText = (knots: readonly number[], unit: DisplayUnit = units.mps) => knots.map((k) => Number(unit.fromSI(k).toPrecision(4)).toString()).join(', ');
