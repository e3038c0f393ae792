import { mToMm, rodDiameterMmToAreaM2 } from '../../../../shared/units.ts';
import type { DisplayUnit } from '../../../lib/format.ts';

/**
 * Display units of the setup page beyond the common table in lib/format and the person's chosen
 * units (lib/units): the rod entered by its diameter (engineers measure a rod, not its area).
 */

/** Rod cross-section shown as its diameter in mm. */
export const rodDiameter: DisplayUnit = {
  symbol: 'mm ⌀',
  fromSI: (areaM2) => mToMm(Math.sqrt((4 * areaM2) / Math.PI)),
  toSI: (dMm) => rodDiameterMmToAreaM2(dMm),
};


/** Coefficient k of a stop polynomial F = Σ c_k·δ^k, in SI (N/m^k). */
export const stopCoefficient = (k: number): DisplayUnit => ({
  symbol: k === 1 ? 'N/m' : `N/m${['', '', '²', '³', '⁴', '⁵', '⁶'][k] ?? `^${k}`}`,
  fromSI: (x) => x,
  toSI: (x) => x,
});

/**
 * A number as an engineer would retype it: up to 6 significant figures, no trailing zeros,
 * exponent only for very large or small magnitudes. Empty for a missing value.
 */
export function editableNumber(value: unknown): string {
  if (typeof value !== 'number' || !Number.isFinite(value)) return '';
  const p = Number(value.toPrecision(6));
  return Math.abs(p) !== 0 && (Math.abs(p) >= 1e7 || Math.abs(p) < 1e-4) ? p.toExponential().replace('e+', 'e') : String(p);
}

/** What a person typed, as a number: blank → undefined, a decimal comma accepted, anything else NaN. */
export function parseTyped(text: string): number | undefined {
  const t = text.trim().replace(/\s/g, '').replace(',', '.').replace('−', '-');
  if (t === '') return undefined;
  const n = Number(t);
  return Number.isFinite(n) ? n : Number.NaN;
}
