import { createHash } from 'node:crypto';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { SESSION_COOKIE } from '../../server/auth/session.ts';
import { CopiedShared, CreatedShareLink, SharedSetupRevision, ShareLink, ShareLinksResponse } from '../../shared/schemas/share-link.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { browserLike, signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { cornerDocument, parsed } from './helpers/setup-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Instructor bench');
const classWorkspaceId = await createWorkspace(t.db, 'Student bench');
const instructor = await createUser(t.db, { name: 'Instructor Hale' });
const student = await createUser(t.db, { name: 'Student Pike' });
const reader = await createUser(t.db, { name: 'Read-only reviewer' });
await addMember(t.db, workspaceId, instructor.id, 'engineer');
await addMember(t.db, classWorkspaceId, student.id, 'engineer');
await addMember(t.db, classWorkspaceId, reader.id, 'viewer');
await addMember(t.db, workspaceId, reader.id, 'engineer');
const inst = await signedIn(t.url, instructor.email, instructor.password);
const stud = await signedIn(t.url, student.email, student.password);
const rdr = await signedIn(t.url, reader.email, reader.password);
const anon = await browserLike(t.url);

const ws = `/api/workspaces/${workspaceId}`;

async function setupWithLink(name: string, expiresAt?: string) {
  const setup = SetupDetail.parse((await inst.post(`${ws}/setups`, { setup: cornerDocument(name) }).expect(201)).body);
  const created = CreatedShareLink.parse(
    (await inst.post(`${ws}/share-links`, { objectType: 'setup_revision', objectId: setup.revision.id, expiresAt: expiresAt ?? null }).expect(201)).body,
  );
  return { setup, ...created };
}
const count = async (table: 'setup' | 'setup_revision') => Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);

