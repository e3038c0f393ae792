import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { newSetupTemplate } from './setup-template.ts';
import { setupProblems } from './setup-problems.ts';

/** The validator's own wording, which must never reach the page. */
const rawWording = /expected|Too small|Too big|Invalid input|received|>=|<=/;

const base = newSetupTemplate('Message check');
const withDamper = (direction: 'compression' | 'rebound', row: number, cell: 0 | 1, value: number) => {
  const curve = base.damper[direction].map((p) => [...p] as [number, number]);
  curve[row][cell] = value;
  return { ...base, damper: { ...base.damper, [direction]: curve } };
};

describe('validation messages in plain words', () => {
  test('a valid setup has no problems', () => {
    expect(setupProblems(base)).toEqual([]);
  });

  test('a negative damper force names the direction, the speed of its row and the unit', () => {
    const speed = base.damper.rebound[0][0];
    const problems = setupProblems(withDamper('rebound', 0, 1, -112));
    expect(problems.map((p) => p.message)).toContain(`Rebound force at ${Number(speed.toPrecision(4))} m/s must be 0 N or more`);
  });

  test.each([
    [{ sprungMass: 0 }, 'Sprung mass must be above 0 kg'],
    [{ sprungMass: 6000 }, 'Sprung mass must be 5 000 kg or less'],
    // the form shows spring rates in N/mm: 1e7 N/m is 10 000 N/mm
    [{ springRate: 2e7 }, 'Spring rate must be 10 000 N/mm or less'],
    [{ motionRatio: 9 }, 'Motion ratio must be 3 or less'],
    [{ unsprungMass: Number.NaN }, 'Unsprung mass must be a number in kg'],
    [{ tyreDamping: -1 }, 'Tyre damping must be 0 N·s/m or more'],
    [{ name: '' }, 'Name cannot be empty'],
  ])('%o reads "%s"', (change, message) => {
    expect(setupProblems({ ...base, ...change }).map((p) => p.message)).toContain(message);
  });

  test('an empty table and a missing field are said in words', () => {
    const { sprungMass: _dropped, ...noMass } = base;
    expect(setupProblems(noMass).map((p) => p.message)).toContain('Sprung mass is required');
    expect(setupProblems({ ...base, damper: { ...base.damper, compression: [] } }).map((p) => p.message)).toContain('Compression table needs at least 1 point');
  });

  test('no message of any broken setup carries the validator wording', () => {
    const numericPaths = ['sprungMass', 'unsprungMass', 'springRate', 'motionRatio', 'tyreRate', 'tyreDamping', 'tyreFootprint'] as const;
    fc.assert(
      fc.property(
        fc.constantFrom(...numericPaths),
        fc.oneof(fc.double({ noNaN: false }), fc.constant(-1), fc.constant(0), fc.constant(1e12)),
        fc.constantFrom('compression' as const, 'rebound' as const),
        fc.nat(3),
        fc.constantFrom(0 as const, 1 as const),
        fc.oneof(fc.constant(-5), fc.constant(Number.NaN), fc.constant(1e9), fc.double()),
        (field, value, direction, row, cell, cellValue) => {
          const broken = { ...withDamper(direction, row, cell, cellValue), [field]: value };
          for (const p of setupProblems(broken)) {
            expect(p.message).not.toMatch(rawWording);
            expect(p.message.length).toBeGreaterThan(p.label.length);
          }
        },
      ),
      { numRuns: 300 },
    );
  });
});
