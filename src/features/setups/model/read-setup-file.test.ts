import { describe, expect, it } from 'vitest';
import { checkSetupText } from './read-setup-file.ts';

const good = {
  name: 'Skerry rear',
  sprungMass: 250,
  unsprungMass: 33,
  springRate: 59500,
  tyreRate: 235000,
  damper: { compression: [[0.1, 430]], rebound: [[0.1, 860]] },
};

describe('checkSetupText', () => {
  it('accepts a setup file and fills the defaults', () => {
    const out = checkSetupText(JSON.stringify(good));
    expect(out.ok && out.setup.motionRatio).toBe(1);
  });

  it('names the place of each problem inside the file', () => {
    const out = checkSetupText(JSON.stringify({ ...good, sprungMass: -1, damper: { ...good.damper, rebound: [[0.1, 860], [0.05, 900]] } }));
    expect(out.ok).toBe(false);
    if (!out.ok) {
      expect(out.issues.map((i) => i.path)).toEqual(expect.arrayContaining(['sprungMass', 'damper.rebound.1.0']));
      // in words, with the unit, as the form says it
      expect(out.issues.map((i) => i.message)).toContain('Sprung mass must be above 0 kg');
    }
  });

  it('says when the file is not JSON at all', () => {
    const out = checkSetupText('name,sprungMass\nPipit,310');
    expect(out.ok).toBe(false);
    if (!out.ok) expect(out.message).toMatch(/not JSON/);
  });
});
