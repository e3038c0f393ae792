import { describe, expect, it } from 'vitest';
import { runStudyHere } from '../../../shared/study/run-all.ts';
import { getStudy, listStudies } from '../../studies/studies.service.ts';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { seedDemo } from './seed-demo.ts';

describe('demo study', () => {
  it('seeds a complete Pipit front study whose points rerun to the same figures, with the lead’s baseline on its best compromise', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    await seedDemo(db, new Date('2025-03-10T09:00:00Z'));
    const workspace = await db.selectFrom('workspace').select('id').executeTakeFirstOrThrow();
    const ws = { workspaceId: workspace.id };

    const { studies } = await listStudies(db, ws);
    expect(studies).toHaveLength(1);
    const summary = studies[0];
    expect(summary).toMatchObject({ name: 'Pipit front: rebound against spring rate', status: 'complete', plannedPoints: 16, base: { setupName: 'Brume Pipit front, baseline' } });
    expect(summary.roadNames).toEqual(['Town road, class C', 'Smooth motorway, class B']);
    expect(summary.results?.best).not.toBeNull();
    expect(summary.baseline).toMatchObject({ pointIndex: summary.results?.best?.pointIndex, chosenBy: { name: 'Tomas Reeve' } });

    const detail = await getStudy(db, ws, summary.id);
    if (!detail.ok) throw new Error(detail.message);
    expect(detail.value.points).toHaveLength(16);
    expect(detail.value.basePoint?.runs).toHaveLength(2);
    // same definition, same results: running it again here gives the stored figures exactly
    const again = runStudyHere(detail.value.definition, detail.value.baseSetup, detail.value.roads);
    expect(again.points.map((p) => p.figures)).toEqual(detail.value.points.map((p) => p.figures));

    const audit = await db.selectFrom('audit_log').select('action').where('entity_id', '=', summary.id).orderBy('at').execute();
    expect(audit.map((a) => a.action)).toEqual(['study.created', 'study.results_saved', 'study.baseline_set']);
    await db.destroy();
  }, 30_000);
});
