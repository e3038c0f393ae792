import type { MatrixEntries } from '../helpers/route-matrix.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { exampleSetup, insertSetup } from '../helpers/runs.ts';
import { createStudyFixture, studyDefinition, uploadsFor } from '../helpers/study-fixtures.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;

const setups = new WeakMap<RoleWorld, Promise<{ setupId: string; revisionId: string }>>();
/** One base setup per role world, shared by every cell. */
function setupOf(w: RoleWorld) {
  let s = setups.get(w);
  if (!s) {
    s = insertSetup(w.t.db, w.workspaceId, w.members.engineer.id, [exampleSetup()]).then((f) => ({ setupId: f.setupId, revisionId: f.revisionIds[0] }));
    setups.set(w, s);
  }
  return s;
}

/** A fresh study by the engineer, for each cell that reads or changes one. */
async function fresh(w: RoleWorld, results: 'none' | 'first-point' | 'complete' = 'none') {
  return createStudyFixture(w.t.db, w.workspaceId, w.members.engineer, { results, setup: await setupOf(w) });
}

/** Matrix entries for studies. */
export const studiesEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/studies': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/studies') }) },
  'POST /api/workspaces/:workspaceId/studies': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({ path: ws(w, '/studies'), body: { definition: studyDefinition(await setupOf(w)) } }),
  },
  'GET /api/workspaces/:workspaceId/studies/:studyId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/studies/${(await fresh(w)).studyId}`) }) },
  'DELETE /api/workspaces/:workspaceId/studies/:studyId': { access: 'engineer', ok: 204, build: async (w) => ({ path: ws(w, `/studies/${(await fresh(w)).studyId}`) }) },
  'POST /api/workspaces/:workspaceId/studies/:studyId/points': {
    access: 'engineer',
    ok: 200,
    build: async (w) => {
      const f = await fresh(w);
      return { path: ws(w, `/studies/${f.studyId}/points`), body: { points: uploadsFor(f.detail).slice(0, 1) } };
    },
  },
  'PUT /api/workspaces/:workspaceId/studies/:studyId/results': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/studies/${(await fresh(w, 'first-point')).studyId}/results`), body: { status: 'partial', elapsedMs: 250 } }),
  },
  'PUT /api/workspaces/:workspaceId/studies/:studyId/baseline': {
    access: 'lead',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/studies/${(await fresh(w, 'first-point')).studyId}/baseline`), body: { pointIndex: 0 } }),
  },
  'GET /api/workspaces/:workspaceId/studies/:studyId/points/:index/draft': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/studies/${(await fresh(w)).studyId}/points/1/draft`) }),
  },
};
