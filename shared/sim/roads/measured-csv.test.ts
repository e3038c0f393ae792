import { describe, expect, it } from 'vitest';
import { MeasuredRoad } from '../../schemas/road.ts';
import { parseMeasuredCsv } from './measured-csv.ts';

const ok = (text: string, opts = {}) => {
  const r = parseMeasuredCsv(text, opts);
  if (!r.ok) throw new Error(r.reason);
  return r.profile;
};
const err = (text: string, opts = {}) => {
  const r = parseMeasuredCsv(text, opts);
  if (r.ok) throw new Error('expected a failure');
  return r;
};

describe('measured profile CSV', () => {
  it('reads units from the header and converts to metres', () => {
    const p = ok('distance_m,elevation_mm\n0,1.5\n0.1,2\n0.2,-0.5\n0.3,0\n');
    expect(p.elevationUnit).toBe('mm');
    expect(p.points[0]).toEqual([0, 0.0015]);
    expect(p.points[2][1]).toBeCloseTo(-0.0005, 15);
    expect(p.length).toBeCloseTo(0.3, 12);
    expect(p.medianSpacing).toBeCloseTo(0.1, 12);
  });

  it('picks the columns by name, skips comments and blank lines, accepts ; with decimal commas', () => {
    const p = ok('# logged by the Corrie test car\nx (m); z (m); speed\n\n0;0,001;10\n0,5;0,002;10\n1,0;0;10\n1,5;-0,001;10\n');
    expect(p.points).toEqual([
      [0, 0.001],
      [0.5, 0.002],
      [1, 0],
      [1.5, -0.001],
    ]);
  });

  it('takes units from the options when there is no header', () => {
    const p = ok('0,3\n1,4\n2,5\n3,6\n', { elevationUnit: 'mm' });
    expect(p.points[3]).toEqual([3, 0.006]);
    expect(p.distanceUnit).toBe('m');
  });

  it('names the line of a value that is not a number', () => {
    const r = err('distance_m,elevation_m\n0,0\n0.1,0.001\n0.2,abc\n0.3,0\n');
    expect(r.issues[0].path).toBe('line 4');
    expect(r.reason).toBe('line 4: elevation "abc" is not a number');
  });

  it('names the line where the distance stops rising', () => {
    const r = err('distance_m,elevation_m\n0,0\n0.1,0\n\n0.1,0\n0.3,0\n');
    expect(r.reason).toMatch(/^line 5: distance 0.1 does not rise/);
  });

  it('names the line of a short row', () => {
    expect(err('distance_m,elevation_m\n0,0\n0.1\n').reason).toMatch(/^line 3: expected 2 columns/);
  });

  it('insists on an elevation unit', () => {
    const r = err('distance,elevation\n0,0\n1,1\n2,2\n3,3\n');
    expect(r.reason).toMatch(/^line 1: state the elevation unit/);
  });

  it('refuses a header without recognisable columns, and too few rows', () => {
    expect(err('a,b\n0,0\n').reason).toMatch(/^line 1: header must name/);
    expect(err('distance_m,elevation_m\n0,0\n1,0\n').reason).toMatch(/^file: needs at least 4 rows/);
  });

  it('its points make a valid measured road', () => {
    const p = ok('distance_m,elevation_mm\n0,1\n0.05,2\n0.1,3\n0.15,2\n0.2,1\n');
    expect(MeasuredRoad.safeParse({ kind: 'measured', points: p.points }).success).toBe(true);
  });
});
