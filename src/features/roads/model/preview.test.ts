import { describe, expect, test } from 'vitest';
import { Road } from '../../../../shared/schemas/road.ts';
import { roadPreview } from './preview.ts';

describe('roadPreview', () => {
  test('a long ISO road is thinned to at most 4000 points keeping its extremes', () => {
    const out = roadPreview(Road.parse({ kind: 'iso8608', class: 'D', seed: 5 }), null);
    if (!out.ok) throw new Error(out.reason);
    expect(out.profile.x.length).toBeLessThanOrEqual(4000);
    for (let i = 1; i < out.profile.x.length; i++) expect(out.profile.x[i]).toBeGreaterThan(out.profile.x[i - 1]);
    expect(out.psd).not.toBeNull();
    expect(out.psd?.n[0]).toBeGreaterThan(0);
  });

  test('a bump has a profile in mm and no spectrum', () => {
    const out = roadPreview(Road.parse({ kind: 'bump', height: 0.05, length: 1, at: 3 }), null);
    if (!out.ok) throw new Error(out.reason);
    expect(Math.max(...out.profile.z)).toBeCloseTo(50, 1);
    expect(out.psd).toBeNull();
  });

  test('the fitted line is drawn only inside its band', () => {
    const iso = { className: 'C' as const, gdn0: 256e-6, waviness: 2, nMin: 0.05, nMax: 1 };
    const out = roadPreview(Road.parse({ kind: 'iso8608', class: 'C', seed: 5 }), iso);
    if (!out.ok || !out.psd?.fit) throw new Error('expected a fitted line');
    const { n, fit } = out.psd;
    for (let i = 0; i < n.length; i++) {
      if (n[i] < 0.05 || n[i] > 1) expect(Number.isNaN(fit[i])).toBe(true);
      else expect(fit[i]).toBeCloseTo(256e-6 * (n[i] / 0.1) ** -2, 12);
    }
  });
});
