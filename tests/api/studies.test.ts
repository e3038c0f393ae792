import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { CreatedShareLink, SharedObject } from '../../shared/schemas/share-link.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { StudiesResponse, StudyPointDraft, StudyDetail } from '../../shared/schemas/study-record.ts';
import { applyPoint } from '../../shared/study/apply-point.ts';
import { studyBestCompromise, studyTradeOff } from '../../shared/study/study-compromise.ts';
import { type BrowserLike, signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { freshRoad } from './helpers/road-dyno-fixtures.ts';
import { exampleSetup, insertSetup } from './helpers/runs.ts';
import { studyDefinition, uploadsFor } from './helpers/study-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume ride lab');
const otherWorkspaceId = await createWorkspace(t.db, 'Class bench');
const engineer = await createUser(t.db, { name: 'Ines Caddow' });
const lead = await createUser(t.db, { name: 'Mara Holt' });
const viewer = await createUser(t.db, { name: 'Ravi Stroud' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, workspaceId, lead.id, 'lead');
await addMember(t.db, workspaceId, viewer.id, 'viewer');
await addMember(t.db, otherWorkspaceId, viewer.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const ld = await signedIn(t.url, lead.email, lead.password);
const view = await signedIn(t.url, viewer.email, viewer.password);

const fixture = await insertSetup(t.db, workspaceId, engineer.id, [exampleSetup()]);
const base = { setupId: fixture.setupId, revisionId: fixture.revisionIds[0] };
const studies = `/api/workspaces/${workspaceId}/studies`;

/** The agents have no `put`; send one the way they send their writes (session cookie and CSRF header). */
const put = (who: BrowserLike, path: string, body: object) => who.agent.put(path).set('x-csrf-token', who.csrf).send(body);

const countRows = async (table: 'study' | 'study_point') => Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
const fieldPaths = (body: unknown) => ErrorBody.parse(body).error.fields?.map((f) => f.path) ?? [];

async function newStudy(over: Parameters<typeof studyDefinition>[1] = {}) {
  return StudyDetail.parse((await eng.post(studies, { definition: studyDefinition(base, over) }).expect(201)).body);
}

describe('studies: define and read', () => {
  it('stores the definition with the base revision and a library road by reference, and viewers can read it', async () => {
    const road = await freshRoad(t.db, workspaceId, engineer, { kind: 'iso8608', class: 'D', seed: 3 });
    const detail = await newStudy({ roads: [{ source: 'library', roadId: road.id }], speeds: [15, 25] });
    expect(detail).toMatchObject({ status: 'draft', plannedPoints: 4, plannedRuns: 4 * 2 + 2, results: null, baseline: null, points: [], basePoint: null });
    expect(detail.base).toEqual({ setupId: fixture.setupId, setupName: 'Brume Pipit front, baseline', revisionNumber: 1 });
    expect(detail.roads).toEqual([{ kind: 'iso8608', name: road.name, class: 'D', seed: 3 }]);
    // the library name is written into the definition, so the study names its road after a rename or delete
    expect(detail.definition.roads[0]).toMatchObject({ source: 'library', roadId: road.id, name: road.name });
    expect(detail.baseSetup.name).toBe('Brume Pipit front, baseline');

    const list = StudiesResponse.parse((await view.get(studies).expect(200)).body);
    expect(list.studies.map((s) => s.id)).toContain(detail.id);
    const read = StudyDetail.parse((await view.get(`${studies}/${detail.id}`).expect(200)).body);
    expect(read.definition).toEqual(detail.definition);
    const audit = await t.db.selectFrom('audit_log').select(['action', 'summary']).where('entity_id', '=', detail.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['study.created']);
  });

  it('refuses a bad definition with field paths and saves nothing', async () => {
    const before = await countRows('study');
    const same = studyDefinition(base, { axes: [{ parameter: 'damperScale', from: 0.5, to: 2, steps: 3 }, { parameter: 'damperScale', from: 1, to: 2, steps: 2 }] });
    expect(fieldPaths((await eng.post(studies, { definition: same }).expect(400)).body)).toContain('definition.axes.1.parameter');
    const range = studyDefinition(base, { axes: [{ parameter: 'springRate', from: 5, to: 40000, steps: 3 }] });
    expect(fieldPaths((await eng.post(studies, { definition: range }).expect(400)).body)).toContain('definition.axes.0.from');
    const noWeight = studyDefinition(base, { objectives: [{ figure: 'vdv', weight: 0 }] });
    expect(fieldPaths((await eng.post(studies, { definition: noWeight }).expect(400)).body)).toContain('definition.objectives');
    const ghostRoad = studyDefinition(base, { roads: [{ source: 'library', roadId: 'no-such-road' }] });
    expect(fieldPaths((await eng.post(studies, { definition: ghostRoad }).expect(400)).body)).toEqual(['definition.roads.0.roadId']);
    const otherRevision = studyDefinition({ setupId: fixture.setupId, revisionId: 'not-a-revision' });
    expect(fieldPaths((await eng.post(studies, { definition: otherRevision }).expect(400)).body)).toEqual(['definition.base.revisionId']);
    expect(await countRows('study')).toBe(before);
  });

  it('a viewer can open studies but not define one, save results, pick a baseline or make a revision', async () => {
    const detail = await newStudy();
    const before = await countRows('study');
    await view.post(studies, { definition: studyDefinition(base) }).expect(403);
    await view.post(`${studies}/${detail.id}/points`, { points: uploadsFor(detail) }).expect(403);
    await put(view, `${studies}/${detail.id}/results`, { status: 'partial', elapsedMs: 5 }).expect(403);
    await put(view, `${studies}/${detail.id}/baseline`, { pointIndex: 0 }).expect(403);
    await view.get(`${studies}/${detail.id}/points/0/draft`).expect(403);
    await view.del(`${studies}/${detail.id}`).expect(403);
    expect(await countRows('study')).toBe(before);
    const read = StudyDetail.parse((await view.get(`${studies}/${detail.id}`).expect(200)).body);
    expect(read.points).toEqual([]);
  });
});

describe('studies: results', () => {
  it('saves a run in slices, judges every point itself and finishes complete with the best compromise', async () => {
    const detail = await newStudy();
    const uploads = uploadsFor(detail);
    expect(uploads.map((u) => u.index)).toEqual([0, 1, 2, 3, -1]);
    await eng.post(`${studies}/${detail.id}/points`, { points: uploads.slice(0, 2) }).expect(200);
    // a viewer reading mid-run sees what is saved so far, still a draft
    const mid = StudyDetail.parse((await view.get(`${studies}/${detail.id}`).expect(200)).body);
    expect(mid.status).toBe('draft');
    expect(mid.points.map((p) => p.index)).toEqual([0, 1]);
    await eng.post(`${studies}/${detail.id}/points`, { points: uploads.slice(2) }).expect(200);
    const done = StudyDetail.parse((await put(eng, `${studies}/${detail.id}/results`, { status: 'complete', elapsedMs: 1234, workers: 2 }).expect(200)).body);

    expect(done.status).toBe('complete');
    expect(done.points).toHaveLength(4);
    expect(done.basePoint?.values).toEqual({});
    expect(done.points[3].values).toEqual({ reboundScale: 1.4, springRate: 38000 });
    expect(done.results).toMatchObject({ plannedPoints: 4, savedPoints: 4, plannedRuns: 5, savedRuns: 5, elapsedMs: 1234, workers: 2, ranBy: { name: 'Ines Caddow' } });
    // the summary is exactly what the shared code gives on the stored points
    expect(done.results?.compromise).toEqual(studyBestCompromise(done.definition, done.points, undefined, done.basePoint));
    expect(done.results?.tradeOff).toEqual(studyTradeOff(done.definition, done.points, done.basePoint));
    expect(done.results?.compromise.ok).toBe(true);
    // aggregated figures and objectives were rebuilt from the runs (one road, one speed: equal)
    for (const p of done.points) {
      expect(p.figures).toEqual(p.runs[0].figures);
      expect(p.objectives).toEqual([p.figures.bodyAccelWkRms, p.figures.tyreLoadRatio]);
    }
    const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', detail.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['study.created', 'study.results_saved']);
  });

  it('keeps a cancelled run as partial, refuses to call it complete, and completes once the rest is saved', async () => {
    const detail = await newStudy();
    const uploads = uploadsFor(detail);
    await eng.post(`${studies}/${detail.id}/points`, { points: uploads.slice(0, 3) }).expect(200);
    const refused = await put(eng, `${studies}/${detail.id}/results`, { status: 'complete', elapsedMs: 10 }).expect(400);
    expect(ErrorBody.parse(refused.body).error.fields?.[0]).toMatchObject({ path: 'status', message: expect.stringMatching(/^2 points are not saved yet/) });
    const partial = StudyDetail.parse((await put(eng, `${studies}/${detail.id}/results`, { status: 'partial', elapsedMs: 10 }).expect(200)).body);
    expect(partial.status).toBe('partial');
    expect(partial.results).toMatchObject({ savedPoints: 3, plannedPoints: 4 });
    await eng.post(`${studies}/${detail.id}/points`, { points: uploads.slice(3) }).expect(200);
    const full = StudyDetail.parse((await put(eng, `${studies}/${detail.id}/results`, { status: 'partial', elapsedMs: 20 }).expect(200)).body);
    // everything planned is saved: complete, whatever the browser called it
    expect(full.status).toBe('complete');
  });

  it('refuses points that do not belong to the study with field paths, and keeps none of the slice', async () => {
    const detail = await newStudy();
    const [good, second] = uploadsFor(detail);
    const before = await countRows('study_point');
    const wrongRoad = { ...second, runs: [{ ...second.runs[0], roadIndex: 3 }] };
    const r1 = await eng.post(`${studies}/${detail.id}/points`, { points: [good, wrongRoad] }).expect(400);
    expect(fieldPaths(r1.body)).toEqual(['points.1.runs.0']);
    const r2 = await eng.post(`${studies}/${detail.id}/points`, { points: [{ ...good, index: 9 }] }).expect(400);
    expect(fieldPaths(r2.body)).toEqual(['points.0.index']);
    const r3 = await eng.post(`${studies}/${detail.id}/points`, { points: [{ ...good, runs: [{ ...good.runs[0], figures: { bodyAccelWkRms: 'low' } }] }] }).expect(400);
    expect(fieldPaths(r3.body)[0]).toMatch(/^points\.0\.runs\.0\.figures/);
    const r4 = await eng.post(`${studies}/${detail.id}/points`, { points: [good, good] }).expect(400);
    expect(fieldPaths(r4.body)).toEqual(['points.1.index']);
    expect(await countRows('study_point')).toBe(before);
  });

  it('judges limits on the server: a browser cannot save a point as feasible when a run breaks one', async () => {
    const detail = await newStudy({ constraints: { maxStrokeUsed: 0.05 } });
    const uploads = uploadsFor(detail);
    await eng.post(`${studies}/${detail.id}/points`, { points: uploads }).expect(200);
    const done = StudyDetail.parse((await put(eng, `${studies}/${detail.id}/results`, { status: 'complete', elapsedMs: 1 }).expect(200)).body);
    expect(done.points.every((p) => !p.feasible)).toBe(true);
    expect(done.points[0].violations[0]).toMatchObject({ kind: 'maxStrokeUsed', limit: 0.05, roadIndex: 0, speed: 20 });
    expect(done.results?.compromise).toMatchObject({ ok: false, reason: 'no-feasible-point' });
  });
});

describe('studies: baseline, revision, sharing', () => {
  it('only a lead (or admin) marks the baseline, on a saved point', async () => {
    const detail = await newStudy();
    await eng.post(`${studies}/${detail.id}/points`, { points: uploadsFor(detail).slice(0, 2) }).expect(200);
    await put(eng, `${studies}/${detail.id}/baseline`, { pointIndex: 1 }).expect(403);
    const unsaved = await put(ld, `${studies}/${detail.id}/baseline`, { pointIndex: 3 }).expect(400);
    expect(fieldPaths(unsaved.body)).toEqual(['pointIndex']);
    const chosen = StudyDetail.parse((await put(ld, `${studies}/${detail.id}/baseline`, { pointIndex: 1 }).expect(200)).body);
    expect(chosen.baseline).toMatchObject({ pointIndex: 1, label: 'rebound ×0.80, spring rate 38 000 N/m', chosenBy: { name: 'Mara Holt' } });
    const cleared = StudyDetail.parse((await put(ld, `${studies}/${detail.id}/baseline`, { pointIndex: null }).expect(200)).body);
    expect(cleared.baseline).toBeNull();
    const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', detail.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['study.created', 'study.baseline_set', 'study.baseline_cleared']);
  });

  it('opens a point as an unsaved draft (nothing stored); saving it is the engineer\'s act and the same content twice is refused with the revision it matches', async () => {
    const detail = await newStudy();
    const revisionsBefore = SetupDetail.parse((await view.get(`/api/workspaces/${workspaceId}/setups/${fixture.setupId}`).expect(200)).body).latestRevision;
    const draft = StudyPointDraft.parse((await eng.get(`${studies}/${detail.id}/points/3/draft`).expect(200)).body);
    expect(draft).toMatchObject({ setupId: fixture.setupId, setupName: 'Brume Pipit front, baseline', baseRevisionNumber: 1 });
    expect(draft.message).toMatch(/^From study "Rebound against spring", point 4: rebound ×1.40, spring rate 38 000 N\/m \(on revision 1\)$/);
    const expected = applyPoint(detail.baseSetup, { reboundScale: 1.4, springRate: 38000 });
    if (!expected.ok) throw new Error(expected.message);
    expect(draft.setup.damper.rebound).toEqual(expected.setup.damper.rebound);
    expect(draft.setup.springRate).toBe(38000);
    // Opening it twice stores nothing.
    await eng.get(`${studies}/${detail.id}/points/3/draft`).expect(200);
    const untouched = SetupDetail.parse((await view.get(`/api/workspaces/${workspaceId}/setups/${fixture.setupId}`).expect(200)).body);
    expect(untouched.latestRevision).toBe(revisionsBefore);

    const revisions = `/api/workspaces/${workspaceId}/setups/${fixture.setupId}/revisions`;
    const saved = SetupDetail.parse((await eng.post(revisions, { setup: draft.setup, message: draft.message, basedOn: revisionsBefore }).expect(201)).body);
    expect(saved.latestRevision).toBe(revisionsBefore + 1);
    expect(saved.revision.message).toBe(draft.message);
    const again = ErrorBody.parse((await eng.post(revisions, { setup: draft.setup, message: 'second click', basedOn: saved.latestRevision }).expect(409)).body);
    expect(again.error.see).toEqual({ kind: 'setup_revision', setupId: fixture.setupId, number: saved.latestRevision });
    expect(again.error.message).toMatch(new RegExp(`revision ${saved.latestRevision} already holds`));
    // The base revision's own content is refused too, whatever the name says.
    const back = ErrorBody.parse((await eng.post(revisions, { setup: { ...detail.baseSetup, name: 'renamed' }, message: 'back', basedOn: saved.latestRevision }).expect(409)).body);
    expect(back.error.see?.number).toBe(1);
    await eng.get(`${studies}/${detail.id}/points/4/draft`).expect(404);
  });

  it('shares a study read-only by link (signed out), and a signed-in engineer copies it with its setup', async () => {
    const road = await freshRoad(t.db, workspaceId, engineer, { kind: 'iso8608', class: 'C', seed: 5 });
    const detail = await newStudy({ roads: [{ source: 'library', roadId: road.id }] });
    await eng.post(`${studies}/${detail.id}/points`, { points: uploadsFor(detail) }).expect(200);
    await put(eng, `${studies}/${detail.id}/results`, { status: 'complete', elapsedMs: 1 }).expect(200);
    const link = CreatedShareLink.parse((await eng.post(`/api/workspaces/${workspaceId}/share-links`, { objectType: 'study', objectId: detail.id }).expect(201)).body);
    expect(link.link.label).toBe('Study "Rebound against spring"');

    const anon = await fetch(`${t.url}/api/shared/${link.token}`);
    expect(anon.status).toBe(200);
    const text = await anon.text();
    // The public projection: no internal id of the study, its setup and revision, library roads or people.
    const people = await t.db.selectFrom('user').select('id').execute();
    const roadIds = detail.definition.roads.flatMap((r) => (r.source === 'library' ? [r.roadId] : []));
    for (const id of [detail.id, detail.base.setupId, detail.definition.base.revisionId, ...roadIds, ...people.map((p) => p.id)]) {
      if (id) expect(text).not.toContain(id);
    }
    const shared = SharedObject.parse(JSON.parse(text));
    if (shared.objectType !== 'study') throw new Error('expected a study');
    expect(shared.study.points).toHaveLength(4);
    expect(shared.study.status).toBe('complete');

    const copied = (await view.post(`/api/shared/${link.token}/copy`, { workspaceId: otherWorkspaceId }).expect(201)).body as { id: string };
    const copy = StudyDetail.parse((await view.get(`/api/workspaces/${otherWorkspaceId}/studies/${copied.id}`).expect(200)).body);
    expect(copy.points.map((p) => p.figures)).toEqual(shared.study.points.map((p) => p.figures));
    expect(copy.definition.roads[0].source).toBe('inline');
    expect(copy.base.revisionNumber).toBe(1);
    expect(copy.base.setupId).not.toBe(fixture.setupId);
    expect(copy.baseline).toBeNull();
  });

  it('deleting a study removes its points; the share link then says it is gone', async () => {
    const detail = await newStudy();
    await eng.post(`${studies}/${detail.id}/points`, { points: uploadsFor(detail).slice(0, 1) }).expect(200);
    const link = CreatedShareLink.parse((await eng.post(`/api/workspaces/${workspaceId}/share-links`, { objectType: 'study', objectId: detail.id }).expect(201)).body);
    await eng.del(`${studies}/${detail.id}`).expect(204);
    expect(await t.db.selectFrom('study_point').select('idx').where('study_id', '=', detail.id).execute()).toEqual([]);
    await view.get(`${studies}/${detail.id}`).expect(404);
    expect((await fetch(`${t.url}/api/shared/${link.token}`)).status).toBe(410);
  });
});
