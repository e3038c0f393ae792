import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { csvNumber, FIGURE_DIGITS } from './csv-number.ts';
import { writeCsv } from './write-csv.ts';

// Binary floating point: 0.7 + 0.1 is 0.7999999999999999 in IEEE 754 double (any JS console).
const gridStep = 0.7 + 0.1;

describe('csvNumber', () => {
  it('gives a grid value back as it was entered', () => {
    expect(gridStep).not.toBe(0.8);
    expect(csvNumber(gridStep)).toBe(0.8);
    // N/mm → N/m and back, as a spring-rate column goes through a unit change
    expect(csvNumber((20.5 * 1000) / 1000)).toBe(20.5);
    expect(csvNumber(0.1 + 0.2)).toBe(0.3);
  });

  it('keeps every digit a person could have typed', () => {
    expect(csvNumber(123456.789012)).toBe(123456.789012);
    expect(csvNumber(-0.000123)).toBe(-0.000123);
  });

  it('rounds a computed figure to its meaningful digits', () => {
    expect(csvNumber(0.9251734409, FIGURE_DIGITS)).toBe(0.92517);
    expect(csvNumber(-1834.61779, FIGURE_DIGITS)).toBe(-1834.6);
  });

  it('leaves no value that is not finite', () => {
    expect(csvNumber(Number.NaN)).toBeNull();
    expect(csvNumber(Number.POSITIVE_INFINITY)).toBeNull();
  });
});

describe('writeCsv numbers', () => {
  it('writes no float noise (today 0.7999999999999999 reached the file)', () => {
    const csv = writeCsv([['damping scale', gridStep]]);
    expect(csv).toBe('damping scale,0.8');
    expect(csv).not.toMatch(/\d{13,}/);
  });

  it('writes a value that is not finite as an empty cell and keeps the rest numeric', () => {
    const rows = Papa.parse<string[]>(writeCsv([[Number.NaN, -0.5]])).data;
    expect(rows[0]).toEqual(['', '-0.5']);
  });
});
