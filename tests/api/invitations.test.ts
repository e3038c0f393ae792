import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { Me } from '../../shared/schemas/account.ts';
import { Invitation, InvitationInfo, MembersResponse } from '../../shared/schemas/workspace.ts';
import { INVITATION_DAYS } from '../../server/workspaces/invitations.service.ts';
import { browserLike, signedIn, signedOut } from './helpers/agents.ts';
import { linkIn, waitForMail } from './helpers/mail.ts';
import { addMember, createUser, createWorkspace, uniqueEmail } from './helpers/people.ts';
import { createTestApp, TEST_PUBLIC_URL } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const workspaceId = await createWorkspace(t.db, 'Brume ride lab');
const admin = await createUser(t.db, { name: 'Maud Ellery' });
await addMember(t.db, workspaceId, admin.id, 'admin');
let adminSession = await signedIn(t.url, admin.email, admin.password);

async function invite(email: string, role = 'engineer'): Promise<{ invitation: Invitation; token: string; text: string }> {
  const res = await adminSession.post(`/api/workspaces/${workspaceId}/invitations`, { email, role }).expect(201);
  const invitation = Invitation.parse(res.body);
  const mail = await waitForMail(t.db, email, 'Brume ride lab');
  return { invitation, token: linkIn(mail.text_body, `${TEST_PUBLIC_URL}/invite/`).token, text: mail.text_body };
}

