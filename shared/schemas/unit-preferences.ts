import { z } from 'zod';

/**
 * The units one person reads and types four kinds of quantity in. Only the display changes:
 * every stored and computed value stays SI. Defaults are the units the product showed before
 * the choice existed (damper velocity in m/s, rates in N/mm, road speed in km/h, lengths in mm).
 */
export const DamperVelocityUnit = z.enum(['m/s', 'mm/s', 'in/s']);
export type DamperVelocityUnit = z.infer<typeof DamperVelocityUnit>;

/** Spring, tyre and stop rates. */
export const RateUnit = z.enum(['N/mm', 'N/m', 'lbf/in']);
export type RateUnit = z.infer<typeof RateUnit>;

/** Vehicle (road) speed. */
export const SpeedUnit = z.enum(['km/h', 'm/s', 'mph']);
export type SpeedUnit = z.infer<typeof SpeedUnit>;

/** Travel, stroke, sag, ride height and other lengths. */
export const LengthUnit = z.enum(['mm', 'm', 'in']);
export type LengthUnit = z.infer<typeof LengthUnit>;

export const DEFAULT_UNIT_PREFERENCES = { damperVelocity: 'm/s', rate: 'N/mm', speed: 'km/h', length: 'mm' } as const;

/** PUT /api/account/units, and `units` in GET /api/auth/me. */
export const UnitPreferences = z.strictObject({
  damperVelocity: DamperVelocityUnit,
  rate: RateUnit,
  speed: SpeedUnit,
  length: LengthUnit,
});
export type UnitPreferences = z.infer<typeof UnitPreferences>;

/** What is stored per user: a missing or partial record falls back to the defaults field by field. */
export const StoredUnitPreferences = z.object({
  damperVelocity: DamperVelocityUnit.catch(DEFAULT_UNIT_PREFERENCES.damperVelocity),
  rate: RateUnit.catch(DEFAULT_UNIT_PREFERENCES.rate),
  speed: SpeedUnit.catch(DEFAULT_UNIT_PREFERENCES.speed),
  length: LengthUnit.catch(DEFAULT_UNIT_PREFERENCES.length),
});
