import { startFleetRun } from '../../../server/fleet/fleet.service.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { exampleSetup, insertSetup } from '../helpers/runs.ts';
import { createStudyFixture } from '../helpers/study-fixtures.ts';

const fleet = (w: RoleWorld, studyId: string, rest = '') => `/api/workspaces/${w.workspaceId}/studies/${studyId}/fleet${rest}`;

async function fresh(w: RoleWorld) {
  const s = await insertSetup(w.t.db, w.workspaceId, w.members.engineer.id, [exampleSetup()]);
  return (await createStudyFixture(w.t.db, w.workspaceId, w.members.engineer, { setup: { setupId: s.setupId, revisionId: s.revisionIds[0] } })).studyId;
}

/** A study already running on the (in-memory) queue, for the cancel cell. */
async function running(w: RoleWorld) {
  const id = await fresh(w);
  const started = await startFleetRun(w.t.db, w.t.deps.fleet, { workspaceId: w.workspaceId }, w.members.engineer, id, new Date());
  if (!started.ok) throw new Error(started.message);
  return id;
}

/** Matrix entries for studies on the team's workers (the matrix app has an in-memory queue). */
export const fleetEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/studies/:studyId/fleet': { access: 'viewer', ok: 200, build: async (w) => ({ path: fleet(w, await fresh(w)) }) },
  'POST /api/workspaces/:workspaceId/studies/:studyId/fleet': { access: 'engineer', ok: 202, build: async (w) => ({ path: fleet(w, await fresh(w)) }) },
  'POST /api/workspaces/:workspaceId/studies/:studyId/fleet/cancel': { access: 'engineer', ok: 200, build: async (w) => ({ path: fleet(w, await running(w), '/cancel') }) },
  // A study that never ran: the stream sends its one state (none) and ends.
  'GET /api/workspaces/:workspaceId/studies/:studyId/fleet/events': { access: 'viewer', ok: 200, build: async (w) => ({ path: fleet(w, await fresh(w), '/events') }) },
};
