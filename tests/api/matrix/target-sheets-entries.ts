import type { TargetSheetStatus } from '../../../shared/schemas/target-sheet.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { peaksCsv } from '../helpers/road-dyno-fixtures.ts';
import type { RoleWorld } from '../helpers/role-world.ts';
import { freshSetup } from '../helpers/setup-fixtures.ts';
import { freshCheck, freshSheet, type SheetCast } from '../helpers/target-sheet-fixtures.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}/target-sheets${rest}`;

async function cast(w: RoleWorld): Promise<SheetCast> {
  const row = await w.t.db.selectFrom('workspace').select('name').where('id', '=', w.workspaceId).executeTakeFirstOrThrow();
  return { workspaceId: w.workspaceId, workspaceName: row.name, engineer: w.members.engineer, lead: w.members.lead };
}

/** A fresh sheet in `status`, so each caller acts on a sheet nobody else has moved. */
async function sheet(w: RoleWorld, status: TargetSheetStatus = 'draft'): Promise<string> {
  return (await freshSheet(w.t, await cast(w), status)).sheet.id;
}

const content = { compression: [{ velocity: 0.1, force: 300, tolPct: 10, floorN: 20 }], rebound: [{ velocity: 0.1, force: 700, tolPct: 10, floorN: 20 }], gasForce: 150, notes: 'Matrix edit' };

/** Matrix entries for damper target sheets (issue 7). */
export const targetSheetsEntries: MatrixEntries = {
  'GET /api/workspaces/:workspaceId/target-sheets': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w) }) },
  'POST /api/workspaces/:workspaceId/target-sheets': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({ path: ws(w), body: { setupId: (await freshSetup(w.t.db, w.workspaceId, w.members.engineer)).id, revision: 1 } }),
  },
  'GET /api/workspaces/:workspaceId/target-sheets/:sheetId': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/${await sheet(w)}`) }) },
  'PUT /api/workspaces/:workspaceId/target-sheets/:sheetId': { access: 'engineer', ok: 200, build: async (w) => ({ path: ws(w, `/${await sheet(w)}`), body: content }) },
  'DELETE /api/workspaces/:workspaceId/target-sheets/:sheetId': { access: 'engineer', ok: 204, build: async (w) => ({ path: ws(w, `/${await sheet(w)}`) }) },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/submit': { access: 'engineer', ok: 200, build: async (w) => ({ path: ws(w, `/${await sheet(w)}/submit`) }) },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/release': {
    access: 'lead',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/${await sheet(w, 'in_review')}/release`) }),
  },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/return': {
    access: 'lead',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/${await sheet(w, 'in_review')}/return`), body: { reason: 'Rebound at 0.1 m/s looks high' } }),
  },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/reopen': {
    access: 'engineer',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/${await sheet(w, 'returned')}/reopen`) }),
  },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/supersede': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({ path: ws(w, `/${await sheet(w, 'released')}/supersede`), body: {} }),
  },
  'GET /api/workspaces/:workspaceId/target-sheets/:sheetId/csv': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/${await sheet(w)}/csv`) }) },
  'GET /api/workspaces/:workspaceId/target-sheets/:sheetId/checks': { access: 'viewer', ok: 200, build: async (w) => ({ path: ws(w, `/${await sheet(w)}/checks`) }) },
  'POST /api/workspaces/:workspaceId/target-sheets/:sheetId/checks': {
    access: 'engineer',
    ok: 201,
    build: async (w) => ({
      path: ws(w, `/${await sheet(w, 'released')}/checks`),
      customize: (r) => r.field('label', 'PF-0143').attach('file', Buffer.from(peaksCsv), 'pf-0143.csv'),
    }),
  },
  'GET /api/workspaces/:workspaceId/target-sheets/:sheetId/checks/:checkId/csv': {
    access: 'viewer',
    ok: 200,
    build: async (w) => {
      const id = await sheet(w, 'released');
      const check = await freshCheck(w.t, await cast(w), id, peaksCsv);
      return { path: ws(w, `/${id}/checks/${check.id}/csv`) };
    },
  },
};