describe('invitations', () => {
  it('an account signed up under the invited address cannot accept until the address is confirmed by mail', async () => {
    const target = uniqueEmail('new.hire');
    const password = 'squatter-password-1';
    await (await browserLike(t.url)).post('/api/auth/signup', { name: 'Early Bird', email: target, password, workspaceName: 'Perch' }).expect(202);
    await waitForMail(t.db, target, 'Confirm your address');
    // unconfirmed, but able to sign in with the password it chose
    const squatter = await signedIn(t.url, target, password);
    const squatterId = Me.parse((await squatter.get('/api/auth/me').expect(200)).body).user.id;
    const { token } = await invite(target, 'engineer');

    const refused = await squatter.post(`/api/invitations/${token}/accept`, {}).expect(403);
    expect(ErrorBody.parse(refused.body).error.message).toMatch(/confirm your address/i);
    expect(await t.db.selectFrom('membership').selectAll().where('workspace_id', '=', workspaceId).where('user_id', '=', squatterId).execute()).toEqual([]);
    const still = MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`).expect(200)).body);
    expect(still.invitations.map((i) => i.email)).toContain(target);

    // the address's real holder takes the account over with a reset link, which also confirms the address and ends the squatter's session
    await (await browserLike(t.url)).post('/api/auth/reset/request', { email: target }).expect(202);
    const reset = linkIn((await waitForMail(t.db, target, 'password')).text_body, `${TEST_PUBLIC_URL}/reset/`).token;
    await (await browserLike(t.url)).post('/api/auth/reset/confirm', { token: reset, password: 'the real holder pw' }).expect(204);
    expect((await squatter.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    const holder = await signedIn(t.url, target, 'the real holder pw');
    expect(Me.parse((await holder.get('/api/auth/me').expect(200)).body).user.emailVerified).toBe(true);
    const joined = Me.parse((await holder.post(`/api/invitations/${token}/accept`, {}).expect(200)).body);
    expect(joined.memberships.map((m) => m.workspaceId)).toContain(workspaceId);
  });

  it('lets a new person follow the mailed link, create an account and land in the workspace', async () => {
    const email = uniqueEmail('newcomer');
    const { invitation, token, text } = await invite(email, 'engineer');
    expect(invitation).toMatchObject({ email, role: 'engineer' });
    expect(Date.parse(invitation.expiresAt) - Date.parse(invitation.createdAt)).toBe(INVITATION_DAYS * 86_400_000);
    expect(text).toContain('Maud Ellery');

    const pending = MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`).expect(200)).body);
    expect(pending.invitations.map((i) => i.email)).toContain(email);

    const visitor = await browserLike(t.url);
    const info = InvitationInfo.parse((await visitor.get(`/api/invitations/${token}`).expect(200)).body);
    expect(info).toEqual({ workspaceName: 'Brume ride lab', email, role: 'engineer', invitedBy: 'Maud Ellery' });

    const missing = await visitor.post(`/api/invitations/${token}/accept`, {}).expect(400);
    expect(ErrorBody.parse(missing.body).error.fields?.map((f) => f.path).sort()).toEqual(['name', 'password']);

    const me = Me.parse((await visitor.post(`/api/invitations/${token}/accept`, { name: 'Pell Gantry', password: 'pell gantry pw' }).expect(200)).body);
    expect(me.user).toMatchObject({ name: 'Pell Gantry', email });
    expect(me.memberships).toEqual([{ workspaceId, workspaceName: 'Brume ride lab', role: 'engineer' }]);
    await visitor.get(`/api/workspaces/${workspaceId}`).expect(200);
    await signedIn(t.url, email, 'pell gantry pw');

    await visitor.get(`/api/invitations/${token}`).expect(410);
    await (await browserLike(t.url)).post(`/api/invitations/${token}/accept`, { name: 'Again', password: 'again again pw' }).expect(410);

    const after = MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`)).body);
    expect(after.members.find((m) => m.email === email)?.role).toBe('engineer');
    expect(after.invitations.map((i) => i.email)).not.toContain(email);
    const actions = await t.db.selectFrom('audit_log').select(['action', 'actor_id']).where('workspace_id', '=', workspaceId).where('summary', 'like', `%${email}%`).execute();
    expect(actions.map((a) => a.action).sort()).toEqual(['invitation.created', 'member.joined']);
  });

  it('asks an existing account to sign in as the invited address before joining', async () => {
    const existing = await createUser(t.db, { name: 'Rook Haldane' });
    const someoneElse = await createUser(t.db);
    const { token } = await invite(existing.email, 'viewer');
    // The link's page and a bare accept answer as they would for an address with no account.
    const raw = (await (await browserLike(t.url)).get(`/api/invitations/${token}`)).body;
    expect(Object.keys(raw).sort()).toEqual(['email', 'invitedBy', 'role', 'workspaceName']);
    const fresh = await invite(`fresh-${Date.now()}@example.test`, 'viewer');
    const anonymous = await browserLike(t.url);
    const bareExisting = ErrorBody.parse((await anonymous.post(`/api/invitations/${token}/accept`, {}).expect(400)).body).error;
    const bareFresh = ErrorBody.parse((await anonymous.post(`/api/invitations/${fresh.token}/accept`, {}).expect(400)).body).error;
    expect({ ...bareExisting, message: bareExisting.message.replace(existing.email, 'X') }).toEqual({ ...bareFresh, message: bareFresh.message.replace(/fresh-\d+@example\.test/, 'X') });
    expect(ErrorBody.parse((await anonymous.post(`/api/invitations/${token}/accept`, { name: 'Rook', password: 'a long password' }).expect(401)).body).error.code).toBe('unauthenticated');
    const wrongPerson = await signedIn(t.url, someoneElse.email, someoneElse.password);
    await wrongPerson.post(`/api/invitations/${token}/accept`, {}).expect(403);
    expect(Me.parse((await wrongPerson.get('/api/auth/me')).body).memberships).toEqual([]);

    const right = await signedIn(t.url, existing.email, existing.password);
    const me = Me.parse((await right.post(`/api/invitations/${token}/accept`, {}).expect(200)).body);
    expect(me.memberships).toEqual([{ workspaceId, workspaceName: 'Brume ride lab', role: 'viewer' }]);
    const row = await t.db.selectFrom('user').select('password_hash').where('id', '=', existing.id).executeTakeFirstOrThrow();
    await signedIn(t.url, existing.email, existing.password);
    expect(row.password_hash.startsWith('scrypt$')).toBe(true);
  });

  it('refuses an expired link with 410', async () => {
    const { token } = await invite(uniqueEmail('late'));
    t.clock.advance(INVITATION_DAYS * 86_400_000 + 1000);
    // Sessions last as long as invitations (7 days): the admin has to sign in again.
    expect((await adminSession.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    adminSession = await signedIn(t.url, admin.email, admin.password);
    const b = await browserLike(t.url);
    await b.get(`/api/invitations/${token}`).expect(410);
    await b.post(`/api/invitations/${token}/accept`, { name: 'Too Late', password: 'too late pw 1' }).expect(410);
    expect(MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`)).body).invitations).toEqual([]);
  });

  it('kills a withdrawn invitation and audits the withdrawal', async () => {
    const email = uniqueEmail('withdrawn');
    const { invitation, token } = await invite(email);
    await adminSession.del(`/api/workspaces/${workspaceId}/invitations/${invitation.id}`).expect(204);
    await (await browserLike(t.url)).get(`/api/invitations/${token}`).expect(410);
    await adminSession.del(`/api/workspaces/${workspaceId}/invitations/${invitation.id}`).expect(404);
    const entry = await t.db.selectFrom('audit_log').selectAll().where('action', '=', 'invitation.revoked').where('entity_id', '=', invitation.id).executeTakeFirst();
    expect(entry?.actor_id).toBe(admin.id);
  });

  it('replaces a pending invitation to the same address, so only the newest link works', async () => {
    const email = uniqueEmail('twice');
    const first = await invite(email, 'viewer');
    await new Promise((r) => setTimeout(r, 5));
    const second = await invite(email, 'lead');
    expect(second.token).not.toBe(first.token);
    const b = await browserLike(t.url);
    await b.get(`/api/invitations/${first.token}`).expect(410);
    expect(InvitationInfo.parse((await b.get(`/api/invitations/${second.token}`).expect(200)).body).role).toBe('lead');
    const pending = MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`)).body).invitations;
    expect(pending.filter((i) => i.email === email)).toHaveLength(1);
  });

  it('refuses to invite a current member (409) and a bad body (400 with fields), mailing nothing', async () => {
    const res = await adminSession.post(`/api/workspaces/${workspaceId}/invitations`, { email: admin.email, role: 'viewer' }).expect(409);
    expect(ErrorBody.parse(res.body).error.fields?.[0]?.path).toBe('email');
    const bad = await adminSession.post(`/api/workspaces/${workspaceId}/invitations`, { email: 'nope', role: 'owner' }).expect(400);
    expect(ErrorBody.parse(bad.body).error.fields?.map((f) => f.path).sort()).toEqual(['email', 'role']);
    const mails = await t.db.selectFrom('outbox_message').select('id').where('to_address', 'like', `%${admin.email}%`).execute();
    expect(mails).toEqual([]);
  });

  it('shows pending invitations to admins only', async () => {
    await invite(uniqueEmail('pending'));
    const lead = await createUser(t.db);
    await addMember(t.db, workspaceId, lead.id, 'lead');
    const leadView = MembersResponse.parse((await (await signedIn(t.url, lead.email, lead.password)).get(`/api/workspaces/${workspaceId}/members`).expect(200)).body);
    expect(leadView.invitations).toEqual([]);
    expect(leadView.members.length).toBeGreaterThan(1);
    const adminView = MembersResponse.parse((await adminSession.get(`/api/workspaces/${workspaceId}/members`)).body);
    expect(adminView.invitations.length).toBeGreaterThan(0);
  });
});
