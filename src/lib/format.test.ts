import { describe, expect, it } from 'vitest';
import { formatDateTime, formatQuantity, formatQuantityText, formatSig, units } from './format.ts';

describe('formatSig', () => {
  it.each([
    [1234.5, '1230'],
    [2, '2.00'],
    [0.0123456, '0.0123'],
    [0.5, '0.500'],
    [99.96, '100'],
    [999.6, '1000'],
    [0.09996, '0.100'],
    [-1.2345, '\u22121.23'],
    [0, '0.00'],
    [1.5e-7, '1.50e-7'],
    [2.5e7, '2.50e7'],
  ])('%s → %s', (value, expected) => {
    expect(formatSig(value)).toBe(expected);
  });

  it('honours a requested number of figures', () => {
    expect(formatSig(Math.PI, 5)).toBe('3.1416');
    expect(formatSig(Math.PI, 1)).toBe('3');
  });

  it('shows non-finite values as a dash rather than NaN', () => {
    expect(formatSig(Number.NaN)).toBe('—');
    expect(formatSig(Number.POSITIVE_INFINITY)).toBe('—');
  });
});

describe('units', () => {
  it('converts SI to the display unit and back', () => {
    expect(units.mm.fromSI(0.085)).toBeCloseTo(85, 9);
    expect(units.kNperm.fromSI(25_000)).toBeCloseTo(25, 9);
    expect(units.kmph.fromSI(25)).toBeCloseTo(90, 9);
    expect(units.bar.fromSI(2.5e6)).toBeCloseTo(25, 9);
    for (const u of Object.values(units)) expect(u.toSI(u.fromSI(0.37))).toBeCloseTo(0.37, 12);
  });

  it('formats a quantity with its unit', () => {
    expect(formatQuantity(0.0851, 'mm')).toEqual({ number: '85.1', unit: 'mm' });
    expect(formatQuantityText(1.234, 'Hz')).toBe('1.23\u2009Hz');
    expect(formatQuantityText(0.42, 'ratio')).toBe('0.420');
  });
});

describe('formatDateTime', () => {
  it('returns a dash for a date it cannot read', () => {
    expect(formatDateTime('not a date')).toBe('—');
  });

  it('includes the year and minutes', () => {
    const text = formatDateTime('2025-03-03T14:05:00Z');
    expect(text).toMatch(/2025/);
    expect(text).toMatch(/:05/);
  });
});
