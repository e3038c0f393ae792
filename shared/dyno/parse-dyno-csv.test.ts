import { describe, expect, it } from 'vitest';
import { parseDynoCsv } from './parse-dyno-csv.ts';
import { DynoParseResult } from '../schemas/dyno.ts';

function ok(text: string, opts = {}) {
  const r = parseDynoCsv(text, opts);
  if (!r.ok) throw new Error(`expected success, got ${JSON.stringify(r.errors)}`);
  expect(DynoParseResult.safeParse(r).success).toBe(true);
  return r;
}
function errors(text: string, opts = {}) {
  const r = parseDynoCsv(text, opts);
  if (r.ok) throw new Error('expected a rejection');
  return r.errors;
}

describe('parseDynoCsv: peak layouts', () => {
  it('reads a direction column with mm/s and kN from the header, in SI', () => {
    const r = ok('direction,velocity [mm/s],force (kN)\ncompression,100,0.4\nrebound,100,0.9\nC,200,0.6\n');
    expect(r.kind).toBe('peaks');
    expect(r.layout).toBe('direction-column');
    if (r.kind !== 'peaks') return;
    expect(r.data.compression).toEqual([
      { velocity: 0.1, force: 400 },
      { velocity: 0.2, force: 600 },
    ]);
    expect(r.data.rebound[0].velocity).toBeCloseTo(0.1, 12);
    expect(r.data.rebound[0].force).toBeCloseTo(900, 9);
    expect(r.units.velocity).toEqual({ unit: 'mm/s', source: 'header' });
    expect(r.units.force).toEqual({ unit: 'kN', source: 'header' });
  });

  it('reads one force column per direction and allows a blank cell for a missing reading', () => {
    const r = ok('velocity [m/s],compression force [N],rebound force [N]\n0.1,300,\n0.2,450,1000\n');
    expect(r.layout).toBe('force-per-direction');
    if (r.kind !== 'peaks') return;
    expect(r.data.compression.map((p) => p.force)).toEqual([300, 450]);
    expect(r.data.rebound).toEqual([{ velocity: 0.2, force: 1000 }]);
  });

  it('splits signed rows by velocity sign, compression positive by default', () => {
    const r = ok('velocity [m/s],force [N]\n0.1,300\n-0.1,-700\n0.3,600\n-0.3,-1500\n');
    expect(r.layout).toBe('signed');
    if (r.kind !== 'peaks') return;
    expect(r.data.compression).toEqual([
      { velocity: 0.1, force: 300 },
      { velocity: 0.3, force: 600 },
    ]);
    expect(r.data.rebound).toEqual([
      { velocity: 0.1, force: 700 },
      { velocity: 0.3, force: 1500 },
    ]);
  });

  it('honours an extension-positive file: the positive rows become rebound', () => {
    const text = 'velocity [m/s],force [N]\n0.1,700\n-0.1,-300\n0.3,1500\n-0.3,-600\n';
    const r = ok(text, { motionSign: 'extension-positive', forceSign: 'extension-positive' });
    if (r.kind !== 'peaks') return;
    expect(r.data.rebound.map((p) => p.force)).toEqual([700, 1500]);
    expect(r.data.compression.map((p) => p.force)).toEqual([300, 600]);
  });

  it('warns when rebound reads softer than compression everywhere (sign convention likely reversed)', () => {
    const r = ok('velocity [m/s],force [N]\n0.1,700\n-0.1,-300\n0.3,1500\n-0.3,-600\n');
    expect(r.warnings.map((w) => w.message).join(' ')).toMatch(/rebound reads softer/);
  });

  it('removes the gas force: taken off compression, added back to rebound', () => {
    const r = ok('velocity [m/s],force [N]\n0.1,450\n-0.1,-550\n', { gasForce: 150 });
    if (r.kind !== 'peaks') return;
    expect(r.data.compression[0].force).toBeCloseTo(300, 12);
    expect(r.data.rebound[0].force).toBeCloseTo(700, 12);
  });

  it('uses option units for columns without one and says so; header units win over options', () => {
    const r = ok('velocity,force [N]\n100,300\n200,500\n', { velocityUnit: 'mm/s' });
    expect(r.units.velocity).toEqual({ unit: 'mm/s', source: 'option' });
    if (r.kind === 'peaks') expect(r.data.compression[1].velocity).toBeCloseTo(0.2, 12);
    const d = ok('velocity,force\n0.1,300\n0.2,500\n');
    expect(d.units.velocity?.source).toBe('default');
    expect(d.warnings.some((w) => /names no unit/.test(w.message) && w.line === 1)).toBe(true);
    const h = ok('velocity [mm/s],force [N]\n100,300\n200,500\n', { velocityUnit: 'm/s' });
    expect(h.units.velocity).toEqual({ unit: 'mm/s', source: 'header' });
    expect(h.warnings.some((w) => /states mm\/s/.test(w.message))).toBe(true);
  });

  it('reads semicolon files with decimal commas, skips comments and blank lines, counting lines from the text', () => {
    const text = '# bench 2\n\ndirection;velocity [m/s];force [N]\ncompression;0,1;300,5\n\nrebound;0,1;x\n';
    const e = errors(text);
    expect(e).toEqual([{ line: 6, message: "'x' in column 'force [N]' is not a number" }]);
    const r = ok(text.replace(';x', ';800'));
    if (r.kind === 'peaks') expect(r.data.compression[0]).toEqual({ velocity: 0.1, force: 300.5 });
  });

  it('keeps line numbers right after a quoted value spanning two lines', () => {
    const text = 'direction,velocity [m/s],force [N],note\ncompression,0.1,300,"two\nlines"\nrebound,0.1,oops,\n';
    expect(errors(text)).toEqual([{ line: 4, message: "'oops' in column 'force [N]' is not a number" }]);
  });
});

