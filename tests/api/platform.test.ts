import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { AppConfig } from '../../shared/schemas/config.ts';
import { OutboxResponse } from '../../shared/schemas/outbox.ts';
import { browserLike, signedIn, signedOut } from './helpers/agents.ts';
import { waitForMail } from './helpers/mail.ts';
import { addMember, createUser, createWorkspace, uniqueEmail } from './helpers/people.ts';
import { createTestApp } from './helpers/test-app.ts';

const dist = mkdtempSync(join(tmpdir(), 'rw-dist-'));
writeFileSync(join(dist, 'index.html'), '<!doctype html><title>client shell</title><div id="root"></div>');
const t = await createTestApp({ client: { kind: 'static', distDir: dist }, demoMode: true });
afterAll(async () => {
  await t.close();
  rmSync(dist, { recursive: true, force: true });
});

const count = async () => Number((await t.db.selectFrom('user').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);

describe('CSRF', () => {
  const body = { name: 'Csrf Test', email: 'csrf@ridewright.test', password: 'long enough pw', workspaceName: 'W' };

  it('refuses a state-changing request without the header, or with a header that does not match the cookie', async () => {
    const before = await count();
    const b = await browserLike(t.url);
    const none = await b.agent.post('/api/auth/signup').send(body).expect(403);
    expect(ErrorBody.parse(none.body).error.code).toBe('csrf');
    await b.agent.post('/api/auth/signup').set('x-csrf-token', 'x'.repeat(b.csrf.length)).send(body).expect(403);
    await request(t.url).post('/api/auth/signup').set('x-csrf-token', b.csrf).send(body).expect(403); // header but no cookie
    expect(await count()).toBe(before);
    await b.post('/api/auth/signup', body).expect(202);
  });

  it('does not let a signed-in session act without the token', async () => {
    const u = await createUser(t.db);
    const s = await signedIn(t.url, u.email, u.password);
    await s.agent.post('/api/auth/signout').expect(403);
    await s.get('/api/auth/me').expect(200);
  });
});

describe('CSRF tokens signed by the server and bound to the session (OWASP signed double-submit)', () => {
  it('refuses a made-up cookie/header pair, even a matching one', async () => {
    const u = await createUser(t.db);
    const res = await request(t.url).post('/api/auth/signin').set('Cookie', 'rw_csrf=a').set('x-csrf-token', 'a').send({ email: u.email, password: u.password }).expect(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('csrf');
  });

  it('refuses a write from a foreign Origin or a cross-site fetch, and accepts the app\'s own origin', async () => {
    const u = await createUser(t.db);
    const s = await signedIn(t.url, u.email, u.password);
    const foreign = await s.agent.post('/api/auth/password').set('x-csrf-token', s.csrf).set('Origin', 'http://evil.example').send({ currentPassword: u.password, newPassword: 'a new long password' }).expect(403);
    expect(ErrorBody.parse(foreign.body).error.code).toBe('csrf');
    await s.agent.post('/api/auth/password').set('x-csrf-token', s.csrf).set('Sec-Fetch-Site', 'cross-site').send({ currentPassword: u.password, newPassword: 'a new long password' }).expect(403);
    await s.agent.post('/api/auth/password').set('x-csrf-token', s.csrf).set('Origin', new URL(t.url).origin).send({ currentPassword: u.password, newPassword: 'a new long password' }).expect(204);
  });

  it('refuses a valid token from another browser planted beside a session', async () => {
    const u = await createUser(t.db);
    const victim = await browserLike(t.url);
    const signin = await victim.post('/api/auth/signin', { email: u.email, password: u.password }).expect(200);
    const setCookies = ([] as string[]).concat(signin.headers['set-cookie'] ?? []);
    const sessionCookie = setCookies.find((c) => c.startsWith('rw_session='))?.split(';')[0];
    expect(sessionCookie).toBeDefined();
    const attacker = await browserLike(t.url);
    const res = await request(t.url).post('/api/auth/signout').set('Cookie', `${sessionCookie}; rw_csrf=${attacker.csrf}`).set('x-csrf-token', attacker.csrf).expect(403);
    expect(ErrorBody.parse(res.body).error.code).toBe('csrf');
    await victim.get('/api/auth/me').expect(200);
  });
});

describe('errors and limits', () => {
  it('answers an unknown /api route with a JSON 404 for any method', async () => {
    const get = await request(t.url).get('/api/no/such/thing').expect(404);
    expect(ErrorBody.parse(get.body).error.code).toBe('not_found');
    const b = await browserLike(t.url);
    expect(ErrorBody.parse((await b.post('/api/no/such/thing', {}).expect(404)).body).error.code).toBe('not_found');
  });

  it('answers malformed JSON with 400 and an over-sized body with 413, both as ErrorBody', async () => {
    const b = await browserLike(t.url);
    const bad = await b.agent.post('/api/auth/signin').set('x-csrf-token', b.csrf).set('Content-Type', 'application/json').send('{"email": ').expect(400);
    expect(ErrorBody.parse(bad.body).error.code).toBe('bad_request');
    const huge = await b.post('/api/auth/signin', { email: 'a@b.test', password: 'x'.repeat(1_100_000) }).expect(413);
    expect(ErrorBody.parse(huge.body).error.code).toBe('payload_too_large');
  });

  it('answers a missing body with 400 listing the required fields', async () => {
    const b = await browserLike(t.url);
    const res = await b.agent.post('/api/auth/signin').set('x-csrf-token', b.csrf).expect(400);
    expect(ErrorBody.parse(res.body).error.fields?.length).toBeGreaterThan(0);
  });

  it('limits sign-in attempts per address with a JSON 429', async () => {
    const limited = await createTestApp({ rateLimit: 3 });
    try {
      const b = await browserLike(limited.url);
      const attempt = () => b.post('/api/auth/signin', { email: 'nobody@ridewright.test', password: 'whatever it is' });
      for (let i = 0; i < 3; i++) expect((await attempt()).status).toBe(401);
      const res = await attempt().expect(429);
      expect(ErrorBody.parse(res.body).error.code).toBe('rate_limited');
      expect((await b.get('/api/auth/me').expect(200)).body).toEqual(signedOut); // other routes are not limited
    } finally {
      await limited.close();
    }
  });
});

describe('config, outbox and the client', () => {
  it('lists the demo users in demo mode only', async () => {
    const cfg = AppConfig.parse((await request(t.url).get('/api/config').expect(200)).body);
    expect(cfg.demoMode).toBe(true);
    expect(cfg.demoUsers.map((u) => u.role).sort()).toEqual(['admin', 'engineer', 'lead', 'viewer']);
    const plain = await createTestApp({ demoMode: false, outboxEnabled: false });
    try {
      expect(AppConfig.parse((await request(plain.url).get('/api/config').expect(200)).body)).toEqual({ demoMode: false, demoUsers: [], signUpOpen: true, teamWorkers: false });
      const ws = await createWorkspace(plain.db);
      const u = await createUser(plain.db);
      await addMember(plain.db, ws, u.id, 'admin');
      const s = await signedIn(plain.url, u.email, u.password);
      await s.get('/api/outbox').expect(404);
    } finally {
      await plain.close();
    }
  });

  it('shows an admin what the sink caught, newest first', async () => {
    const ws = await createWorkspace(t.db, 'Outbox bench');
    const u = await createUser(t.db, { name: 'Outbox Admin' });
    await addMember(t.db, ws, u.id, 'admin');
    const s = await signedIn(t.url, u.email, u.password);
    const first = uniqueEmail('first');
    const second = uniqueEmail('second');
    await s.post(`/api/workspaces/${ws}/invitations`, { email: first, role: 'viewer' }).expect(201);
    await waitForMail(t.db, first);
    t.clock.advance(1000);
    await s.post(`/api/workspaces/${ws}/invitations`, { email: second, role: 'viewer' }).expect(201);
    await waitForMail(t.db, second);
    const { messages } = OutboxResponse.parse((await s.get('/api/outbox').expect(200)).body);
    const mine = messages.filter((m) => m.to === first || m.to === second);
    expect(mine.map((m) => m.to)).toEqual([second, first]);
    expect(mine[0].subject).toContain('Outbox bench');
    expect(mine[0].text).toContain('/invite/');
    expect(mine[0].from).toContain('ridewright.test');
  });

  it('serves the client shell for any other GET, with a strict content security policy', async () => {
    const res = await request(t.url).get('/setups/123/anything').expect(200);
    expect(res.text).toContain('client shell');
    const csp = String(res.headers['content-security-policy']);
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).not.toContain('unsafe');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
  });
});
