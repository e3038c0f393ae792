import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { driveCsv, freshDrive } from '../helpers/road-dyno-fixtures.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { freshSetup, parsed, cornerDocument } from '../helpers/setup-fixtures.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;
let named = 0;

async function setupWithDrive(w: RoleWorld) {
  const doc = cornerDocument(`Drive corner ${++named}`);
  const s = await freshSetup(w.t.db, w.workspaceId, w.members.engineer, doc);
  const drive = await freshDrive(w.t.db, w.workspaceId, s.id, w.members.engineer);
  return { setupId: s.id, driveId: drive.id, doc };
}

/** Matrix entries for measured drives (issue 17, item 3). */
export const drivesEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/setups/:setupId/drives': {
    access: 'viewer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setupWithDrive(w)).setupId}/drives`) }),
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/drives': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({
      path: ws(w, `/setups/${(await freshSetup(w.t.db, w.workspaceId, w.members.engineer)).id}/drives`),
      customize: (r) => r.attach('file', Buffer.from(driveCsv), 'drive.csv'),
    }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId/drives/:driveId': {
    access: 'viewer',
    ok: 200,
    build: async (w) => {
      const { setupId, driveId } = await setupWithDrive(w);
      return { path: ws(w, `/setups/${setupId}/drives/${driveId}`) };
    },
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/drives/:driveId/apply': {
    access: 'engineer',
    ok: 201,
    build: async (w) => {
      const { setupId, driveId, doc } = await setupWithDrive(w);
      const setup = parsed(doc);
      return { path: ws(w, `/setups/${setupId}/drives/${driveId}/apply`), body: { setup: { ...setup, springRate: setup.springRate * 1.05 }, message: 'Fitted spring' } };
    },
  },
};
