import { describe, expect, it } from 'vitest';
import { StoredSpectra, StoredTraces } from '../schemas/run-record.ts';
import type { TraceColumns } from '../sim/trace.ts';
import { decodeColumns, encodeColumns } from './float-codec.ts';
import { fromStoredSpectra, fromStoredTraces, toStoredSpectra, toStoredTraces } from './stored-run.ts';

describe('float codec', () => {
  it('round-trips columns to Float32 precision', () => {
    const a = [0, 1.5, -2.25, 123456.789, 1e-7];
    const b = [3, 2, 1, 0, -1];
    const decoded = decodeColumns(encodeColumns([a, b]), 2, 5);
    expect(decoded.ok).toBe(true);
    if (!decoded.ok) return;
    a.forEach((v, i) => expect(decoded.columns[0][i]).toBeCloseTo(v, Math.abs(v) > 1 ? 1 : 6));
    expect(Array.from(decoded.columns[1])).toEqual(b);
  });

  it('reports a text of the wrong size as a failure', () => {
    const text = encodeColumns([[1, 2, 3]]);
    const decoded = decodeColumns(text, 2, 3);
    expect(decoded).toMatchObject({ ok: false });
    if (!decoded.ok) expect(decoded.reason).toMatch(/expected 24/);
  });
});

function blankTrace(n: number, dt: number): TraceColumns {
  const col = () => new Float64Array(n);
  return { dt, bodyAccel: col(), travel: col(), tyreLoad: col(), damperVelocity: col(), damperForce: col(), bumpStopForce: col(), reboundStopForce: col(), road: col() };
}

describe('stored traces', () => {
  it('thins a 600 s run to the cap, passes the schema and decodes to named columns', () => {
    const n = 300_000;
    const trace = blankTrace(n, 0.002);
    for (let i = 0; i < n; i++) {
      trace.bodyAccel[i] = Math.sin(i / 50);
      trace.tyreLoad[i] = 3400 + 100 * Math.cos(i / 7);
    }
    trace.travel[123_456] = 0.07;
    const stored = toStoredTraces(trace, 2);
    expect(StoredTraces.safeParse(stored).success).toBe(true);
    expect(stored.length).toBe(2000);
    expect(stored.fullLength).toBe(n);
    const back = fromStoredTraces(stored);
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    expect(Math.max(...back.columns.travel)).toBeCloseTo(0.07, 6);
    expect(Math.max(...back.columns.tyreLoad)).toBeCloseTo(3500, 1);
    expect(back.columns.time[1999]).toBeLessThan(600);
    // the load distribution counts every analysed sample of the full run once
    const h = stored.tyreLoadHistogram;
    expect(h.counts.reduce((a, b) => a + b, 0)).toBe(n - 1000);
    expect(h.edges[0]).toBeCloseTo(3300, 6);
    expect(h.edges[h.edges.length - 1]).toBeCloseTo(3500, 6);
  });

  it('averages spectra above the bin cap and keeps their area', () => {
    const n = 10_001;
    const df = 0.01;
    const freq = Float64Array.from({ length: n }, (_, i) => i * df);
    const psd = Float64Array.from({ length: n }, (_, i) => 1 / (1 + i * df));
    const stored = toStoredSpectra({ freq, bodyAccel: psd, travel: psd, tyreLoad: psd }, 1000);
    expect(StoredSpectra.safeParse(stored).success).toBe(true);
    const back = fromStoredSpectra(stored);
    expect(back.ok).toBe(true);
    if (!back.ok) return;
    const group = Math.ceil(n / 1000);
    const areaFull = psd.reduce((s, v) => s + v, 0) * df;
    const areaThin = back.columns.bodyAccel.reduce((s, v) => s + v, 0) * df * group;
    expect(areaThin / areaFull).toBeCloseTo(1, 2);
  });
});
