import { describe, expect, it } from 'vitest';
import { thinColumns } from './thin-trace.ts';

describe('thinColumns', () => {
  it('keeps short traces sample for sample on their own time grid', () => {
    const a = [1, -2, 3, 0.5];
    const out = thinColumns([a], 0.01, 10);
    expect(out.method).toBe('all-samples');
    expect(Array.from(out.columns[0])).toEqual(a);
    expect(out.time[3]).toBeCloseTo(0.03, 12);
  });

  it('keeps every extreme of a long trace and never more than the cap', () => {
    const n = 100_003;
    const dt = 0.002;
    const x = new Float64Array(n);
    for (let i = 0; i < n; i++) x[i] = Math.sin(2 * Math.PI * 12 * i * dt) * (1 + i / n);
    x[54_321] = 9; // an isolated spike a stride would miss
    x[77_777] = -7;
    const out = thinColumns([x], dt, 2000);
    expect(out.method).toBe('bucket-extremes');
    expect(out.columns[0].length).toBe(2000);
    expect(out.time.length).toBe(2000);
    expect(Math.max(...out.columns[0])).toBe(9);
    expect(Math.min(...out.columns[0])).toBe(-7);
    // time rises and spans the run
    for (let i = 1; i < out.time.length; i++) expect(out.time[i]).toBeGreaterThan(out.time[i - 1]);
    expect(out.time[out.time.length - 1]).toBeLessThan(n * dt);
  });

  it('puts each bucket’s two extremes in the order they happened', () => {
    const x = new Float64Array(400);
    x[10] = 5; // max early in the first bucket
    x[90] = -5; // min later
    const out = thinColumns([x], 1, 8); // four buckets of 100
    expect(out.columns[0][0]).toBe(5);
    expect(out.columns[0][1]).toBe(-5);
  });

  it('rejects an odd cap as a caller bug', () => {
    expect(() => thinColumns([[1, 2, 3]], 1, 5)).toThrow(/even/);
  });
});
