import { describe, expect, it } from 'vitest';
import { verifyPassword } from '../../auth/password.ts';
import { openDatabase } from '../database.ts';
import { migrateToLatest } from '../migrator.ts';
import { DEMO_PASSWORD, DEMO_USERS, DEMO_WORKSPACE_NAME } from '../../core/demo-people.ts';
import { seedDemo } from './seed-demo.ts';

describe('seedDemo', () => {
  it('seeds one workspace with one member per role, once', async () => {
    const db = openDatabase(':memory:');
    await migrateToLatest(db);
    expect(await seedDemo(db)).toEqual({ seeded: true });
    expect(await seedDemo(db)).toEqual({ seeded: false });

    const rows = await db
      .selectFrom('membership')
      .innerJoin('user', 'user.id', 'membership.user_id')
      .innerJoin('workspace', 'workspace.id', 'membership.workspace_id')
      .select(['user.email', 'user.password_hash', 'membership.role', 'workspace.name'])
      .execute();
    expect(rows.map((r) => [r.email, r.role]).sort()).toEqual(DEMO_USERS.map((u) => [u.email, u.role]).sort());
    expect(new Set(rows.map((r) => r.name))).toEqual(new Set([DEMO_WORKSPACE_NAME]));
    expect(await verifyPassword(DEMO_PASSWORD, rows[0].password_hash)).toBe(true);
    await db.destroy();
    // seeding runs simulations (demo saved runs): give it room on a loaded machine
  }, 30_000);
});
