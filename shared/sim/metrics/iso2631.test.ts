import { describe, expect, it } from 'vitest';
import { comfortGrading, rmsAndVdv, vdv, wkDigitalResponse, wkFilter, wkResponse } from './iso2631.ts';

describe('Wk digital filter against the analog weighting', () => {
  const rel = (f: number, fs: number) => Math.abs(wkDigitalResponse(f, 1 / fs) / wkResponse(f) - 1);
  const grid = (lo: number, hi: number) => Array.from({ length: 200 }, (_, i) => lo * (hi / lo) ** (i / 199));

  it('stays within 0.5 % up to 20 Hz and 4 % up to 50 Hz at 400 Hz sampling', () => {
    expect(Math.max(...grid(0.1, 20).map((f) => rel(f, 400)))).toBeLessThan(0.005);
    expect(Math.max(...grid(20, 50).map((f) => rel(f, 400)))).toBeLessThan(0.04);
  });

  it('stays within 0.6 % up to 50 Hz at 1 kHz sampling', () => {
    expect(Math.max(...grid(0.1, 50).map((f) => rel(f, 1000)))).toBeLessThan(0.006);
  });

  it('blocks a constant acceleration (high-pass)', () => {
    const y = wkFilter(new Float64Array(4000).fill(9.81), 1 / 400);
    expect(Math.abs(y[3999])).toBeLessThan(1e-3);
  });

  it('filters in place when given the input as output', () => {
    const x = Float64Array.from({ length: 800 }, (_, i) => Math.sin(i / 20));
    const copy = wkFilter(x, 1 / 400);
    wkFilter(x, 1 / 400, x);
    expect(Array.from(x)).toEqual(Array.from(copy));
  });
});

describe('vibration dose value', () => {
  it('equals A·(3T/8)^¼ for a sine of amplitude A over whole periods', () => {
    const dt = 1 / 1000;
    const T = 10;
    const A = 1.7;
    const x = Float64Array.from({ length: T / dt }, (_, i) => A * Math.sin(2 * Math.PI * 2 * i * dt));
    expect(vdv(x, dt)).toBeCloseTo(A * ((3 * T) / 8) ** 0.25, 6);
  });

  it('rmsAndVdv matches the separate RMS and VDV', () => {
    const x = Float64Array.from({ length: 500 }, (_, i) => Math.sin(i / 7) + 0.2 * Math.cos(i / 3));
    const both = rmsAndVdv(x, 0.01, 50);
    expect(both.vdv).toBeCloseTo(vdv(x, 0.01, 50), 12);
    let s = 0;
    for (let i = 50; i < 500; i++) s += x[i] * x[i];
    expect(both.rms).toBeCloseTo(Math.sqrt(s / 450), 12);
  });

  it('ignores samples before `from`', () => {
    const x = new Float64Array(100).fill(1);
    x.fill(50, 0, 10);
    expect(vdv(x, 0.01, 10)).toBeCloseTo(0.9 ** 0.25, 12);
  });
});

describe('comfort grading (ISO 2631-1 Annex C bands, from memory)', () => {
  it.each([
    [0.1, ['not uncomfortable'], 'not uncomfortable'],
    [0.4, ['a little uncomfortable'], 'a little uncomfortable'],
    [0.55, ['a little uncomfortable', 'fairly uncomfortable'], 'a little uncomfortable'],
    [0.62, ['a little uncomfortable', 'fairly uncomfortable'], 'fairly uncomfortable'],
    [0.9, ['fairly uncomfortable', 'uncomfortable'], 'uncomfortable'],
    [1.35, ['uncomfortable', 'very uncomfortable'], 'uncomfortable'],
    [1.5, ['uncomfortable', 'very uncomfortable'], 'very uncomfortable'],
    [2.2, ['very uncomfortable', 'extremely uncomfortable'], 'very uncomfortable'],
    [4, ['extremely uncomfortable'], 'extremely uncomfortable'],
  ])('aw = %f m/s² matches %j, primary %s', (aw, bands, primary) => {
    expect(comfortGrading(aw)).toEqual({ bands, primary });
  });

  it('counts a shared edge in both bands', () => {
    expect(comfortGrading(0.315).bands).toEqual(['not uncomfortable', 'a little uncomfortable']);
  });

  it('throws on a value that is not a non-negative number', () => {
    expect(() => comfortGrading(Number.NaN)).toThrow(/aw/);
    expect(() => comfortGrading(-1)).toThrow(/aw/);
  });
});
