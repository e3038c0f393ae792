import { saveRun } from '../../../server/runs/runs.service.ts';
import { SaveRunInput } from '../../../shared/schemas/run-record.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { exampleSetup, insertSetup, saveBody, type SetupFixture } from '../helpers/runs.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;

const fixtures = new WeakMap<RoleWorld, Promise<SetupFixture>>();
/** One setup per role world, shared by every cell. */
function setupOf(w: RoleWorld): Promise<SetupFixture> {
  let f = fixtures.get(w);
  if (!f) {
    f = insertSetup(w.t.db, w.workspaceId, w.members.engineer.id, [exampleSetup()]);
    fixtures.set(w, f);
  }
  return f;
}

/** A saved run made through the service (as the engineer), for reading or deleting. */
async function freshRun(w: RoleWorld): Promise<string> {
  const fixture = await setupOf(w);
  const body = SaveRunInput.parse(saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, exampleSetup(), { name: 'Matrix run' }));
  const e = w.members.engineer;
  const outcome = await saveRun(w.t.db, { workspaceId: w.workspaceId, workspaceName: 'Matrix workspace', role: 'engineer' }, { id: e.id, name: e.name, email: e.email, sessionVersion: 0, emailVerified: true }, body, w.t.clock.now());
  if (!outcome.ok) throw new Error(outcome.message);
  return outcome.value.id;
}

/** Matrix entries for saved runs. */
export const runsEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/runs': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/runs') }) },
  'POST /api/workspaces/:workspaceId/runs': {
    access: 'engineer',
    ok: 201,
    build: async (w) => {
      const fixture = await setupOf(w);
      return { path: ws(w, '/runs'), body: saveBody({ setupId: fixture.setupId, revisionNumber: 1 }, exampleSetup(), { name: 'Matrix save' }) };
    },
  },
  'GET /api/workspaces/:workspaceId/runs/:runId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/runs/${await freshRun(w)}`) }) },
  'DELETE /api/workspaces/:workspaceId/runs/:runId': { access: 'engineer', ok: 204, build: async (w) => ({ path: ws(w, `/runs/${await freshRun(w)}`) }) },
};
