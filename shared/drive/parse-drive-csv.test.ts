import { describe, expect, it } from 'vitest';
import { columnLetter, parseDriveCsv } from './parse-drive-csv.ts';
import { driveCsv } from './synthetic-drive.ts';

const rows = (n: number, row: (i: number) => string) => Array.from({ length: n }, (_, i) => row(i)).join('\n');

describe('parseDriveCsv', () => {
  it('reads units from the header into SI and keeps the drive on its time grid', () => {
    const text = `# invented log\ntime [ms],speed [km/h],body accel [g],damper travel [mm],comment\n${rows(50, (i) => `${i * 10},72,${i % 2 ? 0.1 : -0.1},${i},x`)}`;
    const r = parseDriveCsv(text);
    if (!r.ok) throw new Error(r.errors[0].message);
    expect(r.data.dt).toBeCloseTo(0.01, 12);
    expect(r.data.speed[0]).toBeCloseTo(20, 12); // 72 km/h = 20 m/s
    expect(r.data.channels.bodyAccel?.[1]).toBeCloseTo(0.981, 12); // 0.1 g at 9.81 m/s² per g (the model's g)
    expect(r.data.channels.damperTravel?.[3]).toBeCloseTo(0.003, 12);
    expect(r.summary.distance).toBeCloseTo(20 * 0.49, 9);
    expect(r.summary.warnings[0]).toMatchObject({ line: 2, column: 'E (comment)' });
  });

  it('names the line and column of a bad cell', () => {
    const text = `time [s],speed [m/s],wheel accel [m/s^2]\n${rows(20, (i) => `${i / 100},15,${i === 6 ? 'n/a' : 0.5}`)}`;
    const r = parseDriveCsv(text);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors[0]).toMatchObject({ line: 8, column: 'C (wheel accel [m/s^2])' });
    expect(r.errors[0].message).toMatch(/not a number/);
  });

  it('asks for a unit the header leaves out, and refuses a unit of the wrong kind', () => {
    const r = parseDriveCsv(`time [s],speed [m/s],body accel,wheel travel [N]\n${rows(20, (i) => `${i / 100},15,0,0`)}`);
    expect(r.ok).toBe(false);
    if (r.ok) return;
    expect(r.errors.map((e) => [e.line, e.column])).toEqual([
      [1, 'C (body accel)'],
      [1, 'D (wheel travel [N])'],
    ]);
    expect(r.errors[0].message).toMatch(/give the unit/);
  });

  it('needs time, speed and a signal, with time rising', () => {
    const none = parseDriveCsv(`time [s],speed [m/s]\n${rows(20, (i) => `${i / 100},15`)}`);
    expect(none.ok === false && none.errors[0].message).toMatch(/no signal/);
    const back = parseDriveCsv(`time [s],speed [m/s],body accel [g]\n${rows(20, (i) => `${i === 10 ? 0.05 : i / 100},15,0`)}`);
    expect(back.ok === false && back.errors[0]).toMatchObject({ line: 12, column: 'A (time [s])' });
  });

  it('reads back a drive it wrote (km/h, g, mm in the file; SI inside)', () => {
    const n = 40;
    const data = { dt: 0.005, speed: Array.from({ length: n }, (_, i) => 12 + i / 100), channels: { bodyAccel: Array.from({ length: n }, (_, i) => Math.sin(i / 3)), wheelTravel: Array.from({ length: n }, (_, i) => 0.01 * Math.cos(i / 5)) } };
    const r = parseDriveCsv(driveCsv(data, 'round trip'));
    if (!r.ok) throw new Error(r.errors[0].message);
    expect(r.summary.columns.map((c) => c.quantity)).toEqual(['time', 'speed', 'bodyAccel', 'wheelTravel']);
    r.data.speed.forEach((v, i) => expect(v).toBeCloseTo(data.speed[i], 2));
    r.data.channels.bodyAccel?.forEach((v, i) => expect(v).toBeCloseTo(data.channels.bodyAccel[i], 3));
    r.data.channels.wheelTravel?.forEach((v, i) => expect(v).toBeCloseTo(data.channels.wheelTravel[i], 5));
  });

  it('letters columns as a spreadsheet does', () => {
    expect([0, 25, 26, 51, 52].map(columnLetter)).toEqual(['A', 'Z', 'AA', 'AZ', 'BA']);
  });
});
