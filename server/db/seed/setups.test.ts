import { describe, expect, it } from 'vitest';
import { tableForce } from '../../../shared/sim/damper-force.ts';
import { getVehicle, listVehicles } from '../../vehicles/vehicles.service.ts';
import { listSetups } from '../../setups/setups.service.ts';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { seedDemo } from './seed-demo.ts';

describe('demo setups', () => {
  it('seeds three vehicles whose corners sit where the team put them', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    await seedDemo(db, new Date('2025-03-10T09:00:00Z'));
    const workspace = await db.selectFrom('workspace').select('id').executeTakeFirstOrThrow();
    const ws = { workspaceId: workspace.id };

    const { vehicles } = await listVehicles(db, ws);
    expect(vehicles.map((v) => v.name)).toEqual(['Brume Corrie', 'Brume Pipit', 'Brume Skerry']);
    for (const v of vehicles) {
      // every demo car: both corners grouped, rear body frequency at or a little above the front (common flat-ride practice)
      expect(v.front && v.rear).toBeTruthy();
      expect(v.bodyRatio).toBeGreaterThan(1.0);
      expect(v.bodyRatio).toBeLessThan(1.2);
    }
    const pipit = await getVehicle(db, ws, vehicles[1].id);
    if (!pipit.ok) throw new Error(pipit.message);
    expect(pipit.value.analysis.front?.modal.body.naturalHz).toBeCloseTo(1.2, 1);
    expect(pipit.value.analysis.rear?.modal.body.naturalHz).toBeCloseTo(1.35, 1);

    const { setups } = await listSetups(db, ws, { archived: 'exclude' });
    expect(setups).toHaveLength(6);
    for (const s of setups) {
      // body 1.0–2.0 Hz, wheel hop 10–16 Hz, body damping ratio 0.2–0.4 (common practice for road cars)
      expect(s.figures?.bodyHz).toBeGreaterThan(1.0);
      expect(s.figures?.bodyHz).toBeLessThan(2.0);
      expect(s.figures?.wheelHopHz).toBeGreaterThan(10);
      expect(s.figures?.wheelHopHz).toBeLessThan(16);
      expect(s.figures?.bodyDampingRatio).toBeGreaterThan(0.2);
      expect(s.figures?.bodyDampingRatio).toBeLessThan(0.4);
    }

    const front = setups.find((s) => s.name === 'Brume Pipit front, baseline');
    expect(front?.latestRevision).toBe(3);
    const revisions = await db
      .selectFrom('setup_revision')
      .innerJoin('user', 'user.id', 'setup_revision.author_id')
      .select(['setup_revision.document', 'user.name'])
      .where('setup_id', '=', front?.id ?? '')
      .orderBy('number')
      .execute();
    expect(new Set(revisions.map((r) => r.name)).size).toBe(2);
    const first = JSON.parse(revisions[0].document);
    // rebound about twice compression at the same speed (common practice), digressive (force per speed falls)
    expect(tableForce(first.damper.rebound, 0.3) / tableForce(first.damper.compression, 0.3)).toBeCloseTo(2, 1);
    expect(tableForce(first.damper.compression, 0.5) / 0.5).toBeLessThan(tableForce(first.damper.compression, 0.08) / 0.08);
    await db.destroy();
  });
});
