import { describe, expect, it } from 'vitest';
import { Setup } from '../../../../shared/schemas/setup.ts';
import { chosenUnits } from '../../../lib/units/unit-table.ts';
import { setupProblems } from './setup-problems.ts';
import { diffSetups, flatten } from './setup-diff.ts';

const base = Setup.parse({
  name: 'Pipit front',
  sprungMass: 310,
  unsprungMass: 36,
  springRate: 20500,
  motionRatio: 0.95,
  tyreRate: 210000,
  damper: {
    compression: [
      [0.05, 110],
      [0.3, 291],
    ],
    rebound: [
      [0.05, 220],
      [0.3, 583],
    ],
    gas: { force: 250 },
  },
  bumpStop: { clearance: 0.055, law: { kind: 'polynomial', coefficients: [20000, 0, 4e7] } },
});

describe('diffSetups', () => {
  it('finds nothing between a revision and itself', () => {
    expect(diffSetups(base, structuredClone(base))).toEqual([]);
  });

  it('names each changed field with its display unit, in page order', () => {
    const next = Setup.parse({
      ...base,
      springRate: 21500,
      damper: { ...base.damper, rebound: [[0.05, 220], [0.3, 640]] },
      bumpStop: { ...base.bumpStop, clearance: 0.05 },
    });
    const rows = diffSetups(base, next);
    expect(rows.map((r) => [r.label, r.before, r.after])).toEqual([
      ['Spring rate', 20500, 21500],
      ['Rebound point 2, force', 583, 640],
      ['Bump stop clearance', 0.055, 0.05],
    ]);
    expect(rows[0].unit?.symbol).toBe('N/mm');
    expect(rows[2].unit?.fromSI(0.05)).toBeCloseTo(50, 12);
  });

  it('gives each row the unit the person chose: rates in lbf/in, lengths in in, damper speeds in mm/s; masses and forces stay SI', () => {
    const u = chosenUnits({ damperVelocity: 'mm/s', rate: 'lbf/in', speed: 'mph', length: 'in' });
    const next = Setup.parse({ ...base, sprungMass: 320, springRate: 21500, damper: { ...base.damper, compression: [[0.06, 115], [0.3, 291]] }, bumpStop: { ...base.bumpStop, clearance: 0.05 } });
    const unitOf = Object.fromEntries(diffSetups(base, next, u).map((r) => [r.label, r.unit]));
    // 1 lbf/in = 175.126835 N/m and 1 in = 0.0254 m (NIST SP 811, B.8)
    expect(unitOf['Spring rate']?.symbol).toBe('lbf/in');
    expect(unitOf['Spring rate']?.fromSI(21500)).toBeCloseTo(122.7682, 4);
    expect(unitOf['Bump stop clearance']?.symbol).toBe('in');
    expect(unitOf['Bump stop clearance']?.fromSI(0.0508)).toBeCloseTo(2, 12);
    expect(unitOf['Compression point 1, speed']?.symbol).toBe('mm/s');
    expect(unitOf['Compression point 1, force']?.symbol).toBe('N');
    expect(unitOf['Sprung mass']?.symbol).toBe('kg');
  });

  it('names a damper cell by its speed in the chosen unit in a validation message', () => {
    const u = chosenUnits({ damperVelocity: 'mm/s', rate: 'N/mm', speed: 'km/h', length: 'mm' });
    const bad = { ...base, damper: { ...base.damper, rebound: [[0.05, 220], [0.52, -5]] } };
    expect(setupProblems(bad, u).map((p) => p.message)).toContain('Rebound force at 520 mm/s must be 0 N or more');
  });

  it('shows fields that appear or disappear, such as an added curve point or a removed stop', () => {
    const next = Setup.parse({
      ...base,
      damper: { ...base.damper, compression: [...base.damper.compression, [1, 480]] },
      bumpStop: undefined,
      stroke: { compression: 0.085, extension: 0.095 },
    });
    const rows = diffSetups(base, next);
    const byLabel = Object.fromEntries(rows.map((r) => [r.label, [r.before, r.after]]));
    expect(byLabel['Compression point 3, speed']).toEqual([undefined, 1]);
    expect(byLabel['Bump stop clearance']).toEqual([0.055, undefined]);
    expect(byLabel['Bump stop coefficient c3']).toEqual([4e7, undefined]);
    expect(byLabel['Stroke, compression']).toEqual([undefined, 0.085]);
  });

  it('flattens tuples by index', () => {
    expect(flatten({ a: [[1, 2]], b: 'x' })).toEqual(
      new Map<string, number | string>([
        ['a.0.0', 1],
        ['a.0.1', 2],
        ['b', 'x'],
      ]),
    );
  });
});
