import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ConformityRecordDetail, type TargetSheetContent } from '../../shared/schemas/target-sheet.ts';
import { addMember, createUser, createWorkspace, sessionHeaders, type TestUser } from './helpers/people.ts';
import { freshSheet, type SheetCast } from './helpers/target-sheet-fixtures.ts';
import { createTestApp, type TestApp } from './helpers/test-app.ts';

let t: TestApp;
let cast: SheetCast;
let engineer: TestUser;

beforeAll(async () => {
  t = await createTestApp();
  const workspaceId = await createWorkspace(t.db, 'Tallis & Brume Bench Group');
  engineer = await createUser(t.db, { name: 'Batch engineer' });
  const lead = await createUser(t.db, { name: 'Batch lead' });
  await addMember(t.db, workspaceId, engineer.id, 'engineer');
  await addMember(t.db, workspaceId, lead.id, 'lead');
  cast = { workspaceId, workspaceName: 'Tallis & Brume Bench Group', engineer, lead };
});
afterAll(() => t?.close());

// Targets ±10 % with a 20 N floor; every file below measures exactly the targets.
const targets: TargetSheetContent = {
  compression: [
    { velocity: 0.05, force: 160, tolPct: 10, floorN: 20 },
    { velocity: 0.1, force: 400, tolPct: 10, floorN: 20 },
    { velocity: 0.3, force: 800, tolPct: 10, floorN: 20 },
  ],
  rebound: [
    { velocity: 0.05, force: 300, tolPct: 10, floorN: 20 },
    { velocity: 0.1, force: 800, tolPct: 10, floorN: 20 },
    { velocity: 0.3, force: 1600, tolPct: 10, floorN: 20 },
  ],
  gasForce: 0,
  notes: '',
};
/** The same readings as [speed mm/s, compression N, rebound N]. */
const readings: [number, number, number][] = [
  [50, 160, 300],
  [100, 400, 800],
  [300, 800, 1600],
];
// 1 in = 25.4 mm and 1 lbf = 4.4482216152605 N exactly (NIST SP 811, appendix B)
const inch = 25.4;
const lbf = 4.4482216152605;

const siFile = `velocity [mm/s],compression force [N],rebound force [N]\n${readings.map((r) => r.join(',')).join('\n')}\n`;
const imperialFile = `velocity [in/s],compression force [lbf],rebound force [lbf]\n${readings.map(([v, c, r]) => [v / inch, c / lbf, r / lbf].join(',')).join('\n')}\n`;
/** No units in the header and the bench's own sign: extension positive, speeds in mm/s, forces in kN. */
const bareSignedFile = `velocity,force\n${readings.flatMap(([v, c, r]) => [`${-v},${-c / 1000}`, `${v},${r / 1000}`]).join('\n')}\n`;

describe('a batch of dyno files with different units and signs', () => {
  it('reads each file with its own units and sign, so the same damper measured three ways gets the same verdict', async () => {
    const { sheet } = await freshSheet(t, cast, 'draft');
    const put = await request(t.url).put(`/api/workspaces/${cast.workspaceId}/target-sheets/${sheet.id}`).set(await sessionHeaders(t, engineer.id)).send(targets);
    expect(put.status, JSON.stringify(put.body)).toBe(200);

    const res = await request(t.url)
      .post(`/api/workspaces/${cast.workspaceId}/target-sheets/${sheet.id}/checks`)
      .set(await sessionHeaders(t, engineer.id))
      // the batch-wide choice (m/s) must lose to the third file's own (mm/s)
      .field('velocityUnit', 'm/s')
      .field('label', 'SI')
      .field('label', 'IMPERIAL')
      .field('label', 'BARE')
      .field('fileVelocityUnit', '')
      .field('fileVelocityUnit', '')
      .field('fileVelocityUnit', 'mm/s')
      .field('fileForceUnit', '')
      .field('fileForceUnit', '')
      .field('fileForceUnit', 'kN')
      .field('fileSign', '')
      .field('fileSign', '')
      .field('fileSign', 'extension-positive')
      .attach('file', Buffer.from(siFile), 'si.csv')
      .attach('file', Buffer.from(imperialFile), 'imperial.csv')
      .attach('file', Buffer.from(bareSignedFile), 'bare.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const check = ConformityRecordDetail.parse(res.body);

    expect(check.measured.map((m) => [m.units?.velocity?.unit, m.units?.force.unit])).toEqual([
      ['mm/s', 'N'],
      ['in/s', 'lbf'],
      ['mm/s', 'kN'],
    ]);
    for (const m of check.measured) {
      for (const dir of ['compression', 'rebound'] as const) {
        const expected = readings.map(([v, c, r]) => ({ velocity: v / 1000, force: dir === 'compression' ? c : r }));
        m.peaks[dir].forEach((p, i) => {
          expect(p.velocity, `${m.label} ${dir} ${i}`).toBeCloseTo(expected[i].velocity, 12);
          expect(p.force, `${m.label} ${dir} ${i}`).toBeCloseTo(expected[i].force, 9);
        });
      }
    }
    expect(check.report.dampers.map((d) => d.pass)).toEqual([true, true, true]);
  });

  it('names the file and line of a force with the wrong sign for its direction', async () => {
    const { sheet } = await freshSheet(t, cast, 'draft');
    await request(t.url).put(`/api/workspaces/${cast.workspaceId}/target-sheets/${sheet.id}`).set(await sessionHeaders(t, engineer.id)).send(targets);
    const wrong = 'velocity [mm/s],compression force [N],rebound force [N]\n50,160,300\n100,-112,800\n300,800,1600\n';
    const res = await request(t.url)
      .post(`/api/workspaces/${cast.workspaceId}/target-sheets/${sheet.id}/checks`)
      .set(await sessionHeaders(t, engineer.id))
      .attach('file', Buffer.from(wrong), 'CF-0142.csv');
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const check = ConformityRecordDetail.parse(res.body);
    expect(check.measured[0].fileName).toBe('CF-0142.csv');
    expect(check.measured[0].warnings).toContain('line 3: compression force -112 N at 100 mm/s has the wrong sign for its direction (the other compression readings are positive); check this reading');
    // kept as measured, so the check fails there instead of passing a part on a turned-round reading
    expect(check.report.dampers[0].compression.points[1]).toMatchObject({ measured: -112, pass: false });
  });
});
