import { describe, expect, it } from 'vitest';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { listRuns } from '../../runs/runs.service.ts';
import { seedDemo } from './seed-demo.ts';

describe('demo runs seed', () => {
  it('saves runs of the demo setups, the oldest marked as from a superseded revision', async () => {
    const db = openDatabase(':memory:');
    const { error } = await migrateToLatest(db);
    expect(error).toBeUndefined();
    await seedDemo(db, new Date('2025-03-01T10:00:00Z'));
    const ws = await db.selectFrom('workspace').select('id').executeTakeFirstOrThrow();
    const { runs } = await listRuns(db, { workspaceId: ws.id, workspaceName: '', role: 'viewer' }, {});
    expect(runs.length).toBe(2);
    const old = runs.find((r) => r.name.startsWith('Pipit front r1'));
    expect(old && old.latestRevision > old.revisionNumber).toBe(true);
    for (const r of runs) expect(r.headline.bodyAccelWkRms).toBeGreaterThan(0);
    await db.destroy();
  }, 60_000);
});
