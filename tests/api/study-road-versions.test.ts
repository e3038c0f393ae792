// Studies refer to library roads by id and version (migration 0012) instead of storing copies:
// a study naming one big measured road four times stores none of it, still runs the version it
// was made with after the library road is redefined or removed, and what it does store counts in
// the workspace's upload quota.
import { afterAll, describe, expect, it } from 'vitest';
import { deleteRoad, updateRoad } from '../../server/roads/roads.service.ts';
import { createStudy, getStudy } from '../../server/studies/studies.service.ts';
import { storedUploadBytes } from '../../server/uploads/upload-usage.repository.ts';
import { Road } from '../../shared/schemas/road.ts';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { freshRoad } from './helpers/road-dyno-fixtures.ts';
import { exampleSetup, insertSetup } from './helpers/runs.ts';
import { studyDefinition } from './helpers/study-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());
const workspaceId = await createWorkspace(t.db, 'Versions bench');
const engineer = await createUser(t.db, { name: 'Orla Fenn' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
const ws = { workspaceId };
const actor = { id: engineer.id, name: engineer.name };
const fixture = await insertSetup(t.db, workspaceId, engineer.id, [exampleSetup()]);
const base = { setupId: fixture.setupId, revisionId: fixture.revisionIds[0] };

/** A measured profile of `n` points (about 40 bytes of JSON each). */
const profile = (n: number, amplitude: number): Road =>
  Road.parse({ kind: 'measured', points: Array.from({ length: n }, (_, i) => [i * 0.1, amplitude * Math.sin(i / 7)]) });

async function studyOn(roadId: string, times: number) {
  const definition = StudyDefinition.parse(studyDefinition(base, { roads: Array.from({ length: times }, () => ({ source: 'library' as const, roadId })) }));
  const created = await createStudy(t.db, ws, actor, { definition }, new Date());
  if (!created.ok) throw new Error(created.message);
  return created.value;
}
const storedRow = (id: string) => t.db.selectFrom('study').select(['roads', 'road_refs', 'definition']).where('id', '=', id).executeTakeFirstOrThrow();

describe('studies refer to library roads by version', () => {
  it('stores no copy of a road named four times, and reads it back four times', async () => {
    const road = await freshRoad(t.db, workspaceId, engineer, profile(20_000, 0.01));
    const study = await studyOn(road.id, 4);
    const row = await storedRow(study.id);
    expect(row.roads).toBe('[]');
    expect(JSON.parse(row.road_refs ?? 'null')).toEqual(Array.from({ length: 4 }, () => ({ roadId: road.id, version: 1 })));
    // what the study itself keeps is small next to the road (about 0.8 MB)
    expect(row.definition.length + (row.road_refs ?? '').length).toBeLessThan(10_000);
    expect(study.roads).toHaveLength(4);
    for (const r of study.roads) expect(r).toEqual(road.definition);
  });

  it('runs the version it was made with after the road is redefined, then removed', async () => {
    const road = await freshRoad(t.db, workspaceId, engineer, profile(500, 0.01));
    const study = await studyOn(road.id, 1);
    const redefined = await updateRoad(t.db, ws, actor, road.id, { definition: profile(500, 0.02) }, new Date());
    expect(redefined.ok).toBe(true);
    const version = await t.db.selectFrom('road').select('version').where('id', '=', road.id).executeTakeFirstOrThrow();
    expect(version.version).toBe(2);
    const after = await getStudy(t.db, ws, study.id);
    expect(after.ok && after.value.roads[0]).toEqual(road.definition);
    // a second change keeps nothing more: no study refers to version 2
    await updateRoad(t.db, ws, actor, road.id, { definition: profile(500, 0.03) }, new Date());
    const kept = await t.db.selectFrom('road_version').select('version').where('road_id', '=', road.id).execute();
    expect(kept.map((k) => k.version)).toEqual([1]);
    // a study made now refers to version 3, which removal keeps
    const later = await studyOn(road.id, 1);
    expect((await deleteRoad(t.db, ws, actor, road.id, new Date())).ok).toBe(true);
    const first = await getStudy(t.db, ws, study.id);
    const second = await getStudy(t.db, ws, later.id);
    expect(first.ok && first.value.roads[0]).toEqual(road.definition);
    expect(second.ok && (second.value.roads[0] as { points: [number, number][] }).points[7][1]).toBeCloseTo(0.03 * Math.sin(1), 12);
  });

  it('still reads a study saved before versions, from its own road copies', async () => {
    const road = await freshRoad(t.db, workspaceId, engineer, profile(300, 0.01));
    const study = await studyOn(road.id, 1);
    const copy = { ...road.definition, name: 'Copied long ago' };
    await t.db.updateTable('study').set({ road_refs: null, roads: JSON.stringify([copy]) }).where('id', '=', study.id).execute();
    const read = await getStudy(t.db, ws, study.id);
    expect(read.ok && read.value.roads).toEqual([copy]);
  });

  it('counts what studies and kept road versions store in the upload quota', async () => {
    const quotaWs = await createWorkspace(t.db, 'Quota bench');
    await addMember(t.db, quotaWs, engineer.id, 'engineer');
    const before = await storedUploadBytes(t.db, quotaWs);
    const setup = await insertSetup(t.db, quotaWs, engineer.id, [exampleSetup()]);
    const definition = StudyDefinition.parse(studyDefinition({ setupId: setup.setupId, revisionId: setup.revisionIds[0] }));
    const created = await createStudy(t.db, { workspaceId: quotaWs }, actor, { definition }, new Date());
    if (!created.ok) throw new Error(created.message);
    const row = await t.db.selectFrom('study').select(['definition', 'base_document', 'roads']).where('id', '=', created.value.id).executeTakeFirstOrThrow();
    const bytes = Buffer.byteLength(row.definition) + Buffer.byteLength(row.base_document) + Buffer.byteLength(row.roads);
    expect((await storedUploadBytes(t.db, quotaWs)) - before).toBe(bytes);
  });
});
