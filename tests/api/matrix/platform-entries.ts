import { randomUUID } from 'node:crypto';
import { hashOneTimeToken, newOneTimeToken } from '../../../server/core/one-time-tokens.ts';
import type { MatrixEntries } from '../helpers/route-matrix.ts';
import { addMember, createUser, TEST_PASSWORD, uniqueEmail } from '../helpers/people.ts';
import { type Caller, type RoleWorld, userOfCaller } from '../helpers/role-world.ts';

const ws = (w: RoleWorld, rest = '') => `/api/workspaces/${w.workspaceId}${rest}`;

/** A live invitation to a new address, inserted directly; returns its id and raw token. */
async function freshInvitation(w: RoleWorld): Promise<{ id: string; token: string }> {
  const { token, hash } = newOneTimeToken();
  const id = randomUUID();
  const now = w.t.clock.now();
  await w.t.db
    .insertInto('invitation')
    .values({
      id,
      workspace_id: w.workspaceId,
      email: uniqueEmail('invitee'),
      role: 'viewer',
      token_hash: hash,
      invited_by: w.members.admin.id,
      created_at: now.toISOString(),
      expires_at: new Date(now.getTime() + 86_400_000).toISOString(),
      accepted_at: null,
    })
    .execute();
  return { id, token };
}

async function freshMember(w: RoleWorld): Promise<string> {
  const u = await createUser(w.t.db, { name: 'Matrix target' });
  await addMember(w.t.db, w.workspaceId, u.id, 'viewer');
  return u.id;
}

async function freshResetToken(w: RoleWorld): Promise<string> {
  const token = `reset-${randomUUID()}`;
  const now = w.t.clock.now();
  await w.t.db
    .insertInto('password_reset')
    .values({ id: randomUUID(), user_id: w.spare.id, token_hash: hashOneTimeToken(token), created_at: now.toISOString(), expires_at: new Date(now.getTime() + 600_000).toISOString(), used_at: null })
    .execute();
  return token;
}

/** A live address-confirmation token for a new unconfirmed account. */
async function freshAddressToken(w: RoleWorld): Promise<string> {
  const user = await createUser(w.t.db, { unconfirmed: true });
  const token = `confirm-${randomUUID()}`;
  const now = w.t.clock.now();
  await w.t.db
    .insertInto('email_verification')
    .values({ id: randomUUID(), user_id: user.id, token_hash: hashOneTimeToken(token), created_at: now.toISOString(), expires_at: new Date(now.getTime() + 600_000).toISOString(), used_at: null })
    .execute();
  return token;
}

function callerPassword(w: RoleWorld, caller: Caller): string {
  return userOfCaller(w, caller)?.password ?? TEST_PASSWORD;
}

/** Matrix entries for the platform routes (config, auth, invitations, workspaces, members, audit, outbox). */
export const platformEntries: MatrixEntries = {
  'GET /api/config': { access: 'public', ok: 200, build: () => ({ path: '/api/config' }) },

  'POST /api/auth/signup': {
    access: 'public',
    ok: 202,
    build: () => ({ path: '/api/auth/signup', body: { name: 'New Person', email: uniqueEmail('signup'), password: 'long-enough-pw', workspaceName: 'Fresh bench' } }),
  },
  'POST /api/auth/confirm': { access: 'public', ok: 200, build: async (w) => ({ path: '/api/auth/confirm', body: { token: await freshAddressToken(w) } }) },
  'POST /api/auth/confirm/resend': {
    access: 'user',
    ok: 202,
    // Only an unconfirmed address gets a new link: each caller is made unconfirmed first.
    build: async (w, caller) => {
      const user = userOfCaller(w, caller);
      if (user) await w.t.db.updateTable('user').set({ email_verified_at: null }).where('id', '=', user.id).execute();
      return { path: '/api/auth/confirm/resend' };
    },
  },
  'POST /api/auth/signin': { access: 'public', ok: 200, build: (w) => ({ path: '/api/auth/signin', body: { email: w.spare.email, password: w.spare.password } }) },
  'POST /api/auth/signout': { access: 'public', ok: 204, build: () => ({ path: '/api/auth/signout' }) },
  'GET /api/auth/me': { access: 'public', ok: 200, build: () => ({ path: '/api/auth/me' }) },
  'POST /api/auth/password': {
    access: 'user',
    ok: 204,
    build: (w, caller) => ({ path: '/api/auth/password', body: { currentPassword: callerPassword(w, caller), newPassword: callerPassword(w, caller) } }),
  },
  'PUT /api/account/units': {
    access: 'user',
    ok: 200,
    build: () => ({ path: '/api/account/units', body: { damperVelocity: 'mm/s', rate: 'N/mm', speed: 'km/h', length: 'mm' } }),
  },
  'POST /api/auth/reset/request': { access: 'public', ok: 202, build: (w) => ({ path: '/api/auth/reset/request', body: { email: w.spare.email } }) },
  'POST /api/auth/reset/confirm': {
    access: 'public',
    ok: 204,
    build: async (w) => ({ path: '/api/auth/reset/confirm', body: { token: await freshResetToken(w), password: TEST_PASSWORD } }),
  },

  'GET /api/invitations/:token': { access: 'public', ok: 200, build: async (w) => ({ path: `/api/invitations/${(await freshInvitation(w)).token}` }) },
  'POST /api/invitations/:token/accept': {
    access: 'public',
    ok: 200,
    build: async (w) => ({ path: `/api/invitations/${(await freshInvitation(w)).token}/accept`, body: { name: 'Accepting Person', password: 'long-enough-pw' } }),
  },
  'POST /api/workspaces/:workspaceId/invitations': {
    access: 'admin',
    ok: 201,
    build: (w) => ({ path: ws(w, '/invitations'), body: { email: uniqueEmail('invited'), role: 'engineer' } }),
  },
  'DELETE /api/workspaces/:workspaceId/invitations/:invitationId': {
    access: 'admin',
    ok: 204,
    build: async (w) => ({ path: ws(w, `/invitations/${(await freshInvitation(w)).id}`) }),
  },

  'GET /api/workspaces/:workspaceId': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w) }) },
  'PUT /api/workspaces/:workspaceId/settings': { access: 'admin', ok: 200, build: (w) => ({ path: ws(w, '/settings'), body: { releaseNeedsSecondPerson: false } }) },
  'GET /api/workspaces/:workspaceId/members': { access: 'viewer', ok: 200, build: (w) => ({ path: ws(w, '/members') }) },
  'PATCH /api/workspaces/:workspaceId/members/:userId': {
    access: 'admin',
    ok: 200,
    build: async (w) => ({ path: ws(w, `/members/${await freshMember(w)}`), body: { role: 'engineer' } }),
  },
  'DELETE /api/workspaces/:workspaceId/members/:userId': { access: 'admin', ok: 204, build: async (w) => ({ path: ws(w, `/members/${await freshMember(w)}`) }) },
  'GET /api/workspaces/:workspaceId/audit': { access: 'admin', ok: 200, build: (w) => ({ path: ws(w, '/audit?limit=10') }) },
  'GET /api/outbox': { access: { anyWorkspace: 'admin' }, ok: 200, build: () => ({ path: '/api/outbox' }) },
};
