import { describe, expect, it } from 'vitest';
import { editableNumber, parseTyped, rodDiameter } from './setup-units.ts';

describe('setup display units', () => {
  it('reads a rod by its diameter: 16 mm is 2.011e-4 m²', () => {
    expect(rodDiameter.toSI(16)).toBeCloseTo((Math.PI / 4) * 0.016 ** 2, 12);
    expect(rodDiameter.fromSI(rodDiameter.toSI(16))).toBeCloseTo(16, 10);
  });

  it('parses what people type and refuses what is not a number', () => {
    expect(parseTyped(' 1,5 ')).toBe(1.5);
    expect(parseTyped('−2')).toBe(-2);
    expect(parseTyped('')).toBeUndefined();
    expect(parseTyped('stiff')).toBeNaN();
    expect(parseTyped('1e3')).toBe(1000);
  });

  it('shows numbers to retype without float noise', () => {
    expect(editableNumber(0.1 + 0.2)).toBe('0.3');
    expect(editableNumber(20500)).toBe('20500');
    expect(editableNumber(4e7)).toBe('4e7');
    expect(editableNumber(undefined)).toBe('');
  });
});
