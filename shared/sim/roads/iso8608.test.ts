import { describe, expect, it } from 'vitest';
import { Iso8608Road } from '../../schemas/road.ts';
import { buildRoad } from './index.ts';
import { generateIso8608Profile, isoClassRoughness, isoPsd } from './iso8608.ts';

const road = (extra: object = {}) => Iso8608Road.parse({ kind: 'iso8608', class: 'C', seed: 7, ...extra });

describe('ISO 8608 road generation', () => {
  it('the same seed gives the identical road, another seed a different one', () => {
    const a = generateIso8608Profile(road());
    const b = generateIso8608Profile(road());
    const c = generateIso8608Profile(road({ seed: 8 }));
    expect(Buffer.from(a.z.buffer).equals(Buffer.from(b.z.buffer))).toBe(true);
    let diff = 0;
    for (let i = 0; i < a.z.length; i++) diff = Math.max(diff, Math.abs(a.z[i] - c.z[i]));
    expect(diff).toBeGreaterThan(1e-3);
  });

  it('reports the band it generated, inside the requested one', () => {
    const p = generateIso8608Profile(road());
    // Default band 0.011–2.83 cycle/m on harmonics k/1024 m.
    expect(p.nMin).toBeCloseTo(12 / 1024, 12);
    expect(p.nMax).toBeCloseTo(2897 / 1024, 12);
    expect(p.harmonics).toBe(2897 - 12 + 1);
    expect(p.dx).toBeCloseTo(1024 / 32768, 12);
    const q = generateIso8608Profile(road({ nMin: 0.05, nMax: 1, length: 200 }));
    expect(q.nMin).toBeGreaterThanOrEqual(0.05);
    expect(q.nMax).toBeLessThanOrEqual(1);
  });

  it('its variance equals the integral of the class PSD over the band', () => {
    // ISO 8608 (from memory, docs/model.md §3): Gd(n) = Gd(n0)(n/n0)^−2, n0 = 0.1 cycle/m.
    // ∫ Gd dn from n1 to n2 = Gd(n0)·n0²·(1/n1 − 1/n2); the harmonics sample it every 1/L.
    const p = generateIso8608Profile(road());
    let mean = 0;
    for (const v of p.z) mean += v;
    mean /= p.z.length;
    let variance = 0;
    for (const v of p.z) variance += (v - mean) ** 2;
    variance /= p.z.length;
    const dn = 1 / p.length;
    const expected = isoClassRoughness.C * 0.01 * (1 / (p.nMin - dn / 2) - 1 / (p.nMax + dn / 2));
    expect(variance / expected).toBeGreaterThan(0.99);
    expect(variance / expected).toBeLessThan(1.01);
    expect(isoPsd({ class: 'C' }, 0.1)).toBeCloseTo(256e-6, 15);
  });

  it('the inverse FFT equals the direct sum of harmonics', () => {
    // Small band so the direct sum is cheap: z(x) = Σ Ak cos(2π k x/L + φk).
    const r = road({ nMin: 0.1, nMax: 0.2, length: 100 });
    const p = generateIso8608Profile(r);
    // Recover each harmonic's amplitude from the generated samples by projection.
    for (const k of [10, 15, 20]) {
      let c = 0;
      let s = 0;
      for (let j = 0; j < p.z.length; j++) {
        c += p.z[j] * Math.cos((2 * Math.PI * k * j) / p.z.length);
        s += p.z[j] * Math.sin((2 * Math.PI * k * j) / p.z.length);
      }
      const amp = (2 * Math.hypot(c, s)) / p.z.length;
      const n = k / 100;
      expect(amp).toBeCloseTo(Math.sqrt(2 * isoPsd(r, n) * (1 / 100)), 10);
    }
  });

  it('a footprint scales each harmonic by sin(πnL)/(πnL)', () => {
    const r = road({ nMin: 1, nMax: 2, length: 100 });
    const plain = generateIso8608Profile(r);
    const soft = generateIso8608Profile(r, { footprint: 0.2 });
    const k = 150;
    const proj = (z: Float64Array) => {
      let c = 0;
      let s = 0;
      for (let j = 0; j < z.length; j++) {
        c += z[j] * Math.cos((2 * Math.PI * k * j) / z.length);
        s += z[j] * Math.sin((2 * Math.PI * k * j) / z.length);
      }
      return Math.hypot(c, s);
    };
    const a = Math.PI * 1.5 * 0.2;
    expect(proj(soft.z) / proj(plain.z)).toBeCloseTo(Math.sin(a) / a, 9);
  });

  it('as a time input it starts at zero and its rate is speed × slope', () => {
    const built = buildRoad(road(), 25, 10);
    if (!built.ok) throw new Error(built.reason);
    const out = new Float64Array(2);
    built.road.sample(0, out);
    expect(out[0]).toBe(0);
    const t = 3.21;
    const h = 1e-6;
    built.road.sample(t + h, out);
    const zp = out[0];
    built.road.sample(t - h, out);
    const zm = out[0];
    built.road.sample(t, out);
    expect(out[1]).toBeCloseTo((zp - zm) / (2 * h), 5);
    expect(built.road.summary).toMatchObject({ kind: 'iso8608', seed: 7, distance: 250 });
  });
});
