import type { DamperVelocityUnit, LengthUnit, RateUnit, SpeedUnit, UnitPreferences } from '../../../shared/schemas/unit-preferences.ts';
import type { DisplayUnit } from '../format.ts';

/**
 * The one table of display units a person can choose: symbol and conversion to and from SI.
 * Metric rows multiply by a power of ten or 3.6 so round numbers stay round; imperial rows
 * go through the exact definitions: 1 in = 0.0254 m and 1 lb = 0.45359237 kg (international
 * yard and pound, 1959), standard gravity 9.80665 m/s² (CGPM 1901), so 1 lbf = 4.4482216152605 N
 * and 1 mph = 1609.344 m / 3600 s = 0.44704 m/s, as NIST SP 811 lists them.
 */
export const INCH_M = 0.0254;
export const POUND_FORCE_N = 0.45359237 * 9.80665;
export const MILE_PER_HOUR_MPS = (1760 * 3 * 12 * INCH_M) / 3600;

/** Display value = SI value × k. */
const times = (symbol: string, k: number): DisplayUnit => ({ symbol, fromSI: (si) => si * k, toSI: (shown) => shown / k });
/** Display value = SI value ÷ (SI value of one display unit). */
const per = (symbol: string, siOfOne: number): DisplayUnit => ({ symbol, fromSI: (si) => si / siOfOne, toSI: (shown) => shown * siOfOne });

export const unitTable = {
  damperVelocity: {
    'm/s': times('m/s', 1),
    'mm/s': times('mm/s', 1000),
    'in/s': per('in/s', INCH_M),
  } satisfies Record<DamperVelocityUnit, DisplayUnit>,
  rate: {
    'N/mm': times('N/mm', 1e-3),
    'N/m': times('N/m', 1),
    'lbf/in': per('lbf/in', POUND_FORCE_N / INCH_M),
  } satisfies Record<RateUnit, DisplayUnit>,
  speed: {
    'km/h': times('km/h', 3.6),
    'm/s': times('m/s', 1),
    mph: per('mph', MILE_PER_HOUR_MPS),
  } satisfies Record<SpeedUnit, DisplayUnit>,
  length: {
    mm: times('mm', 1000),
    m: times('m', 1),
    in: per('in', INCH_M),
  } satisfies Record<LengthUnit, DisplayUnit>,
} as const;

export type QuantityKind = keyof typeof unitTable;

/** What each kind is called where a person chooses its unit. */
export const kindLabels: Record<QuantityKind, string> = {
  damperVelocity: 'Damper velocity',
  rate: 'Spring and tyre rate',
  speed: 'Road speed',
  length: 'Length and travel',
};

/** The four chosen display units, ready to convert. */
export interface ChosenUnits {
  prefs: UnitPreferences;
  damperVelocity: DisplayUnit;
  rate: DisplayUnit;
  speed: DisplayUnit;
  length: DisplayUnit;
}

export function chosenUnits(prefs: UnitPreferences): ChosenUnits {
  return {
    prefs,
    damperVelocity: unitTable.damperVelocity[prefs.damperVelocity],
    rate: unitTable.rate[prefs.rate],
    speed: unitTable.speed[prefs.speed],
    length: unitTable.length[prefs.length],
  };
}

/** A shown value in one unit of a kind, re-expressed in another (60 km/h → 16.67 m/s). */
export function convertShown<K extends QuantityKind>(kind: K, value: number, from: keyof (typeof unitTable)[K], to: keyof (typeof unitTable)[K]): number {
  const table = unitTable[kind] as Record<string, DisplayUnit>;
  return table[to as string].fromSI(table[from as string].toSI(value));
}

/**
 * A typed number in `unit` back to SI without float noise: an imperial cell shows 6 significant
 * figures (0.05 m/s → "1.9685" in/s), so the shortest SI value that shows the same text is taken
 * (0.05, not 0.0499999). A number typed with more figures than a cell shows converts exactly.
 */
export function siFromShown(unit: DisplayUnit, shown: number): number {
  const si = unit.toSI(shown);
  if (!Number.isFinite(si) || shown !== Number(shown.toPrecision(6))) return si;
  for (let digits = 1; digits <= 15; digits++) {
    const short = Number(si.toPrecision(digits));
    if (Number(unit.fromSI(short).toPrecision(6)) === shown) return short;
  }
  return si;
}

/**
 * A sentence written in SI ("over 0–0.3 m/s piston speed", "secant at 0.1 m/s") with each
 * "<number> m/s" said in `unit` instead: for stored words a page shows in the reader's unit.
 */
export function speedsInWords(text: string, unit: DisplayUnit): string {
  return text.replace(/(\d+(?:\.\d+)?(?:e-?\d+)?) m\/s(?=[\s,.;:)]|$)/g, (_, n: string) => listText([Number(n)], unit));
}

/** A list of SI values in `unit`, to 4 significant figures, with the symbol once: "50, 80 km/h". */
export function listText(values: readonly number[], unit: DisplayUnit): string {
  return `${values.map((v) => String(Number(unit.fromSI(v).toPrecision(4)))).join(', ')} ${unit.symbol}`;
}
