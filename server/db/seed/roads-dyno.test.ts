import { describe, expect, it } from 'vitest';
import { listSetupDynoFiles } from '../../dyno/dyno-files.service.ts';
import { listRoadLibrary } from '../../roads/roads.service.ts';
import { listSetups } from '../../setups/setups.service.ts';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { seedDemo } from './seed-demo.ts';

describe('demo roads and dyno file', () => {
  it('seeds ISO roads that read back as their own class, two events, an invented measured lane and one dyno file', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    await seedDemo(db, new Date('2025-03-10T09:00:00Z'));
    const workspace = await db.selectFrom('workspace').select('id').executeTakeFirstOrThrow();
    const ws = { workspaceId: workspace.id };

    const { roads } = await listRoadLibrary(db, ws);
    const byName = new Map(roads.map((r) => [r.name, r]));
    expect(byName.get('Smooth motorway, class B')?.figures.iso?.className).toBe('B');
    expect(byName.get('Town road, class C')?.figures.iso?.className).toBe('C');
    expect(byName.get('Broken B-road, class D')?.figures.iso?.className).toBe('D');
    expect(roads.filter((r) => r.kind === 'kerb' || r.kind === 'pothole')).toHaveLength(2);
    const lane = roads.find((r) => r.source === 'measured');
    expect(lane?.figures.points).toBe(3001);
    expect(lane?.figures.iso).not.toBeNull();

    const { setups } = await listSetups(db, ws, { archived: 'exclude' });
    const pipit = setups.find((s) => s.name === 'Brume Pipit front, baseline');
    if (!pipit) throw new Error('no Pipit front setup in the demo');
    const files = await listSetupDynoFiles(db, ws, pipit.id);
    if (!files.ok) throw new Error(files.message);
    expect(files.value.files).toHaveLength(1);
    expect(files.value.files[0].summary.peaks.compression.length).toBeGreaterThan(5);
    await db.destroy();
    // the whole demo seed runs here (every feature's step), which takes a few seconds on a busy machine
  }, 60_000);
});
