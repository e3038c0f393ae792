import { describe, expect, it } from 'vitest';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { listSheetChecks } from '../../target-sheets/checks.service.ts';
import { listTargetSheets } from '../../target-sheets/target-sheets.service.ts';
import { seedDemo } from './seed-demo.ts';

describe('demo target sheets', () => {
  it('seeds a released Pipit front sheet approved by the lead with one dyno check, and one draft', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    await seedDemo(db, new Date('2026-03-10T09:00:00Z'));
    const ws = await db.selectFrom('workspace').selectAll().executeTakeFirstOrThrow();
    const { sheets } = await listTargetSheets(db, { workspaceId: ws.id, workspaceName: ws.name, role: 'viewer' });
    expect(sheets.map((s) => s.status).sort()).toEqual(['draft', 'released']);
    const released = sheets.find((s) => s.status === 'released')!;
    expect(released).toMatchObject({ setupName: 'Brume Pipit front, baseline', author: { name: 'Ines Marlow' }, approver: { name: 'Tomas Reeve' } });
    expect(released.number).toBe('TS-TBC-2026-0001');
    expect(Date.parse(released.submittedAt!)).toBeLessThan(Date.parse(released.decidedAt!));
    const checks = await listSheetChecks(db, { workspaceId: ws.id }, released.id);
    if (!checks.ok) throw new Error(checks.message);
    expect(checks.value.checks).toHaveLength(1);
    // One unit inside every band, one with rebound high at speed (see the offsets in the seed).
    expect(checks.value.checks[0].report.dampers.map((d) => [d.label, d.pass])).toEqual([
      ['PF-0151', true],
      ['PF-0152', false],
    ]);
    await db.destroy();
  });
});
