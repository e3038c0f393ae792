import { z } from 'zod';

/**
 * Units carried in the types. Every physical field of a schema is a plain finite number at run
 * time (zod rejects NaN and ±Infinity) but a branded number after parsing, so a spring rate
 * cannot be passed where a damping coefficient is expected. Everything inside the code is SI;
 * the helpers at the bottom convert at the UI edge.
 */
export type NewtonSecondsPerMeter = z.infer<typeof newtonSecondsPerMeter>;

/** Base number schemas per unit; fields chain their own bounds (`newtons.nonnegative()` keeps the brand). */
export const kilograms = z.number().brand<'Kilograms'>();
export const meters = z.number().brand<'Meters'>();
export const metersPerSecond = z.number().brand<'MetersPerSecond'>();
export const seconds = z.number().brand<'Seconds'>();
export const hertz = z.number().brand<'Hertz'>();
export const newtons = z.number().brand<'Newtons'>();
export const newtonsPerMeter = z.number().brand<'NewtonsPerMeter'>();
export const newtonSecondsPerMeter = z.number().brand<'NewtonSecondsPerMeter'>();
export const pascals = z.number().brand<'Pascals'>();
export const squareMeters = z.number().brand<'SquareMeters'>();
export const cubicMeters = z.number().brand<'CubicMeters'>();
export const cyclesPerMeter = z.number().brand<'CyclesPerMeter'>();

export const asNewtonSecondsPerMeter = (x: number) => x as NewtonSecondsPerMeter;

// UI-edge conversions. Names read "from → to"; results are plain numbers in the target unit.
export const mmToM = (mm: number) => mm / 1000;
export const mToMm = (m: number) => m * 1000;
/** Piston or wheel speed: mm/s → m/s. */
export const mmPerSToMPerS = (mmPerS: number) => mmPerS / 1000;
export const mPerSToMmPerS = (mPerS: number) => mPerS * 1000;
/** Spring or tyre rate: N/mm → N/m. */
export const nPerMmToNPerM = (nPerMm: number) => nPerMm * 1000;
export const nPerMToNPerMm = (nPerM: number) => nPerM / 1000;
/** Damping coefficient: N·s/mm → N·s/m. */
export const nsPerMmToNsPerM = (nsPerMm: number) => nsPerMm * 1000;
export const nsPerMToNsPerMm = (nsPerM: number) => nsPerM / 1000;
/** Gas pressure: bar → Pa (1 bar = 100 000 Pa exactly). */
export const barToPa = (bar: number) => bar * 1e5;
export const paToBar = (pa: number) => pa / 1e5;
export const kNToN = (kN: number) => kN * 1000;
export const nToKN = (n: number) => n / 1000;
/** Rod area from diameter: mm → m². */
export const rodDiameterMmToAreaM2 = (dMm: number) => (Math.PI / 4) * (dMm / 1000) ** 2;
/** Volume: cm³ → m³. */
export const cm3ToM3 = (cm3: number) => cm3 * 1e-6;
export const m3ToCm3 = (m3: number) => m3 * 1e6;
/** The international inch, exactly 0.0254 m (NIST SP 811, appendix B). */
export const METERS_PER_INCH = 0.0254;
/** The pound-force, exactly 4.4482216152605 N (NIST SP 811, appendix B: standard gravity × the avoirdupois pound). */
export const NEWTONS_PER_POUND_FORCE = 4.4482216152605;
/** Speed: km/h → m/s. */
export const kmhToMPerS = (kmh: number) => kmh / 3.6;
export const mPerSToKmh = (mPerS: number) => mPerS * 3.6;