describe('share links', () => {
  it('makes a 32-byte token, stores only its SHA-256, and never lists the token', async () => {
    const { token, link, path } = await setupWithLink('Skerry front, class example');
    expect(Buffer.from(token, 'base64url')).toHaveLength(32);
    expect(path).toBe(`/shared/${token}`);
    const row = await t.db.selectFrom('share_link').selectAll().where('id', '=', link.id).executeTakeFirstOrThrow();
    expect(row.token_hash).toBe(createHash('sha256').update(token).digest('hex'));
    expect(JSON.stringify(row)).not.toContain(token);
    const list = await inst.get(`${ws}/share-links`).expect(200);
    expect(list.text).not.toContain(token);
    expect(ShareLinksResponse.parse(list.body).links.find((l) => l.id === link.id)).toMatchObject({ state: 'active', label: 'Skerry front, class example · revision 1', revisionNumber: 1 });
  });

  it('opens signed out: the shared revision, its modal figures, the workspace name, marked read-only', async () => {
    const { token, setup } = await setupWithLink('Corrie rear, shared');
    // a later save does not move the link: it names revision 1
    await inst.post(`${ws}/setups/${setup.id}/revisions`, { setup: cornerDocument('Corrie rear, shared', { springRate: 45000 }), message: 'Later change' }).expect(201);

    const res = await request(t.url).get(`/api/shared/${token}`).expect(200);
    expect(res.headers['cache-control']).toMatch(/no-store/);
    const view = SharedSetupRevision.parse(res.body);
    expect(view).toMatchObject({ readOnly: true, workspaceName: 'Instructor bench', sharedBy: 'Instructor Hale', setupName: 'Corrie rear, shared', revision: { number: 1 } });
    expect(view.document).toEqual(parsed(cornerDocument('Corrie rear, shared')));
    expect(view.modal!.body.naturalHz).toBeGreaterThan(0.8);
    expect(view.modal!.wheel.naturalHz).toBeGreaterThan(view.modal!.body.naturalHz);
  });

  it('a revoked link answers 410 with plain words, signed in or not', async () => {
    const { token, link } = await setupWithLink('Withdrawn');
    const revoked = ShareLink.parse((await inst.del(`${ws}/share-links/${link.id}`).expect(200)).body);
    expect(revoked.state).toBe('revoked');
    const res = await request(t.url).get(`/api/shared/${token}`).expect(410);
    expect(ErrorBody.parse(res.body).error).toMatchObject({ code: 'gone', message: expect.stringMatching(/withdrawn/) });
    await stud.get(`/api/shared/${token}`).expect(410);
    await stud.post(`/api/shared/${token}/copy`, { workspaceId: classWorkspaceId }).expect(410);
  });

  it('removing a member revokes the links they made in that workspace, and says so in the audit log', async () => {
    const admin = await createUser(t.db, { name: 'Bench admin' });
    await addMember(t.db, workspaceId, admin.id, 'admin');
    const leaver = await createUser(t.db, { name: 'Short-stay engineer' });
    await addMember(t.db, workspaceId, leaver.id, 'engineer');
    const lv = await signedIn(t.url, leaver.email, leaver.password);
    const setup = SetupDetail.parse((await lv.post(`${ws}/setups`, { setup: cornerDocument('Made by a leaver') }).expect(201)).body);
    const { token } = CreatedShareLink.parse((await lv.post(`${ws}/share-links`, { objectType: 'setup_revision', objectId: setup.revision.id, expiresAt: null }).expect(201)).body);
    const kept = await setupWithLink('Made by someone who stays');
    await request(t.url).get(`/api/shared/${token}`).expect(200);

    const adm = await signedIn(t.url, admin.email, admin.password);
    await adm.del(`${ws}/members/${leaver.id}`).expect(204);
    await request(t.url).get(`/api/shared/${token}`).expect(410);
    await request(t.url).get(`/api/shared/${kept.token}`).expect(200);
    const audit = await t.db.selectFrom('audit_log').select('summary').where('action', '=', 'member.removed').where('entity_id', '=', leaver.id).executeTakeFirstOrThrow();
    expect(audit.summary).toMatch(/1 share link they made was revoked/);
  });

  it('an expired link answers 410; an expiry in the past is refused when the link is made', async () => {
    const now = t.clock.now();
    const { token, link } = await setupWithLink('Short-lived', new Date(now.getTime() + 3600_000).toISOString());
    await request(t.url).get(`/api/shared/${token}`).expect(200);
    t.clock.advance(3600_000 + 1);
    const res = await request(t.url).get(`/api/shared/${token}`).expect(410);
    expect(ErrorBody.parse(res.body).error.message).toMatch(/expired/);
    const listed = ShareLinksResponse.parse((await inst.get(`${ws}/share-links`).expect(200)).body).links.find((l) => l.id === link.id);
    expect(listed?.state).toBe('expired');

    const setup = SetupDetail.parse((await inst.post(`${ws}/setups`, { setup: cornerDocument('Past expiry') }).expect(201)).body);
    const bad = await inst.post(`${ws}/share-links`, { objectType: 'setup_revision', objectId: setup.revision.id, expiresAt: new Date(t.clock.now().getTime() - 1000).toISOString() }).expect(400);
    expect(ErrorBody.parse(bad.body).error.fields?.map((f) => f.path)).toEqual(['expiresAt']);
  });

  it('a token grants exactly one object, and writes nothing', async () => {
    const a = await setupWithLink('Setup A');
    const b = await setupWithLink('Setup B');
    const viewA = SharedSetupRevision.parse((await request(t.url).get(`/api/shared/${a.token}`).expect(200)).body);
    expect(viewA.setupName).toBe('Setup A');
    // nothing under the token reaches another object
    await request(t.url).get(`/api/shared/${a.token}/${b.setup.id}`).expect(404);
    await request(t.url).get(`/api/shared/${a.token}?setupId=${b.setup.id}`).expect(200).expect((r) => expect(r.body.setupName).toBe('Setup A'));
    // a token is no session: workspace routes stay closed to its holder
    for (const auth of [{ Authorization: `Bearer ${a.token}` }, { Cookie: `${SESSION_COOKIE}=${a.token}` }]) {
      await request(t.url).get(`${ws}/setups/${b.setup.id}`).set(auth).expect(401);
      await request(t.url).get(`${ws}/setups/${a.setup.id}`).set(auth).expect(401);
    }
    const before = [await count('setup'), await count('setup_revision')];
    await anon.post(`/api/shared/${a.token}/copy`, { workspaceId }).expect(401);
    await anon.post(`${ws}/setups/${a.setup.id}/revisions`, { setup: cornerDocument('x'), message: 'x' }).expect(401);
    await anon.del(`${ws}/share-links/${b.link.id}`).expect(401);
    expect([await count('setup'), await count('setup_revision')]).toEqual(before);
    // a link cannot be made to another workspace's revision
    const foreign = SetupDetail.parse((await stud.post(`/api/workspaces/${classWorkspaceId}/setups`, { setup: cornerDocument('Student corner') }).expect(201)).body);
    await inst.post(`${ws}/share-links`, { objectType: 'setup_revision', objectId: foreign.revision.id }).expect(404);
    await request(t.url).get('/api/shared/not-a-real-token-but-long-enough-to-look-like-one-xx').expect(404);
  });

  it('copies into a workspace where the caller is engineer, as a new setup at revision 1', async () => {
    const { token, link, setup } = await setupWithLink('Pipit front, worked example');
    const copied = CopiedShared.parse((await stud.post(`/api/shared/${token}/copy`, { workspaceId: classWorkspaceId }).expect(201)).body);
    expect(copied).toMatchObject({ objectType: 'setup_revision', workspaceId: classWorkspaceId, name: 'Pipit front, worked example' });
    expect(copied.id).not.toBe(setup.id);
    const detail = SetupDetail.parse((await stud.get(`/api/workspaces/${classWorkspaceId}/setups/${copied.id}`).expect(200)).body);
    expect(detail.revision).toMatchObject({ number: 1, source: `copy:${link.id}`, author: { name: 'Student Pike' } });
    expect(detail.revision.document).toEqual(setup.revision.document);
    const audit = await t.db.selectFrom('audit_log').select(['action', 'workspace_id']).where('entity_id', '=', copied.id).execute();
    expect(audit).toEqual([{ action: 'setup.copied', workspace_id: classWorkspaceId }]);

    // the reviewer is engineer elsewhere but only a viewer in the class workspace
    const before = await count('setup');
    const refused = await rdr.post(`/api/shared/${token}/copy`, { workspaceId: classWorkspaceId }).expect(403);
    expect(ErrorBody.parse(refused.body).error.message).toMatch(/engineer role/);
    await stud.post(`/api/shared/${token}/copy`, { workspaceId }).expect(404);
    expect(await count('setup')).toBe(before);
  });
});
