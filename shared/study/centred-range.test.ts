import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { Setup, type SetupInput } from '../schemas/setup.ts';
import { studyParameterRange, studyParameters } from '../schemas/study.ts';
import { baseValue, centredRange } from './centred-range.ts';
import { sweepValues } from './expand.ts';

const pipit = Setup.parse(JSON.parse(readFileSync(new URL('../../examples/pipit-front.setup.json', import.meta.url), 'utf8')) as SetupInput);

describe('starting ranges centred on the base setup', () => {
  it('a 20.5 N/mm base spring sits inside the spring range, as its middle value', () => {
    const base = Setup.parse({ ...pipit, springRate: 20500 });
    const r = centredRange('springRate', base)!;
    expect(r.from).toBeLessThan(20500);
    expect(r.to).toBeGreaterThan(20500);
    expect(sweepValues({ ...r, spacing: 'linear' })[2]).toBeCloseTo(20500, 6);
  });

  it('every setup parameter: the base value is one of the values tried', () => {
    for (const p of studyParameters) {
      if (p === 'speed') {
        expect(centredRange(p, pipit)).toBeUndefined();
        continue;
      }
      const r = centredRange(p, pipit)!;
      // The Pipit has no top mount (rigid, not a rate of 0) and no controlled damper: those
      // sweeps start from a range of their own, inside the schema's limits.
      if (p === 'mountRate' || p === 'skyGain' || p === 'groundGain' || p === 'controlBlend') {
        expect(r.from, p).toBeGreaterThanOrEqual(studyParameterRange[p].min);
        continue;
      }
      const values = sweepValues({ ...r, spacing: 'linear' });
      expect(values.some((v) => Math.abs(v - baseValue(p, pipit)) <= 1e-9 * Math.max(1, baseValue(p, pipit))), p).toBe(true);
    }
  });
});
