import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { AuditResponse } from '../../shared/schemas/audit.ts';
import { Member, MembersResponse, WorkspaceInfo } from '../../shared/schemas/workspace.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Skerry corner bench');
const admin = await createUser(t.db, { name: 'Ada Test' });
await addMember(t.db, workspaceId, admin.id, 'admin');
const adminSession = await signedIn(t.url, admin.email, admin.password);
const base = `/api/workspaces/${workspaceId}`;

async function member(role: 'viewer' | 'engineer' | 'lead' | 'admin', name = `Member ${role}`) {
  const u = await createUser(t.db, { name });
  await addMember(t.db, workspaceId, u.id, role);
  return u;
}

const roleOf = async (userId: string) =>
  (await t.db.selectFrom('membership').select('role').where('workspace_id', '=', workspaceId).where('user_id', '=', userId).executeTakeFirst())?.role;

describe('members and roles', () => {
  it('tells each member their own role in the workspace', async () => {
    const eng = await member('engineer');
    const info = WorkspaceInfo.parse((await (await signedIn(t.url, eng.email, eng.password)).get(base).expect(200)).body);
    expect(info).toEqual({ id: workspaceId, name: 'Skerry corner bench', role: 'engineer', settings: { releaseNeedsSecondPerson: false } });
  });

  it('changes a role, answers with the member, and audits who did it', async () => {
    const eng = await member('engineer', 'Corin Vale');
    const res = await adminSession.patch(`${base}/members/${eng.id}`, { role: 'lead' }).expect(200);
    expect(Member.parse(res.body)).toMatchObject({ userId: eng.id, name: 'Corin Vale', role: 'lead' });
    expect(await roleOf(eng.id)).toBe('lead');
    const audit = AuditResponse.parse((await adminSession.get(`${base}/audit`).expect(200)).body);
    expect(audit.entries[0]).toMatchObject({ action: 'member.role_changed', entityId: eng.id, actor: { id: admin.id, name: 'Ada Test' } });
    expect(audit.entries[0].summary).toContain('from engineer to lead');
  });

  it('takes away an admin’s powers on the next request after demotion', async () => {
    const second = await member('admin');
    const secondSession = await signedIn(t.url, second.email, second.password);
    await secondSession.get(`${base}/audit`).expect(200);
    await adminSession.patch(`${base}/members/${second.id}`, { role: 'viewer' }).expect(200);
    await secondSession.get(`${base}/audit`).expect(403);
    await secondSession.get(`${base}/members`).expect(200);
  });

  it('refuses to demote or remove the last admin (409) and changes nothing', async () => {
    const before = await t.db.selectFrom('audit_log').select('id').execute();
    const demote = await adminSession.patch(`${base}/members/${admin.id}`, { role: 'lead' }).expect(409);
    expect(ErrorBody.parse(demote.body).error.code).toBe('conflict');
    await adminSession.del(`${base}/members/${admin.id}`).expect(409);
    expect(await roleOf(admin.id)).toBe('admin');
    expect(await t.db.selectFrom('audit_log').select('id').execute()).toHaveLength(before.length);
  });

  it('lets an admin step down once another admin exists', async () => {
    const ws = await createWorkspace(t.db, 'Handover bench');
    const a = await createUser(t.db);
    const b = await createUser(t.db);
    await addMember(t.db, ws, a.id, 'admin');
    await addMember(t.db, ws, b.id, 'engineer');
    const sa = await signedIn(t.url, a.email, a.password);
    await sa.del(`/api/workspaces/${ws}/members/${a.id}`).expect(409);
    await sa.patch(`/api/workspaces/${ws}/members/${b.id}`, { role: 'admin' }).expect(200);
    await sa.del(`/api/workspaces/${ws}/members/${a.id}`).expect(204);
    await sa.get(`/api/workspaces/${ws}`).expect(404);
  });

  it('removes a member, who then gets 404 for the workspace, and audits it', async () => {
    const v = await member('viewer', 'Tam Orrin');
    const vs = await signedIn(t.url, v.email, v.password);
    await vs.get(base).expect(200);
    await adminSession.del(`${base}/members/${v.id}`).expect(204);
    await vs.get(base).expect(404);
    await adminSession.del(`${base}/members/${v.id}`).expect(404);
    const members = MembersResponse.parse((await adminSession.get(`${base}/members`)).body).members;
    expect(members.map((m) => m.userId)).not.toContain(v.id);
    const entry = await t.db.selectFrom('audit_log').selectAll().where('action', '=', 'member.removed').where('entity_id', '=', v.id).executeTakeFirstOrThrow();
    expect(entry.summary).toContain('Tam Orrin');
  });

  it('answers a bad role with 400 naming the field and an unknown member with 404', async () => {
    const eng = await member('engineer');
    const bad = await adminSession.patch(`${base}/members/${eng.id}`, { role: 'owner' }).expect(400);
    expect(ErrorBody.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['role']);
    expect(await roleOf(eng.id)).toBe('engineer');
    await adminSession.patch(`${base}/members/no-such-user`, { role: 'viewer' }).expect(404);
  });
});

describe('audit log', () => {
  it('pages backwards with `before`, newest first, and rejects a bad limit with 400', async () => {
    const ws = await createWorkspace(t.db, 'Audit bench');
    await addMember(t.db, ws, admin.id, 'admin');
    const people = [];
    for (let i = 0; i < 5; i++) {
      const u = await createUser(t.db, { name: `Audited ${i}` });
      await addMember(t.db, ws, u.id, 'viewer');
      people.push(u);
    }
    for (const p of people) {
      t.clock.advance(1000);
      await adminSession.patch(`/api/workspaces/${ws}/members/${p.id}`, { role: 'engineer' }).expect(200);
    }
    const first = AuditResponse.parse((await adminSession.get(`/api/workspaces/${ws}/audit?limit=3`).expect(200)).body).entries;
    expect(first.map((e) => e.entityId)).toEqual([people[4].id, people[3].id, people[2].id]);
    const next = AuditResponse.parse((await adminSession.get(`/api/workspaces/${ws}/audit?limit=3&before=${encodeURIComponent(first[2].at)}`).expect(200)).body).entries;
    expect(next.map((e) => e.entityId)).toEqual([people[1].id, people[0].id]);
    const bad = await adminSession.get(`/api/workspaces/${ws}/audit?limit=0`).expect(400);
    expect(ErrorBody.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['limit']);
  });

  it('keeps each workspace’s entries to itself', async () => {
    const ws = await createWorkspace(t.db, 'Quiet bench');
    await addMember(t.db, ws, admin.id, 'admin');
    expect(AuditResponse.parse((await adminSession.get(`/api/workspaces/${ws}/audit`).expect(200)).body).entries).toEqual([]);
  });
});
