import { describe, expect, test } from 'vitest';
import { mergeColumns } from './chart-columns.ts';
import { unitTable } from '../../../lib/units/unit-table.ts';
import { knotsText, readKnots, suggestKnots } from './knots.ts';

describe('fit speeds', () => {
  test('reads a typed list and refuses falling or non-positive speeds', () => {
    expect(readKnots('0.05, 0.1;0.3 1')).toEqual({ ok: true, knots: [0.05, 0.1, 0.3, 1] });
    expect(readKnots('0.1, 0.05')).toMatchObject({ ok: false, message: expect.stringMatching(/must rise/) });
    expect(readKnots('0, 0.1')).toMatchObject({ ok: false });
    expect(readKnots('')).toMatchObject({ ok: false });
    // the same list typed in mm/s reads back to the same m/s speeds (1 mm = 0.001 m)
    expect(readKnots('50, 100, 300, 1000', unitTable.damperVelocity['mm/s'])).toEqual({ ok: true, knots: [0.05, 0.1, 0.3, 1] });
    expect(knotsText([0.05, 0.1, 0.3, 1], unitTable.damperVelocity['mm/s'])).toBe('50, 100, 300, 1000');
  });

  test('suggested speeds stay inside the measured range of both directions', () => {
    const pts = (vs: number[]) => vs.map((v) => ({ velocity: v, force: 1000 * v }));
    const knots = suggestKnots({ compression: pts([0.03, 0.1, 0.3, 0.6]), rebound: pts([0.03, 0.1, 0.3, 0.5]) });
    expect(knots.length).toBeGreaterThan(2);
    expect(Math.min(...knots)).toBeGreaterThanOrEqual(0.03);
    expect(Math.max(...knots)).toBeLessThanOrEqual(0.6);
  });
});

describe('mergeColumns', () => {
  test('puts every set on one rising x column with nulls elsewhere', () => {
    expect(mergeColumns([{ x: [1, 3], y: [10, 30] }, { x: [2, 3], y: [20, 31] }])).toEqual([
      [1, 2, 3],
      [10, null, 30],
      [null, 20, 31],
    ]);
  });
});
