import { describe, expect, it } from 'vitest';
import { buildInlineRoad, initialValues, inlineKinds } from './inline-road.ts';

describe('inline roads', () => {
  it('turns every kind’s starting values into a valid SI road', () => {
    for (const { kind } of inlineKinds) {
      const out = buildInlineRoad(kind, initialValues(kind), 'C');
      expect(out.ok, kind).toBe(true);
    }
  });

  it('converts millimetres to metres', () => {
    const out = buildInlineRoad('bump', { height: '60', length: '0.8', at: '20' }, 'C');
    expect(out).toMatchObject({ ok: true, road: { kind: 'bump', height: 0.06, length: 0.8, at: 20 } });
  });

  it('names the field at fault', () => {
    expect(buildInlineRoad('sine', { amplitude: 'ten', wavelength: '8' }, 'C')).toEqual({ ok: false, errors: { amplitude: 'Enter a number' } });
    expect(buildInlineRoad('iso8608', { seed: '1.5' }, 'C')).toEqual({ ok: false, errors: { seed: 'Enter a whole number' } });
    const negative = buildInlineRoad('sine', { amplitude: '-5', wavelength: '8' }, 'C');
    expect(negative.ok).toBe(false);
    if (!negative.ok) expect(Object.keys(negative.errors)).toEqual(['amplitude']);
  });
});
