import { createHash } from 'node:crypto';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { ApiTokensResponse, CreatedApiToken } from '../../shared/schemas/api-token.ts';
import { AuditResponse } from '../../shared/schemas/audit.ts';
import { SetupDetail, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { cornerDocument, freshSetup } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Tallis ride bench');
const secondWorkspaceId = await createWorkspace(t.db, 'Brume chassis bench');
const engineer = await createUser(t.db, { name: 'Ines Marrow' });
await addMember(t.db, workspaceId, engineer.id, 'engineer');
await addMember(t.db, secondWorkspaceId, engineer.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);

const setups = (ws = workspaceId) => `/api/workspaces/${ws}/setups`;
const DAY_MS = 86_400_000;

/** Every token text shown at creation, to check no later answer repeats one. */
const shownTokens: string[] = [];

async function makeToken(scope: 'read' | 'write', extra: object = {}): Promise<CreatedApiToken> {
  const res = await eng.post('/api/account/api-tokens', { workspaceId, name: `Script ${scope}`, scope, ...extra }).expect(201);
  const created = CreatedApiToken.parse(res.body);
  shownTokens.push(created.token);
  return created;
}

/** A script's client: the bearer header and nothing else (no cookie, no CSRF header). */
const script = (token: string) => ({
  get: (path: string) => request(t.url).get(path).set('Authorization', `Bearer ${token}`),
  post: (path: string, body: object) => request(t.url).post(path).set('Authorization', `Bearer ${token}`).send(body),
});

const setRole = (userId: string, ws: string, role: 'viewer' | 'engineer') =>
  t.db.updateTable('membership').set({ role }).where('workspace_id', '=', ws).where('user_id', '=', userId).execute();

describe('personal API tokens', () => {
  it('shows a token once and keeps only its SHA-256', async () => {
    const created = await makeToken('read');
    expect(created.token).toMatch(/^rw_pat_[A-Za-z0-9_-]{43,}$/);
    expect(created.apiToken).toMatchObject({ workspaceId, workspaceName: 'Tallis ride bench', scope: 'read', lastUsedAt: null, state: 'active' });
    // default expiry: 90 days
    expect(new Date(created.apiToken.expiresAt).getTime() - new Date(created.apiToken.createdAt).getTime()).toBe(90 * DAY_MS);
    const row = await t.db.selectFrom('api_token').selectAll().where('id', '=', created.apiToken.id).executeTakeFirstOrThrow();
    expect(row.token_hash).toBe(createHash('sha256').update(created.token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(created.token.slice('rw_pat_'.length));
  });

  it('refuses an expiry beyond a year and a write token for a viewer, naming the field', async () => {
    const tooLong = ErrorBody.parse((await eng.post('/api/account/api-tokens', { workspaceId, name: 'Forever', scope: 'read', expiresInDays: 366 }).expect(400)).body);
    expect(tooLong.error.fields?.map((f) => f.path)).toContain('expiresInDays');
    await setRole(engineer.id, secondWorkspaceId, 'viewer');
    const viewerWrite = ErrorBody.parse((await eng.post('/api/account/api-tokens', { workspaceId: secondWorkspaceId, name: 'W', scope: 'write' }).expect(400)).body);
    expect(viewerWrite.error.fields?.map((f) => f.path)).toEqual(['scope']);
    await setRole(engineer.id, secondWorkspaceId, 'engineer');
    const stranger = await createWorkspace(t.db, 'Not mine');
    await eng.post('/api/account/api-tokens', { workspaceId: stranger, name: 'X', scope: 'read' }).expect(404);
  });

  it('lets a read token list setups but refuses its writes, naming the scope', async () => {
    await freshSetup(t.db, workspaceId, engineer);
    const { token } = await makeToken('read');
    const list = SetupsResponse.parse((await script(token).get(setups()).expect(200)).body);
    expect(list.setups.length).toBeGreaterThan(0);
    const before = list.setups.length;
    const refused = ErrorBody.parse((await script(token).post(setups(), { setup: cornerDocument('Scripted corner') }).expect(403)).body);
    expect(refused.error.message).toMatch(/read scope/);
    expect(SetupsResponse.parse((await script(token).get(setups()).expect(200)).body).setups).toHaveLength(before);
  });

  it('saves a revision with a write token as the person, without a CSRF token, and the audit names them', async () => {
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const { token, apiToken } = await makeToken('write');
    const saved = SetupDetail.parse(
      (await script(token).post(`${setups()}/${setup.id}/revisions`, { setup: cornerDocument('Scripted', { springRate: 31000 }), message: 'From a script', basedOn: 1 }).expect(201)).body,
    );
    expect(saved.revision).toMatchObject({ number: 2, author: { id: engineer.id, name: 'Ines Marrow' } });
    const entry = await t.db.selectFrom('audit_log').selectAll().where('entity_id', '=', setup.id).where('action', '=', 'setup.revised').executeTakeFirstOrThrow();
    expect(entry.actor_id).toBe(engineer.id);
    const mine = ApiTokensResponse.parse((await eng.get('/api/account/api-tokens').expect(200)).body);
    expect(mine.tokens.find((x) => x.id === apiToken.id)?.lastUsedAt).toBe(t.clock.now().toISOString());
  });

  it('keeps a token inside its workspace, even where the person is a member', async () => {
    const { token } = await makeToken('write');
    await script(token).get(setups(secondWorkspaceId)).expect(404);
    await script(token).post(setups(secondWorkspaceId), { setup: cornerDocument('Elsewhere') }).expect(404);
    expect(await t.db.selectFrom('setup').select('id').where('workspace_id', '=', secondWorkspaceId).execute()).toHaveLength(0);
  });

  it('follows the person’s role at once: viewer cannot write, a removed member reaches nothing', async () => {
    const member = await createUser(t.db, { name: 'Corrie Vane' });
    await addMember(t.db, workspaceId, member.id, 'engineer');
    const agent = await signedIn(t.url, member.email, member.password);
    const { token } = CreatedApiToken.parse((await agent.post('/api/account/api-tokens', { workspaceId, name: 'Sweep', scope: 'write' }).expect(201)).body);
    shownTokens.push(token);
    await script(token).post(setups(), { setup: cornerDocument('Before the change') }).expect(201);
    await setRole(member.id, workspaceId, 'viewer');
    const refused = ErrorBody.parse((await script(token).post(setups(), { setup: cornerDocument('After the change') }).expect(403)).body);
    expect(refused.error.message).toMatch(/viewer/);
    await script(token).get(setups()).expect(200);
    await t.db.deleteFrom('membership').where('workspace_id', '=', workspaceId).where('user_id', '=', member.id).execute();
    await script(token).get(setups()).expect(404);
  });

  it('answers 401 to an expired, a revoked and a made-up token', async () => {
    const expiring = await makeToken('read', { expiresInDays: 1 });
    await script(expiring.token).get(setups()).expect(200);
    t.clock.advance(DAY_MS + 1000);
    await script(expiring.token).get(setups()).expect(401);

    const revoked = await makeToken('write');
    await script(revoked.token).get(setups()).expect(200);
    await eng.del(`/api/account/api-tokens/${revoked.apiToken.id}`).expect(204);
    await script(revoked.token).get(setups()).expect(401);
    const mine = ApiTokensResponse.parse((await eng.get('/api/account/api-tokens').expect(200)).body);
    expect(mine.tokens.map((x) => x.id)).not.toContain(revoked.apiToken.id);
    expect(mine.tokens.find((x) => x.id === expiring.apiToken.id)?.state).toBe('expired');

    await script(`rw_pat_${'A'.repeat(43)}`).get(setups()).expect(401);
    await script('not-a-token').get(setups()).expect(401);
    const actions = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', revoked.apiToken.id).execute();
    expect(actions.map((a) => a.action).sort()).toEqual(['api_token.created', 'api_token.revoked']);
  });

  it('cannot list, make or revoke tokens, nor use account routes', async () => {
    const { token, apiToken } = await makeToken('write');
    await script(token).post('/api/account/api-tokens', { workspaceId, name: 'Child', scope: 'write' }).expect(403);
    await script(token).get('/api/account/api-tokens').expect(403);
    await request(t.url).delete(`/api/account/api-tokens/${apiToken.id}`).set('Authorization', `Bearer ${token}`).expect(403);
    await script(token).get('/api/auth/me').expect(403);
    await script(token).post('/api/auth/password', { currentPassword: engineer.password, newPassword: 'another-long-password' }).expect(403);
    expect(await t.db.selectFrom('api_token').select('id').where('name', '=', 'Child').execute()).toHaveLength(0);
    await script(token).get(setups()).expect(200);
  });

  it('refuses a bearer token sent together with a session cookie', async () => {
    const { token } = await makeToken('read');
    const res = await eng.get(setups()).set('Authorization', `Bearer ${token}`).expect(400);
    expect(ErrorBody.parse(res.body).error.message).toMatch(/not both/);
  });

  it('never repeats a token in any later answer', async () => {
    const owner = await createUser(t.db, { name: 'Bench admin' });
    await addMember(t.db, workspaceId, owner.id, 'admin');
    const admin = await signedIn(t.url, owner.email, owner.password);
    const setup = await freshSetup(t.db, workspaceId, engineer);
    const { token } = await makeToken('write');
    const bodies = [
      (await eng.get('/api/account/api-tokens').expect(200)).text,
      (await admin.get(`/api/workspaces/${workspaceId}/audit`).expect(200)).text,
      (await eng.get('/api/auth/me').expect(200)).text,
      (await script(token).get(setups()).expect(200)).text,
      (await script(token).get(`/api/workspaces/${workspaceId}/setups/${setup.id}/revisions`).expect(200)).text,
    ];
    AuditResponse.parse(JSON.parse(bodies[1] ?? '{}'));
    for (const body of bodies) for (const shown of shownTokens) expect(body).not.toContain(shown.slice('rw_pat_'.length));
  });
});
