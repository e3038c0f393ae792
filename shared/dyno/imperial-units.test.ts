import { describe, expect, it } from 'vitest';
import { METERS_PER_INCH, NEWTONS_PER_POUND_FORCE } from '../units.ts';
import { parseDynoCsv } from './parse-dyno-csv.ts';

function peaksOf(text: string, opts = {}) {
  const r = parseDynoCsv(text, opts);
  if (!r.ok || r.kind !== 'peaks') throw new Error(`expected peak points: ${JSON.stringify(r)}`);
  return r;
}

describe('inch-pound dyno files', () => {
  it('uses the exact definitions: 1 in = 0.0254 m and 1 lbf = 4.4482216152605 N (NIST SP 811, appendix B)', () => {
    expect(METERS_PER_INCH).toBe(0.0254);
    expect(NEWTONS_PER_POUND_FORCE).toBe(4.4482216152605);
    // the pound-force is the avoirdupois pound (0.45359237 kg, exact) under standard gravity
    // (9.80665 m/s², exact): NIST SP 811 B.8
    expect(0.45359237 * 9.80665).toBeCloseTo(NEWTONS_PER_POUND_FORCE, 12);
  });

  it('reads in/s and lbf from the header into SI', () => {
    const r = peaksOf('velocity [in/s],compression force [lbf],rebound force [lbf]\n4,50,120\n10,90,260\n');
    expect(r.units.velocity).toEqual({ unit: 'in/s', source: 'header' });
    expect(r.units.force).toEqual({ unit: 'lbf', source: 'header' });
    // 4 in/s = 0.1016 m/s; 50 lbf = 222.411 N
    expect(r.data.compression[0].velocity).toBeCloseTo(0.1016, 12);
    expect(r.data.compression[0].force).toBeCloseTo(222.411080763025, 9);
    expect(r.data.rebound[1].force).toBeCloseTo(260 * 4.4482216152605, 9);
    expect(r.data.rebound[1].velocity).toBeCloseTo(0.254, 12);
  });

  it('takes the units from the options when the header names none, and reads `velocity_in_s`', () => {
    const r = peaksOf('velocity_in_s,force\n2,30\n-2,-70\n', { forceUnit: 'lbf' });
    expect(r.units.velocity).toEqual({ unit: 'in/s', source: 'header' });
    expect(r.units.force).toEqual({ unit: 'lbf', source: 'option' });
    expect(r.data.compression[0]).toEqual({ velocity: 2 * 0.0254, force: 30 * 4.4482216152605 });
  });

  it('reads a raw record with displacement in inches', () => {
    const rows = Array.from({ length: 400 }, (_, i) => {
      const t = i * 0.005;
      const x = 1 * Math.sin(2 * Math.PI * 1.5 * t); // ±1 in stroke
      const v = 1 * 2 * Math.PI * 1.5 * Math.cos(2 * Math.PI * 1.5 * t);
      return `${t},${x},${v * 20}`;
    });
    const r = parseDynoCsv(`time [s],displacement [in],force [lbf]\n${rows.join('\n')}\n`);
    if (!r.ok || r.kind !== 'series') throw new Error('expected a record');
    expect(Math.max(...r.data.displacement)).toBeCloseTo(0.0254, 4);
  });
});

describe('forces with the wrong sign for their direction', () => {
  it('a negative reading in a compression column is kept as measured and named with its line', () => {
    const r = peaksOf('velocity [m/s],compression force [N],rebound force [N]\n0.05,60,150\n0.1,-112,310\n0.2,190,520\n');
    const point = r.data.compression.find((p) => p.velocity === 0.1);
    expect(point?.force).toBe(-112);
    const warning = r.warnings.find((w) => /wrong sign/.test(w.message));
    expect(warning).toEqual({ line: 3, message: 'compression force -112 N at 0.1 m/s has the wrong sign for its direction (the other compression readings are positive); check this reading' });
  });

  it('a file that writes every rebound force negative is read as its convention, without warnings', () => {
    const r = peaksOf('velocity [m/s],compression force [N],rebound force [N]\n0.05,60,-150\n0.1,112,-310\n0.2,190,-520\n');
    expect(r.data.rebound.map((p) => p.force)).toEqual([150, 310, 520]);
    expect(r.warnings.filter((w) => /wrong sign/.test(w.message))).toEqual([]);
  });

  it('one positive reading among negative rebound readings is the one flagged', () => {
    const r = peaksOf('direction,velocity [m/s],force [N]\nrebound,0.05,-150\nrebound,0.1,310\nrebound,0.2,-520\ncompression,0.1,120\n');
    expect(r.data.rebound.find((p) => p.velocity === 0.1)?.force).toBe(-310);
    expect(r.warnings.filter((w) => /wrong sign/.test(w.message)).map((w) => w.line)).toEqual([3]);
  });

  it('in a signed file, a compression row whose force pushes the wrong way is flagged by line', () => {
    const r = peaksOf('velocity [m/s],force [N]\n0.05,60\n0.1,-112\n0.2,190\n-0.05,-150\n-0.1,-310\n');
    expect(r.warnings.find((w) => /wrong sign/.test(w.message))).toMatchObject({ line: 3, message: expect.stringMatching(/^compression force -112 N at 0\.1 m\/s has the wrong sign/) });
  });
});
