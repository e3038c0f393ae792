import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { VehicleDetail, VehiclesResponse } from '../../shared/schemas/vehicle.ts';
import { equivalentDampingLeastSquares } from '../../shared/sim/damper-equivalent.ts';
import { modalAnalysis } from '../../shared/sim/linear/modal.ts';
import { linearCorner } from '../../shared/sim/quarter-car.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { cornerDocument, parsed } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume vehicle bench');
const otherWorkspaceId = await createWorkspace(t.db, 'Another bench');
const engineer = await createUser(t.db, { name: 'Vehicle engineer' });
const outsider = await createUser(t.db, { name: 'Outsider' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, otherWorkspaceId, outsider.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const out = await signedIn(t.url, outsider.email, outsider.password);

const ws = `/api/workspaces/${workspaceId}`;
const front = cornerDocument('Pipit front');
// a lighter rear on a slightly stiffer spring: higher body frequency, as flat-ride practice asks
const rear = cornerDocument('Pipit rear', { sprungMass: 240, springRate: 30000, motionRatio: 1 });

async function newSetup(doc = front, as = eng, at = ws): Promise<SetupDetail> {
  return SetupDetail.parse((await as.post(`${at}/setups`, { setup: doc }).expect(201)).body);
}

function expectedModal(doc: typeof front) {
  const setup = parsed(doc);
  const eq = equivalentDampingLeastSquares(setup.damper);
  return modalAnalysis(linearCorner(setup, eq), eq.definition);
}

describe('vehicles', () => {
  it('a corner the linear analysis cannot resolve keeps its slot, without modal figures or a ratio', async () => {
    // a first damper point at 5e-324 m/s: an infinite low-speed slope (found by tests/fuzz)
    const extreme = { ...front, damper: { ...front.damper, rebound: [[5e-324, 0.000001]] as [number, number][] } };
    const f = await newSetup(extreme);
    const r = await newSetup(rear);
    const v = VehicleDetail.parse((await eng.post(`${ws}/vehicles`, { name: 'Extreme Pipit', frontSetupId: f.id, rearSetupId: r.id }).expect(201)).body);
    expect(v.front?.id).toBe(f.id);
    expect(v.analysis.front).toBeNull();
    expect(v.analysis.rear?.setup.id).toBe(r.id);
    expect(v.bodyRatio).toBeNull();
    const list = VehiclesResponse.parse((await eng.get(`${ws}/vehicles`).expect(200)).body);
    expect(list.vehicles.find((x) => x.id === v.id)?.bodyRatio).toBeNull();
  });

  it('groups a front and a rear corner and reports both modes and the rear/front body ratio', async () => {
    const f = await newSetup(front);
    const r = await newSetup(rear);
    const v = VehicleDetail.parse((await eng.post(`${ws}/vehicles`, { name: 'Brume Pipit', frontSetupId: f.id, rearSetupId: r.id }).expect(201)).body);
    expect(v.front).toEqual({ id: f.id, name: 'Pipit front', latestRevision: 1 });
    expect(v.rear).toEqual({ id: r.id, name: 'Pipit rear', latestRevision: 1 });

    // the figures are the simulation core's own modal analysis of each latest revision
    const mf = expectedModal(front);
    const mr = expectedModal(rear);
    expect(v.analysis.front?.modal.body.naturalHz).toBeCloseTo(mf.body.naturalHz, 12);
    expect(v.analysis.front?.modal.wheel.naturalHz).toBeCloseTo(mf.wheel.naturalHz, 12);
    expect(v.analysis.rear?.modal.body.naturalHz).toBeCloseTo(mr.body.naturalHz, 12);
    expect(v.bodyRatio).toBeCloseTo(mr.body.naturalHz / mf.body.naturalHz, 12);
    expect(v.bodyRatio).toBeGreaterThan(1);
    // hand check of the front body frequency, √(k_ride/ms)/2π, within 5 % (the coupled mode sits a little below)
    const ks = 32000 * 0.95 ** 2;
    const kRide = (ks * 210000) / (ks + 210000);
    expect(v.analysis.front?.modal.body.naturalHz).toBeGreaterThan(0.95 * (Math.sqrt(kRide / 310) / (2 * Math.PI)));
    expect(v.analysis.front?.modal.body.naturalHz).toBeLessThan(1.05 * (Math.sqrt(kRide / 310) / (2 * Math.PI)));

    const list = VehiclesResponse.parse((await eng.get(`${ws}/vehicles`).expect(200)).body);
    expect(list.vehicles.find((x) => x.id === v.id)?.bodyRatio).toBeCloseTo(v.bodyRatio ?? 0, 12);
    const setupRow = SetupDetail.parse((await eng.get(`${ws}/setups/${f.id}`).expect(200)).body);
    expect(setupRow).toMatchObject({ vehicle: { id: v.id, name: 'Brume Pipit' }, corner: 'front' });
  });

  it('a new setup in a slot moves the previous one out; a new revision updates the figures', async () => {
    const a = await newSetup(front);
    const b = await newSetup(cornerDocument('Pipit front, sport', { springRate: 40000 }));
    const v = VehicleDetail.parse((await eng.post(`${ws}/vehicles`, { name: 'Slot test', frontSetupId: a.id }).expect(201)).body);
    const moved = VehicleDetail.parse((await eng.patch(`${ws}/vehicles/${v.id}`, { frontSetupId: b.id }).expect(200)).body);
    expect(moved.front?.id).toBe(b.id);
    expect(SetupDetail.parse((await eng.get(`${ws}/setups/${a.id}`).expect(200)).body).vehicle).toBeNull();

    const before = moved.analysis.front?.modal.body.naturalHz ?? 0;
    await eng.post(`${ws}/setups/${b.id}/revisions`, { setup: cornerDocument('x', { springRate: 50000 }), message: 'Stiffer' }).expect(201);
    const after = VehicleDetail.parse((await eng.get(`${ws}/vehicles/${v.id}`).expect(200)).body);
    expect(after.front?.latestRevision).toBe(2);
    expect(after.analysis.front?.modal.body.naturalHz).toBeGreaterThan(before);

    // grouping from the setup side takes the slot the same way
    await eng.patch(`${ws}/setups/${a.id}`, { vehicleId: v.id, corner: 'front' }).expect(200);
    const back = VehicleDetail.parse((await eng.get(`${ws}/vehicles/${v.id}`).expect(200)).body);
    expect(back.front?.id).toBe(a.id);
  });

  it('refuses setups from another workspace, one setup in both slots, and a vehicle without a corner', async () => {
    const foreign = await newSetup(front, out, `/api/workspaces/${otherWorkspaceId}`);
    const res = await eng.post(`${ws}/vehicles`, { name: 'Bad', frontSetupId: foreign.id }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields?.map((f) => f.path)).toEqual(['frontSetupId']);
    const s = await newSetup(front);
    const both = await eng.post(`${ws}/vehicles`, { name: 'Bad', frontSetupId: s.id, rearSetupId: s.id }).expect(400);
    expect(ErrorBody.parse(both.body).error.fields?.map((f) => f.path)).toEqual(['rearSetupId']);
    const v = VehicleDetail.parse((await eng.post(`${ws}/vehicles`, { name: 'Cornerless' }).expect(201)).body);
    const noCorner = await eng.patch(`${ws}/setups/${s.id}`, { vehicleId: v.id, corner: null }).expect(400);
    expect(ErrorBody.parse(noCorner.body).error.fields?.map((f) => f.path)).toEqual(['corner']);
    expect((await eng.get(`${ws}/vehicles`).expect(200)).body.vehicles.filter((x: { name: string }) => x.name === 'Bad')).toEqual([]);
  });

  it('archiving a corner empties its slot; deleting the vehicle keeps its setups', async () => {
    const f = await newSetup(front);
    const r = await newSetup(rear);
    const v = VehicleDetail.parse((await eng.post(`${ws}/vehicles`, { name: 'Short-lived', frontSetupId: f.id, rearSetupId: r.id }).expect(201)).body);
    await eng.patch(`${ws}/setups/${r.id}`, { archived: true }).expect(200);
    const half = VehicleDetail.parse((await eng.get(`${ws}/vehicles/${v.id}`).expect(200)).body);
    expect(half.rear).toBeNull();
    expect(half.bodyRatio).toBeNull();

    await eng.del(`${ws}/vehicles/${v.id}`).expect(204);
    await eng.get(`${ws}/vehicles/${v.id}`).expect(404);
    const kept = SetupDetail.parse((await eng.get(`${ws}/setups/${f.id}`).expect(200)).body);
    expect(kept).toMatchObject({ vehicle: null, corner: 'front', latestRevision: 1 });
    const actions = (await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', v.id).execute()).map((x) => x.action);
    expect(actions).toEqual(['vehicle.created', 'vehicle.deleted']);
  });
});
