import { describe, expect, test } from 'vitest';
import { parseMeasuredCsv } from './measured-csv.ts';

describe('parseMeasuredCsv', () => {
  test('reads units from the header and returns metres', () => {
    const out = parseMeasuredCsv('distance [m],elevation [mm]\n0,1.5\n0.1,-2\n0.2,0\n');
    if (!out.ok) throw new Error(JSON.stringify(out.errors));
    expect(out.points).toEqual([
      [0, 0.0015],
      [0.1, -0.002],
      [0.2, 0],
    ]);
    expect(out.units.elevation).toEqual({ unit: 'mm', source: 'header' });
  });

  test('takes the unit from the options when the header names none, and says so otherwise', () => {
    const out = parseMeasuredCsv('x;z\n0;1,5\n100;2\n', { distanceUnit: 'mm', elevationUnit: 'mm' });
    if (!out.ok) throw new Error(JSON.stringify(out.errors));
    expect(out.points[1]).toEqual([0.1, 0.002]);
    expect(out.points[0][1]).toBeCloseTo(0.0015, 12);
    const plain = parseMeasuredCsv('x,z\n0,1\n1,2\n');
    expect(plain.ok && plain.warnings.map((w) => w.message)).toEqual(["column 'x' names no unit; read as m", "column 'z' names no unit; read as m"]);
  });

  test('a file without a header is read as distance, elevation', () => {
    const out = parseMeasuredCsv('0,0.001\n0.5,0.002\n');
    expect(out.ok && out.hasHeader).toBe(false);
    expect(out.ok && out.points[1]).toEqual([0.5, 0.002]);
  });

  test.each([
    ['text in a number column', 'distance,elevation\n0,0\n0.1,abc\n', 3, /'abc' is not a number/],
    ['a line cut short', 'distance,elevation\n0,0\n0.1\n0.2,0\n', 3, /cut short/],
    ['distance not rising', 'distance,elevation\n0,0\n0.2,0\n0.1,0\n', 4, /does not rise/],
    ['unknown columns', 'time,force\n0,0\n', 1, /columns not recognised/],
    ['an unknown unit', 'distance [ft],elevation\n0,0\n', 1, /unit 'ft'/],
  ])('rejects %s naming the line', (_what, text, line, message) => {
    const out = parseMeasuredCsv(text);
    expect(out.ok).toBe(false);
    if (out.ok) return;
    expect(out.errors[0].line).toBe(line);
    expect(out.errors[0].message).toMatch(message);
  });

  test('enforces the row limit', () => {
    const text = `distance,elevation\n${Array.from({ length: 12 }, (_, i) => `${i},0`).join('\n')}\n`;
    const out = parseMeasuredCsv(text, { maxRows: 10 });
    expect(out.ok).toBe(false);
    expect(!out.ok && out.errors[0].message).toMatch(/more than 10 data rows/);
  });
});
