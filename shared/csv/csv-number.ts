/**
 * How every number the product writes to a CSV is spelled. Binary floating point turns a value
 * typed as 0.8 into 0.7999999999999999 after one multiplication (a unit change, a grid step);
 * twelve significant digits is far beyond anything entered or measured and drops that noise, so
 * grid values and inputs read back as entered. Computed figures carry fewer digits
 * (`FIGURE_DIGITS`): the integrator's relative tolerance is 1e-4 (shared/sim/integrate-odex.ts),
 * so a fifth significant digit is the last one that means anything.
 */
export const INPUT_DIGITS = 12;
export const FIGURE_DIGITS = 5;

/** `value` rounded to `digits` significant figures, kept a number (so a spreadsheet reads it as one); null when not finite. */
export function csvNumber(value: number, digits: number = INPUT_DIGITS): number | null {
  if (!Number.isFinite(value)) return null;
  if (value === 0) return 0;
  return Number(value.toPrecision(digits));
}
