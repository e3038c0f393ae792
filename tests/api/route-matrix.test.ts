import { afterAll, describe, expect, it } from 'vitest';
import { routeKey } from '../../server/http/registry.ts';
import { allEntries } from './matrix/all-entries.ts';
import { expectedFor, sendAs } from './helpers/route-matrix.ts';
import { callers, createRoleWorld } from './helpers/role-world.ts';
import { createTestApp } from './helpers/test-app.ts';
import { memoryFleetQueue } from './helpers/memory-fleet-queue.ts';

// Walks every route the app mounts × every kind of caller and checks the status the route's
// declared access implies: 401 signed out, 404 for a member of another workspace, 403 for a
// role too low, and the route's success status otherwise.

const t = await createTestApp({ fleet: memoryFleetQueue() });
const world = await createRoleWorld(t);
afterAll(() => t.close());

const auditCount = async () => Number((await t.db.selectFrom('audit_log').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);

describe('route × role matrix', () => {
  it('has an entry for every mounted route, and no entry for a route that does not exist', () => {
    const mounted = t.routes.map(routeKey).sort();
    const missing = mounted.filter((k) => !(k in allEntries));
    const stale = Object.keys(allEntries).filter((k) => !mounted.includes(k));
    expect(missing, 'routes without a matrix entry (add one in tests/api/matrix/)').toEqual([]);
    expect(stale, 'matrix entries for routes that are not mounted').toEqual([]);
  });

  describe.each(t.routes.map((r) => [routeKey(r), r] as const))('%s', (key, route) => {
    it.each(callers)('as %s', async (caller) => {
      const entry = allEntries[key];
      expect(entry, `no matrix entry for ${key}`).toBeDefined();
      expect(route.access, 'declared access differs from the access the matrix entry requires').toEqual(entry.access);
      const req = await entry.build(world, caller);
      const want = expectedFor(route.access, caller, entry.ok);
      const before = await auditCount();
      const res = await sendAs(world, route.method, req, caller);
      expect({ status: res.status, code: res.body?.error?.code }, JSON.stringify(res.body)).toEqual({ status: want.status, code: want.code });
      // A refused request leaves no trace: every write is audited, so the log must not grow.
      if (want.status >= 400) expect(await auditCount()).toBe(before);
    });
  });

  it('answers a workspace that does not exist exactly as one the caller is not in', async () => {
    const missing = await sendAs(world, 'get', { path: '/api/workspaces/no-such-workspace/members' }, 'admin');
    const foreign = await sendAs(world, 'get', { path: `/api/workspaces/${world.otherWorkspaceId}/members` }, 'admin');
    expect(missing.status).toBe(404);
    expect(foreign.status).toBe(404);
    expect(foreign.body).toEqual(missing.body);
  });
});
