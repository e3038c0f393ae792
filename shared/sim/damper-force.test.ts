import { describe, expect, it } from 'vitest';
import { Damper, DamperCurve } from '../schemas/setup.ts';
import { curveForce, damperForce } from './damper-force.ts';

const damper = Damper.parse({
  compression: [[0.05, 100], [0.1, 150], [0.3, 250]],
  rebound: [[0, 0], [0.05, 200], [0.2, 500]],
});

// Expected values are linear interpolation worked by hand from the tables above.
describe('damper table', () => {
  it('interpolates linearly between points, from an implied origin', () => {
    expect(curveForce(damper.compression, 0.025)).toBeCloseTo(50, 12);
    expect(curveForce(damper.compression, 0.075)).toBeCloseTo(125, 12);
    expect(curveForce(damper.compression, 0.2)).toBeCloseTo(200, 12);
    expect(curveForce(damper.rebound, 0.1)).toBeCloseTo(300, 12);
  });

  it('extrapolates past the last point with the last slope', () => {
    // Last compression segment: 100 N over 0.2 m/s = 500 N·s/m.
    expect(curveForce(damper.compression, 0.5)).toBeCloseTo(350, 12);
    // Last rebound segment: 300 N over 0.15 m/s = 2000 N·s/m.
    expect(curveForce(damper.rebound, 0.3)).toBeCloseTo(700, 12);
  });

  it('a single point is a straight line through the origin', () => {
    const c = DamperCurve.parse([[0.5, 1000]]);
    expect(curveForce(c, 0.1)).toBeCloseTo(200, 12);
    expect(curveForce(c, 2)).toBeCloseTo(4000, 12);
  });

  it('signs force with velocity: compression positive, rebound negative', () => {
    expect(damperForce(damper, 0.1)).toBeCloseTo(150, 12);
    expect(damperForce(damper, -0.1)).toBeCloseTo(-300, 12);
    expect(damperForce(damper, 0)).toBe(0);
  });
});
