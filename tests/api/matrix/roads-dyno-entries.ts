import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { freshDynoFile, freshRoad, measuredCsv, peaksCsv } from '../helpers/road-dyno-fixtures.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { freshSetup } from '../helpers/setup-fixtures.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;
const road = (w: RoleWorld) => freshRoad(w.t.db, w.workspaceId, w.members.engineer);
const setup = (w: RoleWorld) => freshSetup(w.t.db, w.workspaceId, w.members.engineer);
let named = 0;

async function setupWithFile(w: RoleWorld) {
  const s = await setup(w);
  const file = await freshDynoFile(w.t.db, w.workspaceId, s.id, w.members.engineer);
  return { setupId: s.id, fileId: file.id };
}

/** Matrix entries for the road library and dyno files (issue 4). */
export const roadsDynoEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/roads': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/roads') }) },
  'POST /api/workspaces/:workspaceId/roads': {
    access: 'engineer',
    ok: 201,
    build: (w) => ({ path: ws(w, '/roads'), body: { name: `Matrix road ${++named}`, definition: { kind: 'iso8608', class: 'C', seed: 4 } } }),
  },
  'POST /api/workspaces/:workspaceId/roads/measured': {
    access: 'engineer',
    ok: 201,
    build: (w) => ({
      path: ws(w, '/roads/measured'),
      customize: (r) => r.field('name', `Matrix measured ${++named}`).attach('file', Buffer.from(measuredCsv(200)), 'profile.csv'),
    }),
  },
  'GET /api/workspaces/:workspaceId/roads/:roadId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/roads/${(await road(w)).id}`) }) },
  'PUT /api/workspaces/:workspaceId/roads/:roadId': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/roads/${(await road(w)).id}`), body: { name: `Renamed road ${++named}` } }),
  },
  'DELETE /api/workspaces/:workspaceId/roads/:roadId': { access: 'engineer', ok: 204, build: async (w) => ({ path: ws(w, `/roads/${(await road(w)).id}`) }) },

  'GET /api/workspaces/:workspaceId/setups/:setupId/dyno-files': {
    access: 'viewer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setupWithFile(w)).setupId}/dyno-files`) }),
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/dyno-files': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({
      path: ws(w, `/setups/${(await setup(w)).id}/dyno-files`),
      customize: (r) => r.attach('file', Buffer.from(peaksCsv), 'peaks.csv'),
    }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId/dyno-files/:fileId': {
    access: 'viewer',
    ok: 200,
    build: async (w) => {
      const { setupId, fileId } = await setupWithFile(w);
      return { path: ws(w, `/setups/${setupId}/dyno-files/${fileId}`) };
    },
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/dyno-files/:fileId/apply': {
    access: 'engineer',
    ok: 201,
    build: async (w) => {
      const { setupId, fileId } = await setupWithFile(w);
      return { path: ws(w, `/setups/${setupId}/dyno-files/${fileId}/apply`), body: { knots: [0.05, 0.1, 0.3, 0.6], directions: ['compression', 'rebound'], message: 'Fitted to the dyno' } };
    },
  },
};
