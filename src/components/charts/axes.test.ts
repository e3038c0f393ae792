import { describe, expect, test } from 'vitest';
import type uPlot from 'uplot';
import { decadesIn, logDecadeRange, logScale, logTickValues } from './axes.ts';
import { axisLabel, formatTick, readChartTheme, seriesColor } from './chart-theme.ts';

describe('log axes', () => {
  test('decadesIn lists the powers of ten inside the range only', () => {
    expect(decadesIn(0.011, 10)).toEqual([0.1, 1, 10]);
    expect(decadesIn(0.5, 0.9)).toEqual([]);
    expect(decadesIn(-1, 10)).toEqual([]);
  });

  test('logScale is a base-10 log distribution and not a time axis', () => {
    expect(logScale()).toMatchObject({ time: false, distr: 3, log: 10 });
  });

  test('log tick labels keep decades always and 2/5 steps only over few decades', () => {
    const u = {} as uPlot;
    expect(logTickValues(u, [1, 2, 3, 5, 10])).toEqual(['1', '2', '', '5', '10']);
    const wide = [0.01, 0.02, 0.1, 1, 10, 20, 100];
    expect(logTickValues(u, wide)).toEqual(['0.01', '', '0.1', '1', '10', '', '100']);
  });

  test('one notation per log axis: powers of ten throughout once any label leaves 0.001…10 000', () => {
    const u = {} as uPlot;
    expect(logTickValues(u, [1e-5, 1e-4, 1e-3, 1e-2])).toEqual(['10⁻⁵', '10⁻⁴', '10⁻³', '10⁻²']);
    expect(logTickValues(u, [1e3, 1e4, 1e5])).toEqual(['10³', '10⁴', '10⁵']);
    expect(logTickValues(u, [1e-6, 2e-6, 5e-6, 1e-5])).toEqual(['10⁻⁶', '2×10⁻⁶', '5×10⁻⁶', '10⁻⁵']);
  });

  test('splits uPlot blanked (null) get an empty label instead of throwing', () => {
    const u = {} as uPlot;
    expect(logTickValues(u, [0.1, null, 1, null, 10])).toEqual(['0.1', '', '1', '', '10']);
    expect(formatTick(null)).toBe('');
  });
});

describe('logDecadeRange', () => {
  test('whole decades around the data, cut to the decades asked for below the top', () => {
    const [a, b] = logDecadeRange([3e-4, 2e-2, 0, -1]);
    expect(a).toBeCloseTo(1e-4, 15);
    expect(b).toBeCloseTo(0.1, 15);
    const [lo, hi] = logDecadeRange([1.5e-27, 0.0097], 8);
    expect(hi).toBeCloseTo(0.01, 12);
    expect(lo).toBeCloseTo(1e-10, 20);
  });
});

describe('chart theme', () => {
  test('reads tokens through the reader and falls back when a token is missing', () => {
    const theme = readChartTheme((name) => (name === '--color-series-2' ? '#123456' : ''));
    expect(theme.series[1]).toBe('#123456');
    expect(theme.series[0]).toBe('#0072b2');
    expect(theme.series).toHaveLength(8);
  });

  test('series colours wrap after eight', () => {
    const theme = readChartTheme(() => '');
    expect(seriesColor(theme, 8)).toBe(seriesColor(theme, 0));
    expect(seriesColor(theme, 3)).not.toBe(seriesColor(theme, 2));
  });

  test('labels carry their unit and ticks use a true minus', () => {
    expect(axisLabel('Velocity', 'm/s')).toBe('Velocity [m/s]');
    expect(axisLabel('Count')).toBe('Count');
    expect(formatTick(-1500)).toBe('−1500');
    expect(formatTick(0.123456)).toBe('0.123');
    expect(formatTick(2e-5)).toBe('2e−5');
  });
});
