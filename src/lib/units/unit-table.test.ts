import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { DEFAULT_FIT_MAX_SPEED, leastSquaresWords } from '../../../shared/sim/damper-equivalent.ts';
import { convertShown, listText, siFromShown, speedsInWords, unitTable, type QuantityKind } from './unit-table.ts';

describe('display unit table', () => {
  it('gives the exact defining factors (NIST SP 811, appendix B.8): 1 in = 0.0254 m, 1 mph = 0.44704 m/s, 1 lbf/in = 175.126835 N/m', () => {
    expect(unitTable.length.in.toSI(1)).toBe(0.0254);
    expect(unitTable.damperVelocity['in/s'].toSI(1)).toBe(0.0254);
    expect(unitTable.speed.mph.toSI(1)).toBeCloseTo(0.44704, 15);
    // NIST SP 811 lists pound-force per inch as 1.751 268 E+02 N/m; the exact value is 4.4482216152605 / 0.0254.
    expect(unitTable.rate['lbf/in'].toSI(1)).toBeCloseTo(175.126835, 6);
  });

  it('converts the metric units by their SI prefixes and 1 km/h = 1/3.6 m/s (SI brochure)', () => {
    expect(unitTable.damperVelocity['mm/s'].fromSI(0.25)).toBe(250);
    expect(unitTable.rate['N/mm'].fromSI(20500)).toBe(20.5);
    expect(unitTable.length.mm.fromSI(0.085)).toBe(85);
    expect(unitTable.speed['km/h'].fromSI(25)).toBe(90);
    expect(convertShown('speed', 60, 'km/h', 'm/s')).toBeCloseTo(16.6667, 4);
    expect(convertShown('speed', 100, 'km/h', 'mph')).toBeCloseTo(62.1371, 4);
    expect(convertShown('damperVelocity', 10, 'in/s', 'mm/s')).toBeCloseTo(254, 12);
  });

  it('round-trips any value through every unit of every kind', () => {
    const kinds = Object.keys(unitTable) as QuantityKind[];
    fc.assert(
      fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), (si) => {
        for (const kind of kinds) {
          for (const unit of Object.values(unitTable[kind])) {
            const back = unit.toSI(unit.fromSI(si));
            expect(Math.abs(back - si)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(si)));
          }
        }
      }),
    );
  });

  it('labels each unit with the symbol it converts to', () => {
    for (const kind of Object.keys(unitTable) as QuantityKind[]) {
      for (const [name, unit] of Object.entries(unitTable[kind])) expect(unit.symbol).toBe(name);
    }
  });
});

describe('siFromShown', () => {
  it('reads back a shown imperial figure as the round SI value it came from, and keeps typed metric digits', () => {
    const inPerS = unitTable.damperVelocity['in/s'];
    const shown = Number(inPerS.fromSI(0.05).toPrecision(6));
    expect(shown).toBe(1.9685);
    expect(siFromShown(inPerS, shown)).toBe(0.05);
    expect(siFromShown(unitTable.damperVelocity['mm/s'], 123.4567)).toBeCloseTo(0.1234567, 12);
    expect(siFromShown(unitTable.damperVelocity['mm/s'], 50)).toBe(0.05);
  });
});

describe('the equivalent-damping range in words', () => {
  it('says the fit range in the reader\'s damper-velocity unit: 0.3 m/s = 300 mm/s = 11.81 in/s (0.3 / 0.0254, NIST SP 811)', () => {
    expect(leastSquaresWords(listText([DEFAULT_FIT_MAX_SPEED], unitTable.damperVelocity['m/s']))).toContain('over 0–0.3 m/s piston speed');
    expect(leastSquaresWords(listText([DEFAULT_FIT_MAX_SPEED], unitTable.damperVelocity['mm/s']))).toContain('over 0–300 mm/s piston speed');
    expect(leastSquaresWords(listText([DEFAULT_FIT_MAX_SPEED], unitTable.damperVelocity['in/s']))).toContain('over 0–11.81 in/s piston speed');
  });

  it('re-says the speeds of a stored SI sentence in the chosen unit and leaves other words alone', () => {
    const stored = 'secant force/speed at 0.1 m/s piston speed, mean of compression and rebound';
    expect(speedsInWords(stored, unitTable.damperVelocity['mm/s'])).toBe('secant force/speed at 100 mm/s piston speed, mean of compression and rebound');
    expect(speedsInWords(leastSquaresWords('0.3 m/s'), unitTable.damperVelocity['in/s'])).toContain('over 0–11.81 in/s piston speed');
    expect(speedsInWords('2.5 m/s² body acceleration', unitTable.damperVelocity['mm/s'])).toBe('2.5 m/s² body acceleration');
  });
});
