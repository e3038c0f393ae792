import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { Me, MeAnswer, SignUpAnswer } from '../../shared/schemas/account.ts';
import { AppConfig } from '../../shared/schemas/config.ts';
import { SESSION_COOKIE } from '../../server/auth/session.ts';
import { loadConfig } from '../../server/config.ts';
import { browserLike, cookieValue, signedIn, signedOut } from './helpers/agents.ts';
import { linkIn, waitForMail } from './helpers/mail.ts';
import { uniqueEmail } from './helpers/people.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

const count = async (table: 'user' | 'workspace' | 'membership' | 'audit_log') =>
  Number((await t.db.selectFrom(table).select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);

async function signUp(email = uniqueEmail('owner'), password = 'a sound password') {
  const b = await browserLike(t.url);
  const res = await b.post('/api/auth/signup', { name: 'Wren Castell', email, password, workspaceName: 'Castell bench' });
  return { b, res, email, password };
}

describe('sign-up', () => {
  it('answers 202 without a session, makes an unconfirmed account with its workspace, and the mailed link signs it in once', async () => {
    const { b, res, email } = await signUp();
    expect(res.status).toBe(202);
    expect(SignUpAnswer.parse(res.body).email).toBe(email);
    expect(cookieValue(res.headers['set-cookie'], SESSION_COOKIE)).toBeUndefined();
    const row = await t.db.selectFrom('user').select(['id', 'email_verified_at']).where('email', '=', email).executeTakeFirstOrThrow();
    expect(row.email_verified_at).toBeNull();

    const mail = await waitForMail(t.db, email, 'Confirm your address');
    const { token } = linkIn(mail.text_body, '/confirm/');
    const confirmed = await b.post('/api/auth/confirm', { token }).expect(200);
    const me = Me.parse(confirmed.body);
    expect(me.user).toMatchObject({ name: 'Wren Castell', email, emailVerified: true });
    expect(me.memberships).toEqual([{ workspaceId: expect.any(String), workspaceName: 'Castell bench', role: 'admin' }]);
    const cookie = (confirmed.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith(`${SESSION_COOKIE}=`));
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/); // plain http on loopback
    expect(Me.parse((await b.get('/api/auth/me').expect(200)).body).user.email).toBe(email);
    const audit = await t.db.selectFrom('audit_log').selectAll().where('workspace_id', '=', me.memberships[0].workspaceId).execute();
    expect(audit.map((a) => [a.action, a.actor_id])).toEqual([['workspace.created', me.user.id]]);
    // the link works once
    expect(ErrorBody.parse((await (await browserLike(t.url)).post('/api/auth/confirm', { token }).expect(410)).body).error.code).toBe('gone');
  });

  it('answers a taken address exactly as a new one, creates nothing, and tells the owner by mail', async () => {
    const email = uniqueEmail('dup');
    const first = await signUp(`  ${email.toUpperCase()} `);
    expect(first.res.status).toBe(202);
    const before = await Promise.all([count('user'), count('workspace'), count('membership')]);
    const again = await signUp(email, 'another sound password');
    expect(again.res.status).toBe(202);
    expect(Object.keys(again.res.body).sort()).toEqual(Object.keys(first.res.body).sort());
    expect(again.res.body).toEqual(first.res.body);
    expect(await Promise.all([count('user'), count('workspace'), count('membership')])).toEqual(before);
    const notice = await waitForMail(t.db, email, 'second Ridewright account');
    expect(notice.text_body).toContain('/reset');
  });

  it('is closed unless the server opens it, and the sign-in page is told so', async () => {
    const closed = await createTestApp({ openSignUp: false });
    try {
      const b = await browserLike(closed.url);
      expect(AppConfig.parse((await b.get('/api/config').expect(200)).body).signUpOpen).toBe(false);
      const res = await b.post('/api/auth/signup', { name: 'Shut Out', email: uniqueEmail('closed'), password: 'a sound password', workspaceName: 'Nope' }).expect(403);
      expect(ErrorBody.parse(res.body).error.message).toMatch(/invitation/);
      expect(Number((await closed.db.selectFrom('user').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n)).toBe(0);
    } finally {
      await closed.close();
    }
  });

  it('refuses a confirmation link older than 24 hours with 410 and leaves the address unconfirmed', async () => {
    const { email } = await signUp();
    const { token } = linkIn((await waitForMail(t.db, email, 'Confirm your address')).text_body, '/confirm/');
    t.clock.advance(24 * 3600_000 + 1000);
    expect(ErrorBody.parse((await (await browserLike(t.url)).post('/api/auth/confirm', { token }).expect(410)).body).error.code).toBe('gone');
    const row = await t.db.selectFrom('user').select('email_verified_at').where('email', '=', email).executeTakeFirstOrThrow();
    expect(row.email_verified_at).toBeNull();
  });

  it('mails a new link only to an unconfirmed account, three times an hour, counted in the database', async () => {
    const { email, password } = await signUp();
    await waitForMail(t.db, email, 'Confirm your address');
    const s = await signedIn(t.url, email, password);
    for (let i = 0; i < 3; i += 1) await s.post('/api/auth/confirm/resend').expect(202);
    expect(ErrorBody.parse((await s.post('/api/auth/confirm/resend').expect(429)).body).error.code).toBe('rate_limited');
    const counted = await t.db.selectFrom('throttle_event').select('key').where('key', 'like', 'address-check:user:%').execute();
    expect(counted.length).toBeGreaterThanOrEqual(3);
    // the newest link confirms; after that there is nothing to resend
    const newest = linkIn((await waitForMail(t.db, email, 'Confirm your address')).text_body, '/confirm/').token;
    await (await browserLike(t.url)).post('/api/auth/confirm', { token: newest }).expect(200);
    const done = await signedIn(t.url, email, password);
    expect(ErrorBody.parse((await done.post('/api/auth/confirm/resend').expect(409)).body).error.code).toBe('conflict');
  });

  it('RIDEWRIGHT_OPEN_SIGNUP defaults to on in demo mode and off otherwise, and overrides either way', () => {
    expect(loadConfig({}).openSignUp).toBe(true); // demo mode is the default
    expect(loadConfig({ RIDEWRIGHT_DEMO: '0' }).openSignUp).toBe(false);
    expect(loadConfig({ RIDEWRIGHT_DEMO: '0', RIDEWRIGHT_OPEN_SIGNUP: '1' }).openSignUp).toBe(true);
    expect(loadConfig({ RIDEWRIGHT_DEMO: '1', RIDEWRIGHT_OPEN_SIGNUP: '0' }).openSignUp).toBe(false);
  });

  it('answers a bad body with 400, naming every bad field, and saves nothing', async () => {
    const before = await Promise.all([count('user'), count('workspace'), count('membership'), count('audit_log')]);
    const b = await browserLike(t.url);
    const res = await b.post('/api/auth/signup', { name: '', email: 'not-an-address', password: 'short', workspaceName: 42 }).expect(400);
    const body = ErrorBody.parse(res.body);
    expect(body.error.code).toBe('bad_request');
    expect(body.error.fields?.map((f) => f.path).sort()).toEqual(['email', 'name', 'password', 'workspaceName']);
    expect(await Promise.all([count('user'), count('workspace'), count('membership'), count('audit_log')])).toEqual(before);
  });
});

describe('sign-in and sign-out', () => {
  it('signs in with the right password and gives the same 401 for a wrong password or an unknown address', async () => {
    const { email, password } = await signUp();
    const ok = await signedIn(t.url, email.toUpperCase(), password);
    expect(Me.parse((await ok.get('/api/auth/me').expect(200)).body).user.email).toBe(email);

    const b = await browserLike(t.url);
    const wrong = await b.post('/api/auth/signin', { email, password: 'not the password' }).expect(401);
    const unknown = await b.post('/api/auth/signin', { email: uniqueEmail('nobody'), password: 'not the password' }).expect(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(ErrorBody.parse(wrong.body).error.code).toBe('unauthenticated');
    expect(cookieValue(wrong.headers['set-cookie'], SESSION_COOKIE)).toBeUndefined();
    expect((await b.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
  });

  it('ends the session on sign-out, and a copy of the old cookie no longer works', async () => {
    const { email, password } = await signUp();
    const a = await browserLike(t.url);
    const signin = await a.post('/api/auth/signin', { email, password }).expect(200);
    const stolen = `${SESSION_COOKIE}=${cookieValue(signin.headers['set-cookie'], SESSION_COOKIE)}`;
    const other = await signedIn(t.url, email, password);
    await request(t.url).get('/api/auth/me').set('Cookie', stolen).expect(200);
    const res = await a.post('/api/auth/signout').expect(204);
    expect(String(res.headers['set-cookie'])).toMatch(new RegExp(`${SESSION_COOKIE}=;`));
    expect((await a.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    // Sign-out bumps the session version: the other device is signed out too.
    expect((await other.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    expect((await request(t.url).get('/api/auth/me').set('Cookie', stolen).expect(200)).body).toEqual(signedOut);
  });

  it('answers GET /api/auth/me signed out with 200, the signed-out state (no error to log) and a CSRF cookie', async () => {
    const res = await request(t.url).get('/api/auth/me').expect(200);
    expect(MeAnswer.parse(res.body)).toEqual({ user: null, memberships: [] });
    expect(cookieValue(res.headers['set-cookie'], 'rw_csrf')).toMatch(/^[A-Za-z0-9_-]{20,}\.[A-Za-z0-9_-]{32}$/);
  });

  it('ignores a session token signed with another key', async () => {
    const { issueSessionToken } = await import('../../server/auth/session.ts');
    const { email, password } = await signUp();
    const a = await signedIn(t.url, email, password);
    const me = Me.parse((await a.get('/api/auth/me')).body);
    const forged = await issueSessionToken(new TextEncoder().encode('another-key-another-key-another-key'), { userId: me.user.id, sessionVersion: 0 }, new Date());
    expect((await request(t.url).get('/api/auth/me').set('Cookie', `${SESSION_COOKIE}=${forged}`).expect(200)).body).toEqual(signedOut);
  });
});

describe('password change', () => {
  it('needs the current password, then keeps this session and ends the others', async () => {
    const { email, password } = await signUp();
    const here = await signedIn(t.url, email, password);
    const elsewhere = await signedIn(t.url, email, password);

    const wrong = await here.post('/api/auth/password', { currentPassword: 'not it at all', newPassword: 'a newer password' }).expect(400);
    expect(ErrorBody.parse(wrong.body).error.fields).toEqual([{ path: 'currentPassword', message: expect.any(String) }]);
    await elsewhere.get('/api/auth/me').expect(200);

    const tooShort = await here.post('/api/auth/password', { currentPassword: password, newPassword: 'short' }).expect(400);
    expect(ErrorBody.parse(tooShort.body).error.fields?.map((f) => f.path)).toEqual(['newPassword']);

    await here.post('/api/auth/password', { currentPassword: password, newPassword: 'a newer password' }).expect(204);
    await here.get('/api/auth/me').expect(200);
    expect((await elsewhere.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    await (await browserLike(t.url)).post('/api/auth/signin', { email, password }).expect(401);
    await signedIn(t.url, email, 'a newer password');
    const entry = await t.db.selectFrom('audit_log').selectAll().where('action', '=', 'account.password_changed').where('entity_id', '=', Me.parse((await here.get('/api/auth/me')).body).user.id).executeTakeFirst();
    expect(entry?.workspace_id).toBeNull();
  });
});