describe('parseDynoCsv: rejections name the line and the problem', () => {
  it.each([
    ['wrong columns', 'speed thing,weight\n1,2\n3,4\n', 1, /columns not recognised.*expected one of/],
    ['numbers for a header', '0.1,300\n0.2,500\n', 1, /holds numbers, not column names/],
    ['text in a number column', 'velocity [m/s],force [N]\n0.1,300\n0.2,abc\n', 3, /'abc' in column 'force \[N\]' is not a number/],
    ['a line cut short', 'velocity [m/s],force [N]\n0.1,300\n0.2\n0.3,500\n', 3, /1 value where the header has 2: the line is cut short/],
    ['too many values', 'velocity [m/s],force [N]\n0.1,300,5\n0.2,400\n', 2, /3 values where the header has 2/],
    ['a missing value', 'velocity [m/s],force [N]\n0.1,\n0.2,400\n', 2, /no value in column 'force \[N\]'/],
    ['an unknown direction', 'direction,velocity [m/s],force [N]\nup,0.1,300\nrebound,0.1,600\n', 2, /direction 'up' not understood/],
    ['a unit that does not fit', 'velocity [ft/s],force [N]\n1,2\n3,4\n', 1, /unit 'ft\/s' is not accepted here; use m\/s or mm\/s or in\/s/],
    ['two columns for one role', 'velocity,speed,force\n1,1,2\n3,3,4\n', 1, /both read as velocity/],
    ['too few rows', 'velocity [m/s],force [N]\n0.1,300\n', 2, /only 1 data row; a peak-point file needs at least 2/],
    ['an unclosed quote', 'velocity [m/s],force [N]\n0.1,300\n"0.2,400\n', 3, /quoted value is not closed/],
  ])('%s', (_name, text, line, message) => {
    const e = errors(text);
    expect(e[0].line).toBe(line);
    expect(e[0].message).toMatch(message);
  });

  it('rejects time that does not rise, naming the row', () => {
    const rows = Array.from({ length: 30 }, (_, i) => `${i === 12 ? 0.011 : i * 0.001},0,${i}`);
    const e = errors(`time [s],displacement [m],force [N]\n${rows.join('\n')}\n`);
    expect(e[0]).toEqual({ line: 14, message: "time 0.011 s is not after the previous row's 0.011 s; time must rise from row to row" });
  });

  it('rejects a series shorter than 20 rows', () => {
    const rows = Array.from({ length: 5 }, (_, i) => `${i},0,0`).join('\n');
    expect(errors(`time,displacement,force\n${rows}`)[0].message).toMatch(/a time series needs at least 20/);
  });

  it('enforces the row limit at the first row beyond it', () => {
    const rows = Array.from({ length: 12 }, (_, i) => `${i * 0.1},${i}`).join('\n');
    const e = errors(`velocity [m/s],force [N]\n${rows}\n`, { maxRows: 10 });
    expect(e).toEqual([{ line: 12, message: 'more than 10 data rows; split the file or thin the record' }]);
  });

  it('lists every bad row (capped at 20 plus a count)', () => {
    const rows = Array.from({ length: 30 }, () => 'a,b').join('\n');
    const e = errors(`velocity [m/s],force [N]\n${rows}`);
    expect(e).toHaveLength(21);
    expect(e[0].line).toBe(2);
    expect(e[20].message).toMatch(/and \d+ more problems/);
  });

  it('rejects bad options without reading the file', () => {
    expect(errors('velocity,force\n1,2\n3,4', { gasForce: -5 })[0].message).toMatch(/^option gasForce/);
  });
});

describe('parseDynoCsv: raw time series', () => {
  it('converts ms and mm, applies the sign conventions and keeps a velocity column when given', () => {
    const rows = Array.from({ length: 25 }, (_, i) => `${i},${-i},${-2 * i},${-3}`).join('\n');
    const r = ok(`time (ms),position (mm),load (kN),velocity (mm/s)\n${rows}\n`, { motionSign: 'extension-positive', forceSign: 'extension-positive' });
    expect(r.kind).toBe('series');
    if (r.kind !== 'series') return;
    expect(r.data.time[3]).toBeCloseTo(0.003, 15);
    expect(r.data.displacement[3]).toBeCloseTo(0.003, 15);
    expect(r.data.force[3]).toBeCloseTo(6000, 9);
    expect(r.data.velocity?.[3]).toBeCloseTo(0.003, 15);
  });

  it('ignores columns it does not use, with a warning', () => {
    const rows = Array.from({ length: 25 }, (_, i) => `${i * 0.001},0,0,21.5`).join('\n');
    const r = ok(`time [s],displacement [m],force [N],temperature\n${rows}`);
    expect(r.warnings).toContainEqual({ line: 1, message: "column 'temperature' is not used" });
  });
});
