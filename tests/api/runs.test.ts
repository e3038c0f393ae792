import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { RunList, RunSummary, SavedRun } from '../../shared/schemas/run-record.ts';
import { fromStoredTraces } from '../../shared/runs/stored-run.ts';
import { runCorner } from '../../shared/sim/run-corner.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { exampleSetup, insertSetup, saveBody } from './helpers/runs.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume ride lab');
const otherWorkspaceId = await createWorkspace(t.db, 'Another bench');
const engineer = await createUser(t.db, { name: 'Ines Caddow' });
const viewer = await createUser(t.db, { name: 'Ravi Stroud' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, viewer.id, 'viewer');
await addMember(t.db, otherWorkspaceId, engineer.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const view = await signedIn(t.url, viewer.email, viewer.password);

const base = exampleSetup();
const stiffer = { ...base, damper: { ...base.damper, rebound: base.damper.rebound.map(([v, f]) => [v, f * 1.3] as [number, number]) } };
const fixture = await insertSetup(t.db, workspaceId, engineer.id, [base]);
const runs = `/api/workspaces/${workspaceId}/runs`;

const auditActions = async (entityId: string) =>
  (await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', entityId).execute()).map((r) => r.action);

describe('saved runs', () => {
  it('saves a run with its figures and reads back exactly those figures and a request that reproduces them', async () => {
    const body = saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, base, { name: 'Baseline on class C' });
    const created = RunSummary.parse((await eng.post(runs, body).expect(201)).body);
    expect(created).toMatchObject({ name: 'Baseline on class C', setupId: fixture.setupId, revisionNumber: 1, latestRevision: 1, roadKind: 'iso8608', seed: 7, speed: 20, duration: 6 });
    expect(created.createdBy.name).toBe('Ines Caddow');
    expect(await auditActions(created.id)).toEqual(['run.saved']);

    const saved = SavedRun.parse((await view.get(`${runs}/${created.id}`).expect(200)).body);
    // JSON numbers survive the round trip bit for bit
    expect(saved.result.metrics).toEqual(body.result.metrics);
    expect(saved.result.modal).toEqual(body.result.modal);

    // the stored request, run again by the same code `npm run sim` uses, gives the same figures
    const again = runCorner(saved.request);
    expect(again.ok).toBe(true);
    if (!again.ok) return;
    expect(again.result.metrics.bodyAccelWkRms).toBe(saved.result.metrics.bodyAccelWkRms);
    expect(again.result.metrics.tyreLoadRatio).toBe(saved.result.metrics.tyreLoadRatio);
    expect(again.result.metrics.travelMaxCompression).toBe(saved.result.metrics.travelMaxCompression);

    // thinned traces: at most 2000 points per column, and the extremes of the full run kept
    const traces = fromStoredTraces(saved.traces);
    expect(traces.ok).toBe(true);
    if (!traces.ok) return;
    expect(saved.traces.length).toBeLessThanOrEqual(2000);
    expect(saved.traces.fullLength).toBe(again.trace.travel.length);
    const fullMax = Math.max(...again.trace.travel);
    expect(Math.max(...traces.columns.travel)).toBeCloseTo(fullMax, 6);
    expect(saved.spectra?.length).toBeGreaterThan(10);
  });

  it('lists runs per workspace and per setup, newest first, and says when the setup has moved on', async () => {
    const second = await insertSetup(t.db, workspaceId, engineer.id, [{ ...base, name: 'Pipit front, soft rebound' }, stiffer]);
    const a = RunSummary.parse((await eng.post(runs, saveBody({ setupId: second.setupId, revisionNumber: 1 }, { ...base, name: 'Pipit front, soft rebound' }, { name: 'Old revision' })).expect(201)).body);
    const b = RunSummary.parse((await eng.post(runs, saveBody({ setupId: second.setupId, revisionNumber: 2 }, stiffer, { name: 'Current revision' })).expect(201)).body);
    expect(a).toMatchObject({ revisionNumber: 1, latestRevision: 2 });
    expect(b).toMatchObject({ revisionNumber: 2, latestRevision: 2 });

    const perSetup = RunList.parse((await view.get(`${runs}?setupId=${second.setupId}`).expect(200)).body);
    expect(perSetup.runs.map((r) => r.name)).toEqual(['Current revision', 'Old revision']);
    const all = RunList.parse((await view.get(runs).expect(200)).body);
    expect(all.runs.length).toBeGreaterThanOrEqual(3);
    expect(all.runs.map((r) => r.setupId)).toContain(fixture.setupId);

    const other = RunList.parse((await eng.get(`/api/workspaces/${otherWorkspaceId}/runs`).expect(200)).body);
    expect(other.runs).toEqual([]);
  });

  it('refuses figures computed from a setup that is not the named revision', async () => {
    const body = saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, stiffer, { name: 'Unsaved edit' });
    const res = await eng.post(runs, body).expect(409);
    const err = ErrorBody.parse(res.body).error;
    expect(err.code).toBe('conflict');
    expect(err.fields?.[0]?.path).toBe('setup');
    expect(err.message).toMatch(/revision 1/);
  });

  it('names the field at fault for a missing revision, a foreign setup and figures of another request', async () => {
    const noRevision = await eng.post(runs, saveBody({ setupId: fixture.setupId, revisionNumber: 9 }, base)).expect(404);
    expect(ErrorBody.parse(noRevision.body).error.fields?.[0]?.path).toBe('revisionNumber');

    const foreign = await insertSetup(t.db, otherWorkspaceId, engineer.id, [base]);
    const notHere = await eng.post(runs, saveBody({ setupId: foreign.setupId, revisionNumber: 1 }, base)).expect(404);
    expect(ErrorBody.parse(notHere.body).error.fields?.[0]?.path).toBe('setupId');

    const body = saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, base);
    const wrongSpeed = await eng.post(runs, { ...body, speed: 25 }).expect(400);
    expect(ErrorBody.parse(wrongSpeed.body).error.fields?.[0]?.path).toBe('result');

    const cut = { ...body, traces: { ...body.traces, data: body.traces.data.slice(0, 400) } };
    const badTraces = await eng.post(runs, cut).expect(400);
    expect(ErrorBody.parse(badTraces.body).error.fields?.map((f) => f.path)).toContain('traces.data');

    const tooLong = await eng.post(runs, { ...body, duration: 601 }).expect(400);
    expect(ErrorBody.parse(tooLong.body).error.fields?.map((f) => f.path)).toContain('duration');
    expect(Number((await t.db.selectFrom('run').select((e) => e.fn.countAll<number>().as('n')).where('name', '=', 'Test run').executeTakeFirstOrThrow()).n)).toBe(0);
  });

  it('deletes a run for an engineer, records it, and the run is gone; a viewer cannot', async () => {
    const created = RunSummary.parse((await eng.post(runs, saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, base, { name: 'To delete' })).expect(201)).body);
    await view.del(`${runs}/${created.id}`).expect(403);
    await eng.del(`${runs}/${created.id}`).expect(204);
    await view.get(`${runs}/${created.id}`).expect(404);
    expect(await auditActions(created.id)).toEqual(['run.saved', 'run.deleted']);
    await eng.del(`${runs}/${created.id}`).expect(404);
  });
});
