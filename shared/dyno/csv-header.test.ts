import { describe, expect, it } from 'vitest';
import { readHeaderCell, unitForRole } from './csv-header.ts';

describe('readHeaderCell', () => {
  it.each([
    ['velocity [mm/s]', 'velocity', 'mm/s', 'velocity'],
    ['Force (kN)', 'force', 'kN', 'force'],
    ['time_ms', 'time', 'ms', 'time'],
    ['velocity_mm_s', 'velocity', 'mm/s', 'velocity'],
    ['Force N', 'force', 'N', 'force'],
    ['Rebound Force [N]', 'rebound force', 'N', 'reboundForce'],
    ['bump', 'bump', undefined, 'compressionForce'],
    ['x', 'x', undefined, 'displacement'],
    ['piston speed', 'piston speed', undefined, 'velocity'],
    ['temperature [C]', 'temperature', 'C', undefined],
  ])('%s', (raw, name, unit, role) => {
    expect(readHeaderCell(raw)).toMatchObject({ name, unitText: unit, role });
  });
});

describe('unitForRole', () => {
  it('accepts the units of the role, case-insensitively, and refuses others', () => {
    expect(unitForRole('force', 'KN')).toBe('kN');
    expect(unitForRole('velocity', 'm s-1')).toBe('m/s');
    expect(unitForRole('time', undefined)).toBeUndefined();
    expect(unitForRole('displacement', 'm/s')).toEqual({ error: "unit 'm/s' is not accepted here; use m or mm or in" });
    expect(unitForRole('force', 'LBF')).toBe('lbf');
    expect(unitForRole('velocity', 'in/s')).toBe('in/s');
    expect(unitForRole('displacement', 'inch')).toBe('in');
  });
});
