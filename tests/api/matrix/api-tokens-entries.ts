import { createApiToken } from '../../../server/api-tokens/api-tokens.service.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { type Caller, type RoleWorld, userOfCaller } from '../helpers/role-world.ts';

/** A workspace the caller belongs to (the stranger administers the other one). */
const workspaceOfCaller = (w: RoleWorld, caller: Caller) => (caller === 'stranger' ? w.otherWorkspaceId : w.workspaceId);

/** A fresh read token of the caller (of the admin for a signed-out caller, who is refused anyway). */
async function freshToken(w: RoleWorld, caller: Caller): Promise<string> {
  const owner = userOfCaller(w, caller) ?? w.members.admin;
  const made = await createApiToken(w.t.db, owner, { workspaceId: workspaceOfCaller(w, caller), name: 'Matrix token', scope: 'read' }, w.t.clock.now());
  if (!made.ok) throw new Error(`fixture api token refused: ${made.message}`);
  return made.value.apiToken.id;
}

/** Personal API tokens: every signed-in person manages their own. */
export const apiTokensEntries: MatrixEntries = {
  'GET /api/account/api-tokens': { access: 'user', ok: 200, build: () => ({ path: '/api/account/api-tokens' }) },
  'POST /api/account/api-tokens': {
    access: 'user',
    ok: 201,
    build: (w, caller) => ({ path: '/api/account/api-tokens', body: { workspaceId: workspaceOfCaller(w, caller), name: 'Nightly sweep', scope: 'read' } }),
  },
  'DELETE /api/account/api-tokens/:tokenId': {
    access: 'user',
    ok: 204,
    build: async (w, caller) => ({ path: `/api/account/api-tokens/${await freshToken(w, caller)}` }),
  },
};
