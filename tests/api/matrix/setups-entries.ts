import { createVehicle } from '../../../server/vehicles/vehicles.service.ts';
import { cornerDocument, freshSetup, freshShareLink } from '../helpers/setup-fixtures.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import type { RoleWorld } from '../helpers/role-world.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;
const setup = (w: RoleWorld) => freshSetup(w.t.db, w.workspaceId, w.members.engineer);
let named = 0;
const newName = (stem: string) => `${stem} ${++named}`;

async function freshVehicle(w: RoleWorld): Promise<string> {
  const outcome = await createVehicle(w.t.db, { workspaceId: w.workspaceId }, w.members.engineer, { name: newName('Matrix vehicle'), notes: '' }, w.t.clock.now());
  if (!outcome.ok) throw new Error(outcome.message);
  return outcome.value.id;
}

async function freshLink(w: RoleWorld) {
  const s = await setup(w);
  return freshShareLink(w.t.db, w.workspaceId, w.members.engineer, s.revision.id, w.t.clock.now());
}

/** Matrix entries for setups, revisions, vehicles and share links (issue 4). */
export const setupsEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/setups': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/setups') }) },
  'POST /api/workspaces/:workspaceId/setups': {
    access: 'engineer',
    ok: 201,
    build: (w) => ({ path: ws(w, '/setups'), body: { setup: cornerDocument(newName('New corner')), corner: 'front', message: 'Starting point' } }),
  },
  'POST /api/workspaces/:workspaceId/setups/import': {
    access: 'engineer',
    ok: 201,
    build: (w) => ({ path: ws(w, '/setups/import'), body: cornerDocument(newName('Imported corner')) }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}`) }) },
  'PATCH /api/workspaces/:workspaceId/setups/:setupId': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}`), body: { name: newName('Renamed corner') } }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId/revisions': {
    access: 'viewer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}/revisions`) }),
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/revisions': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({
      path: ws(w, `/setups/${(await setup(w)).id}/revisions`),
      body: { setup: cornerDocument('Matrix corner', { sprungMass: 320 }), message: 'Heavier trim', basedOn: 1 },
    }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId/revisions/:number': {
    access: 'viewer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}/revisions/1`) }),
  },
  'POST /api/workspaces/:workspaceId/setups/:setupId/revisions/:number/restore': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}/revisions/1/restore`), body: {} }),
  },
  'GET /api/workspaces/:workspaceId/setups/:setupId/revisions/:number/export': {
    access: 'viewer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/setups/${(await setup(w)).id}/revisions/1/export`) }),
  },

  'GET /api/workspaces/:workspaceId/vehicles': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/vehicles') }) },
  'POST /api/workspaces/:workspaceId/vehicles': { access: 'engineer', ok: 201, build: (w) => ({ path: ws(w, '/vehicles'), body: { name: newName('New vehicle') } }) },
  'GET /api/workspaces/:workspaceId/vehicles/:vehicleId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/vehicles/${await freshVehicle(w)}`) }) },
  'PATCH /api/workspaces/:workspaceId/vehicles/:vehicleId': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/vehicles/${await freshVehicle(w)}`), body: { frontSetupId: (await setup(w)).id } }),
  },
  'DELETE /api/workspaces/:workspaceId/vehicles/:vehicleId': { access: 'engineer', ok: 204, build: async (w) => ({ path: ws(w, `/vehicles/${await freshVehicle(w)}`) }) },

  'GET /api/workspaces/:workspaceId/share-links': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/share-links') }) },
  'POST /api/workspaces/:workspaceId/share-links': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({ path: ws(w, '/share-links'), body: { objectType: 'setup_revision', objectId: (await setup(w)).revision.id } }),
  },
  'DELETE /api/workspaces/:workspaceId/share-links/:linkId': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/share-links/${(await freshLink(w)).linkId}`) }),
  },

  'GET /api/shared/:token': { access: 'public', ok: 200, build: async (w) => ({ path: `/api/shared/${(await freshLink(w)).token}` }) },
  'POST /api/shared/:token/copy': {
    access: { anyWorkspace: 'engineer' },
    ok: 201,
    // the stranger administers only their own workspace, so they copy into that one
    build: async (w, caller) => ({
      path: `/api/shared/${(await freshLink(w)).token}/copy`,
      body: { workspaceId: caller === 'stranger' ? w.otherWorkspaceId : w.workspaceId },
    }),
  },
};
