import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup } from '../../schemas/setup.ts';
import { runCorner } from '../run-corner.ts';
import { envelopedProfile } from './envelope.ts';
import { halfSine, ramp } from './event-shape.ts';

// The wheel-centre path of a rigid circle of radius R over an edge of height h:
// lift(d) = h − (R − √(R² − d²)) for a centre d before the edge, from d = √(2Rh − h²)
// (plane geometry of a circle meeting a corner; the first check of tyre enveloping named in
// vehicle-dynamics texts, from memory).

const out = new Float64Array(2);
const at = (p: ReturnType<typeof envelopedProfile>, x: number) => (p.at(x, out), out[0]);

describe('tyre enveloping over event roads', () => {
  const R = 0.3;
  const h = 0.05;
  const edge = 5;
  const step = envelopedProfile(ramp(h, 1e-4, edge), R);

  it('follows h − (R − √(R² − d²)) before a sharp step, within 0.2 mm', () => {
    const reach = Math.sqrt(2 * R * h - h * h);
    expect(at(step, edge - reach - 0.01)).toBeCloseTo(0, 6);
    for (const d of [0.9 * reach, 0.6 * reach, 0.3 * reach, 0.05]) {
      expect(Math.abs(at(step, edge - d) - (h - (R - Math.sqrt(R * R - d * d))))).toBeLessThan(2e-4);
    }
    expect(at(step, edge + 0.01)).toBeCloseTo(h, 4);
    expect(at(step, edge + 2)).toBeCloseTo(h, 9);
  });

  it('bridges part of a pothole shorter than the tyre, and follows a long gentle bump', () => {
    const pothole = envelopedProfile(halfSine(-0.04, 0.2, 3), R);
    // the circle rests on the pothole's rims: its lowest point at the middle is the chord sag
    // of 0.1 m each side, R − √(R² − 0.1²) = 17.2 mm, less than the 40 mm depth
    expect(at(pothole, 3.1)).toBeCloseTo(-(R - Math.sqrt(R * R - 0.01)), 3);
    const long = envelopedProfile(halfSine(0.05, 10, 2), R);
    // radius of curvature at the crest 2L²/(π²·h) ≈ 405 m ≫ R: the tyre follows the road
    expect(at(long, 7)).toBeCloseTo(0.05, 4);
  });

  it('softens a sharp kerb for the corner: a lower body acceleration peak than point contact', () => {
    const front = Setup.parse(JSON.parse(readFileSync(new URL('../../../examples/pipit-front.setup.json', import.meta.url), 'utf8')));
    const road = { kind: 'kerb' as const, name: 'kerb', height: 0.05, rampLength: 0.005, at: 2 };
    const point = runCorner({ setup: { ...front, tyreFootprint: undefined }, road, speed: 8, duration: 2 });
    const rolled = runCorner({ setup: { ...front, tyreFootprint: undefined, tyreRadius: 0.31 }, road, speed: 8, duration: 2 });
    if (!point.ok || !rolled.ok) throw new Error('run failed');
    expect(rolled.result.metrics.tyreLoadRms).toBeLessThan(point.result.metrics.tyreLoadRms);
    expect(rolled.result.metrics.bodyAccelPeak).toBeLessThan(point.result.metrics.bodyAccelPeak);
  });
});
