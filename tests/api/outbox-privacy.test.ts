import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { Me } from '../../shared/schemas/account.ts';
import { OutboxResponse, type OutboxMessage } from '../../shared/schemas/outbox.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { seedDemo } from '../../server/db/seed/seed-demo.ts';
import { type BrowserLike, browserLike, signedIn } from './helpers/agents.ts';
import { linkIn, waitForMail } from './helpers/mail.ts';
import { uniqueEmail } from './helpers/people.ts';
import { signUpConfirmed } from './helpers/sign-up.ts';
import { createTestApp } from './helpers/test-app.ts';

// On a demo instance anyone may sign up and so administer a workspace of their own. The outbox
// must not turn that into a way to read somebody else's password-reset link.

const t = await createTestApp({ demoMode: true });
await seedDemo(t.db);
afterAll(() => t.close());

const demo = (role: (typeof DEMO_USERS)[number]['role']) => DEMO_USERS.find((u) => u.role === role)!;

async function outboxOf(b: BrowserLike): Promise<OutboxMessage[]> {
  return OutboxResponse.parse((await b.get('/api/outbox').expect(200)).body).messages;
}

async function signUpStranger(): Promise<{ b: BrowserLike; workspaceId: string }> {
  const { b, me } = await signUpConfirmed(t, { name: 'Sly Stranger', email: uniqueEmail('stranger'), password: 'stranger-password-1', workspaceName: 'Stranger bench' });
  return { b, workspaceId: me.memberships[0].workspaceId };
}

describe('who reads which mail in the demo outbox', () => {
  it('a signed-up stranger never sees a demo user’s reset mail, even after inviting that address', async () => {
    const { b: stranger, workspaceId } = await signUpStranger();
    const victim = demo('engineer');
    // a pending invitation to the victim's address, in the stranger's own workspace
    await stranger.post(`/api/workspaces/${workspaceId}/invitations`, { email: victim.email, role: 'viewer' }).expect(201);
    const anon = await browserLike(t.url);
    await anon.post('/api/auth/reset/request', { email: victim.email }).expect(202);
    const reset = await waitForMail(t.db, victim.email, 'password');
    expect(reset.text_body).toContain('/reset/');

    const seen = await outboxOf(stranger);
    expect(seen.map((m) => m.id)).not.toContain(reset.id);
    expect(seen.some((m) => m.text.includes('/reset/'))).toBe(false);
    // the stranger does see the invitation they sent themselves
    expect(seen.filter((m) => m.to === victim.email && m.text.includes('/invite/'))).toHaveLength(1);
  });

  it('a workspace admin sees the invitations of that workspace and their own reset mail, not a member’s', async () => {
    const admin = await signedIn(t.url, demo('admin').email, DEMO_PASSWORD);
    const lead = demo('lead');
    const anon = await browserLike(t.url);
    await anon.post('/api/auth/reset/request', { email: lead.email }).expect(202);
    const reset = await waitForMail(t.db, lead.email, 'password');
    const workspaceId = (await admin.get('/api/auth/me').expect(200)).body.memberships[0].workspaceId as string;
    const invitee = uniqueEmail('invitee');
    await admin.post(`/api/workspaces/${workspaceId}/invitations`, { email: invitee, role: 'engineer' }).expect(201);
    const invitation = await waitForMail(t.db, invitee);

    const adminSees = (await outboxOf(admin)).map((m) => m.id);
    expect(adminSees).toContain(invitation.id);
    expect(adminSees).not.toContain(reset.id);

    // the admin's own reset mail is theirs to read
    await anon.post('/api/auth/reset/request', { email: demo('admin').email }).expect(202);
    const own = await waitForMail(t.db, demo('admin').email, 'password');
    expect((await outboxOf(admin)).map((m) => m.id)).toContain(own.id);
  });

  it('a stranger’s own reset mail is theirs to read', async () => {
    const { b: stranger } = await signUpStranger();
    const me = Me.parse((await stranger.get('/api/auth/me').expect(200)).body).user;
    await (await browserLike(t.url)).post('/api/auth/reset/request', { email: me.email }).expect(202);
    const reset = await waitForMail(t.db, me.email, 'password');
    expect((await outboxOf(stranger)).map((m) => m.id)).toContain(reset.id);
  });

  it('an account that has not confirmed its address reads its confirmation mail, never an invitation to that address, and cannot accept one', async () => {
    // someone signs up with the address a team is about to invite
    const email = uniqueEmail('future.hire');
    const squatter = await browserLike(t.url);
    await squatter.post('/api/auth/signup', { name: 'Early Bird', email, password: 'early-bird-password', workspaceName: 'Perch' }).expect(202);
    await squatter.post('/api/auth/signin', { email, password: 'early-bird-password' }).expect(200);
    const admin = await signedIn(t.url, demo('admin').email, DEMO_PASSWORD);
    const workspaceId = (await admin.get('/api/auth/me').expect(200)).body.memberships[0].workspaceId as string;
    await admin.post(`/api/workspaces/${workspaceId}/invitations`, { email, role: 'engineer' }).expect(201);
    const invitation = await waitForMail(t.db, email, 'asks you to join');
    const confirmation = await waitForMail(t.db, email, 'Confirm your address');

    const seen = (await outboxOf(squatter)).map((m) => m.id);
    expect(seen).toContain(confirmation.id);
    expect(seen).not.toContain(invitation.id);
    // even holding the link (say it leaked), an unconfirmed account cannot accept
    const { token } = linkIn(invitation.text_body, '/invite/');
    const refused = await squatter.post(`/api/invitations/${token}/accept`, {}).expect(403);
    expect(ErrorBody.parse(refused.body).error.message).toMatch(/Confirm your address first/);
    // once the address is proved, the same account accepts
    await squatter.post('/api/auth/confirm', { token: linkIn(confirmation.text_body, '/confirm/').token }).expect(200);
    expect(Me.parse((await squatter.post(`/api/invitations/${token}/accept`, {}).expect(200)).body).memberships.map((m) => m.workspaceId)).toContain(workspaceId);
  });
});
