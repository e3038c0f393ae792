import { readFileSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { fitDrive, GOOD_FIT } from '../../shared/drive/fit-drive.ts';
import { syntheticDrive, syntheticProfile } from '../../shared/drive/synthetic-drive.ts';
import { Setup } from '../../shared/schemas/setup.ts';

// Synthetic drives: the corner with known parameters driven over an invented ISO 8608 class C
// profile at a varying speed by the reference integrator (odex at 1e-8), 5 % Gaussian noise on
// every signal; the fit starts from the example setup, with its own integrator (rk4).
const base = Setup.parse(JSON.parse(readFileSync(new URL('../../examples/pipit-front.setup.json', import.meta.url), 'utf8')));
const truth = Setup.parse({
  ...base,
  springRate: base.springRate * 1.1,
  unsprungMass: base.unsprungMass * 0.9,
  damper: { ...base.damper, rebound: base.damper.rebound.map(([v, f]) => [v, f * 0.85]) },
});
const road = syntheticProfile('check lane', 'C', 7, 512);
const drive = syntheticDrive({ setup: truth, road, duration: 12, rate: 100, speed: 18, speedSwing: 3, noise: 0.05, seed: 1 });
if (!drive.ok) throw new Error(drive.reason);
const expected = { unsprungMass: truth.unsprungMass, springRate: truth.springRate, compressionScale: 1, reboundScale: 0.85 };

describe('drive fit against synthetic drives', () => {
  it('fits known parameters back within 3 % and inside twice their stated 95 % bounds', () => {
    const fit = fitDrive({ setup: base, data: drive.data, road: { kind: 'profile', road }, parameters: ['unsprungMass', 'springRate', 'compressionScale', 'reboundScale'] });
    if (!fit.ok) throw new Error(fit.reason);
    for (const p of fit.parameters) {
      const want = expected[p.key as keyof typeof expected];
      expect(Math.abs(p.value / want - 1), p.key).toBeLessThan(0.03);
      expect(p.halfWidth, p.key).not.toBeNull();
      // Bounds from the Jacobian (s²(JᵀJ)⁻¹): with white noise the truth sits inside 2× the 95 % half-width.
      expect(Math.abs(p.value - want), p.key).toBeLessThan(2 * (p.halfWidth as number));
    }
    // Least squares leaves the noise: the normalised error at the optimum is the 5 % that was added.
    for (const c of fit.channels) {
      expect(c.error, c.channel).toBeGreaterThan(0.04);
      expect(c.error, c.channel).toBeLessThan(0.06);
      expect(c.error, c.channel).toBeLessThan(c.startError);
      expect(c.coherence, c.channel).toBeGreaterThan(0.95);
    }
    expect(fit.verdict.good).toBe(true);
  });

  it('reports a drive fitted over the wrong road as a poor fit', () => {
    const other = syntheticProfile('another lane', 'C', 8, 512);
    const fit = fitDrive({ setup: base, data: drive.data, road: { kind: 'profile', road: other }, parameters: ['springRate', 'reboundScale'] });
    if (!fit.ok) throw new Error(fit.reason);
    expect(fit.verdict.good).toBe(false);
    for (const c of fit.channels) {
      expect(c.error, c.channel).toBeGreaterThan(GOOD_FIT.maxNormalisedError);
      expect(c.coherence, c.channel).toBeLessThan(GOOD_FIT.minCoherence);
    }
  });

  it('fits the suspension against a road estimated from the wheel signals, within its wider bounds', () => {
    // The estimate takes the starting setup's unsprung mass (10 % off here) and the noisy
    // accelerations, so it is a rougher road than the true one: the spring still comes back
    // within 3 %, the rebound scale only within the wider bounds the fit states.
    const fit = fitDrive({ setup: base, data: drive.data, road: { kind: 'estimated' }, parameters: ['springRate', 'reboundScale'], channels: ['wheelTravel'] });
    if (!fit.ok) throw new Error(fit.reason);
    const [spring, rebound] = fit.parameters;
    expect(Math.abs(spring.value / truth.springRate - 1)).toBeLessThan(0.03);
    expect(Math.abs(rebound.value - 0.85)).toBeLessThan(rebound.halfWidth as number);
    expect(fit.roadMethod).toMatch(/estimated/);
  });

  it('refuses parameter sets the drive cannot tell apart', () => {
    const all = fitDrive({ setup: base, data: drive.data, road: { kind: 'profile', road }, parameters: ['sprungMass', 'unsprungMass', 'springRate', 'tyreRate', 'compressionScale', 'reboundScale'] });
    expect(all.ok === false && all.reason).toMatch(/keep at least one fixed/);
    const circular = fitDrive({ setup: base, data: drive.data, road: { kind: 'estimated' }, parameters: ['tyreRate'] });
    expect(circular.ok === false && circular.reason).toMatch(/estimated road/);
  });
});
