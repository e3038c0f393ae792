import { describe, expect, it } from 'vitest';
import { DamperCurve, GasCharge } from '../schemas/setup.ts';
import { TargetSheetContent } from '../schemas/target-sheet.ts';
import { defaultReferenceSpeeds, targetPointsFromCurve, targetSheetContentFromSetup } from './reference-speeds.ts';

const compression = DamperCurve.parse([[0.05, 250], [0.1, 350], [0.3, 750], [1.0, 1310]]);
const rebound = DamperCurve.parse([[0.05, 600], [0.1, 825], [0.3, 1725], [1.0, 2985]]);

describe('reference speeds', () => {
  it('reads forces off the curve at the default spread, rounded to 1 N, with the default band', () => {
    const pts = targetPointsFromCurve(compression);
    expect(pts.map((p) => p.velocity)).toEqual([...defaultReferenceSpeeds]);
    // 0.025: half of 250 on the bleed line; 0.2: halfway 350→750; 0.5: 750 + 560·(0.2/0.7) = 910
    expect(pts.map((p) => p.force)).toEqual([125, 250, 350, 550, 750, 910, 1310]);
    expect(pts[0]).toMatchObject({ tolPct: 10, floorN: 20 });
  });

  it('sorts chosen speeds and uses the chosen band', () => {
    const pts = targetPointsFromCurve(rebound, [0.3, 0.1], { tolPct: 7.5, floorN: 30 });
    expect(pts).toEqual([
      { velocity: 0.1, force: 825, tolPct: 7.5, floorN: 30 },
      { velocity: 0.3, force: 1725, tolPct: 7.5, floorN: 30 },
    ]);
  });

  it('builds a valid sheet body from a setup, gas force included', () => {
    const c = targetSheetContentFromSetup({ damper: { compression, rebound, gas: GasCharge.parse({ force: 180 }) } });
    expect(TargetSheetContent.safeParse(c).success).toBe(true);
    expect(c.gasForce).toBe(180);
    expect(c.rebound[2].force).toBe(825);
  });
});
