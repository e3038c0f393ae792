import {
  barToPa,
  cm3ToM3,
  kmhToMPerS,
  kNToN,
  m3ToCm3,
  mmPerSToMPerS,
  mmToM,
  mPerSToKmh,
  mPerSToMmPerS,
  mToMm,
  nPerMmToNPerM,
  nPerMToNPerMm,
  nsPerMmToNsPerM,
  nsPerMToNsPerMm,
  nToKN,
  paToBar,
} from '../../shared/units.ts';

/**
 * Number and unit formatting at the UI edge. Code holds SI values; these helpers turn them
 * into what a person reads: a fixed number of significant figures, a display unit beside it.
 */

const MINUS = '\u2212';

/**
 * `value` rounded to `digits` significant figures, trailing zeros kept (2 → "2.00").
 * Plain notation between 1e-3 and 1e6; outside that an exponent ("1.23e-5") so columns stay narrow.
 * Non-finite values read as an em dash.
 */
export function formatSig(value: number, digits = 3): string {
  if (!Number.isFinite(value)) return '—';
  if (value === 0) return (0).toFixed(Math.max(0, digits - 1));
  const rounded = Number(Math.abs(value).toPrecision(digits));
  let text: string;
  if (rounded >= 1e-3 && rounded < 1e6) {
    const magnitude = Math.floor(Math.log10(rounded));
    text = rounded.toFixed(Math.max(0, digits - 1 - magnitude));
  } else {
    text = rounded.toExponential(digits - 1).replace('e+', 'e');
  }
  return value < 0 ? MINUS + text : text;
}

/** A display unit: its symbol and how to get there from the SI value. */
export interface DisplayUnit {
  symbol: string;
  fromSI: (si: number) => number;
  toSI: (shown: number) => number;
}

const scale = (symbol: string, factor: number): DisplayUnit => ({
  symbol,
  fromSI: (si) => si * factor,
  toSI: (shown) => shown / factor,
});

const via = (symbol: string, fromSI: (si: number) => number, toSI: (shown: number) => number): DisplayUnit => ({ symbol, fromSI, toSI });

/** Units the interface shows. Keys are the names code refers to; conversions come from shared/units where it has them. */
export const units = {
  m: scale('m', 1),
  mm: via('mm', mToMm, mmToM),
  kg: scale('kg', 1),
  N: scale('N', 1),
  kN: via('kN', nToKN, kNToN),
  Nperm: scale('N/m', 1),
  Npermm: via('N/mm', nPerMToNPerMm, nPerMmToNPerM),
  kNperm: via('kN/m', nPerMToNPerMm, nPerMmToNPerM),
  Nspm: scale('N·s/m', 1),
  Nspmm: via('N·s/mm', nsPerMToNsPerMm, nsPerMmToNsPerM),
  mps: scale('m/s', 1),
  mmps: via('mm/s', mPerSToMmPerS, mmPerSToMPerS),
  kmph: via('km/h', mPerSToKmh, kmhToMPerS),
  mps2: scale('m/s²', 1),
  mps175: scale('m/s¹·⁷⁵', 1),
  Hz: scale('Hz', 1),
  s: scale('s', 1),
  ms: scale('ms', 1e3),
  bar: via('bar', paToBar, barToPa),
  Pa: scale('Pa', 1),
  cm3: via('cm³', m3ToCm3, cm3ToM3),
  W: scale('W', 1),
  J: scale('J', 1),
  ratio: scale('', 1),
  percent: scale('%', 100),
} satisfies Record<string, DisplayUnit>;

export type UnitName = keyof typeof units;
/** A unit by name, or one chosen by the person (lib/units). */
export type UnitRef = UnitName | DisplayUnit;

/** An SI value converted to `unit` and rounded: `{ number: "85.0", unit: "mm" }`. */
export function formatQuantity(si: number, unit: UnitRef, digits = 3): { number: string; unit: string } {
  const u = typeof unit === 'string' ? units[unit] : unit;
  return { number: formatSig(u.fromSI(si), digits), unit: u.symbol };
}

/** The same as one string with a thin space before the unit. */
export function formatQuantityText(si: number, unit: UnitRef, digits = 3): string {
  const { number, unit: symbol } = formatQuantity(si, unit, digits);
  return symbol ? `${number}\u2009${symbol}` : number;
}

const dateTime = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});
const dateOnly = new Intl.DateTimeFormat('en-GB', { day: 'numeric', month: 'short', year: 'numeric' });

/** "3 Mar 2025, 14:05" in the viewer's time zone; invalid input reads as an em dash. */
export function formatDateTime(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '—' : dateTime.format(d);
}

export function formatDate(iso: string): string {
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? '—' : dateOnly.format(d);
}

/** A whole count with its thousands set off by thin spaces (12 345, 1 000 000), exact. */
export function formatCount(n: number): string {
  return String(Math.round(n)).replace(/\B(?=(\d{3})+(?!\d))/g, '\u2009');
}
