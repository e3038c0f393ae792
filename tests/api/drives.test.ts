import { afterAll, describe, expect, it } from 'vitest';
import { CSRF_HEADER } from '../../server/auth/csrf.ts';
import { ErrorBody } from '../../shared/errors.ts';
import { ApplyDriveFitResult, DriveDetail, DriveItem, DrivesResponse } from '../../shared/schemas/drive.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { driveCsv } from './helpers/road-dyno-fixtures.ts';
import { cornerDocument, freshSetup, parsed } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume ride lab');
const engineer = await createUser(t.db, { name: 'Pell Ashgrove' });
const viewer = await createUser(t.db, { name: 'Juno Brack' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, viewer.id, 'viewer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const view = await signedIn(t.url, viewer.email, viewer.password);
const ws = `/api/workspaces/${workspaceId}`;

const upload = (setupId: string, csv: string, filename = 'drive.csv') =>
  eng.agent.post(`${ws}/setups/${setupId}/drives`).set(CSRF_HEADER, eng.csrf).field('note', 'Lane run 1').attach('file', Buffer.from(csv), filename);

describe('measured drives', () => {
  it('keeps a drive read in a worker thread: units from the header, signals in SI, its size counted as an upload', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const item = DriveItem.parse((await upload(setup.id, driveCsv, 'lane.csv').expect(201)).body);
    expect(item).toMatchObject({ filename: 'lane.csv', note: 'Lane run 1', producedRevision: null, uploadedBy: { name: 'Pell Ashgrove' } });
    expect(item.summary.samples).toBe(401); // 2 s at 200 samples per second
    expect(item.summary.columns.find((c) => c.quantity === 'speed')?.unit).toBe('km/h');
    expect(item.bytes).toBeGreaterThan(Buffer.byteLength(driveCsv));

    const list = DrivesResponse.parse((await view.get(`${ws}/setups/${setup.id}/drives`).expect(200)).body);
    expect(list.drives.map((d) => d.id)).toEqual([item.id]);
    const detail = DriveDetail.parse((await view.get(`${ws}/setups/${setup.id}/drives/${item.id}`).expect(200)).body);
    // first row: 46.8 km/h = 13 m/s
    expect(detail.data.speed[0]).toBeCloseTo(13, 9);
    expect(detail.data.channels.wheelTravel).toHaveLength(401);
  });

  it('refuses a bad file naming the line and the column, and saves nothing', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const lines = driveCsv.split('\n');
    lines[7] = lines[7].replace(/,[^,]+$/, ',oops');
    const res = await upload(setup.id, lines.join('\n')).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.message).toMatch(/line 8, column F \(wheel travel \[mm\]\)/);
    expect(body.error.fields?.[0].path).toBe('line 8, column F (wheel travel [mm])');
    expect(await t.db.selectFrom('drive').select('id').where('setup_id', '=', setup.id).execute()).toEqual([]);
  });

  it('saves a fitted corner as the next revision citing the drive, and refuses changes a fit cannot make', async () => {
    const doc = cornerDocument('Fitted corner');
    const setup = await freshSetup(t.db, workspaceId, engineer, doc);
    const drive = DriveItem.parse((await upload(setup.id, driveCsv, 'lane-run-1.csv').expect(201)).body);
    const current = parsed(doc);
    const path = `${ws}/setups/${setup.id}/drives/${drive.id}/apply`;

    const bad = await eng.agent.post(path).set(CSRF_HEADER, eng.csrf).send({ setup: { ...current, motionRatio: 0.5 }, message: 'x', basedOn: 1 }).expect(400);
    expect(ErrorBody.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['setup.motionRatio']);

    const res = await eng.agent.post(path).set(CSRF_HEADER, eng.csrf).send({ setup: { ...current, springRate: 31000 }, message: 'Spring from the lane', basedOn: 1 }).expect(201);
    const applied = ApplyDriveFitResult.parse(res.body);
    expect(applied.revision.number).toBe(2);
    expect(applied.drive.producedRevision).toEqual(applied.revision);
    const detail = SetupDetail.parse((await view.get(`${ws}/setups/${setup.id}`).expect(200)).body);
    expect(detail.revision.document.springRate).toBe(31000);
    expect(detail.revision.message).toBe(`Spring from the lane — fitted to drive lane-run-1.csv (${drive.createdAt.slice(0, 10)}, id ${drive.id})`);
    expect(detail.revision.source).toBe(`drive-fit:${drive.id}`);
  });
});
