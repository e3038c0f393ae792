import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { RESET_MINUTES } from '../../server/accounts/password-reset.service.ts';
import { browserLike, signedIn, signedOut } from './helpers/agents.ts';
import { linkIn, mailCount, waitForMail } from './helpers/mail.ts';
import { createUser, uniqueEmail } from './helpers/people.ts';
import { createTestApp, TEST_PUBLIC_URL } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

/** Asks for a reset and follows the link in the mail the sink received. */
async function requestLink(email: string): Promise<string> {
  const before = await mailCount(t.db, email);
  const b = await browserLike(t.url);
  await b.post('/api/auth/reset/request', { email }).expect(202);
  for (let i = 0; i < 400 && (await mailCount(t.db, email)) === before; i++) await new Promise((r) => setTimeout(r, 25));
  const mail = await waitForMail(t.db, email, 'new Ridewright password');
  expect(mail.text_body).toContain(`Hello`);
  return linkIn(mail.text_body, `${TEST_PUBLIC_URL}/reset/`).token;
}

describe('password reset', () => {
  it('mails a link that sets a new password once, and ends existing sessions', async () => {
    const user = await createUser(t.db, { name: 'Fen Ashdown' });
    const session = await signedIn(t.url, user.email, user.password);
    const token = await requestLink(user.email);

    const b = await browserLike(t.url);
    await b.post('/api/auth/reset/confirm', { token, password: 'brand new secret' }).expect(204);
    expect((await session.get('/api/auth/me').expect(200)).body).toEqual(signedOut);
    await b.post('/api/auth/signin', { email: user.email, password: user.password }).expect(401);
    await signedIn(t.url, user.email, 'brand new secret');

    const again = await b.post('/api/auth/reset/confirm', { token, password: 'another new secret' }).expect(410);
    expect(ErrorBody.parse(again.body).error.code).toBe('gone');
    await signedIn(t.url, user.email, 'brand new secret');
    const audit = await t.db.selectFrom('audit_log').select('action').where('entity_id', '=', user.id).execute();
    expect(audit.map((a) => a.action)).toEqual(['account.password_reset']);
  });

  it('a link mailed before the password was changed on the account page no longer works', async () => {
    const user = await createUser(t.db, { name: 'Wren Halloway' });
    const token = await requestLink(user.email);
    const session = await signedIn(t.url, user.email, user.password);
    await session.post('/api/auth/password', { currentPassword: user.password, newPassword: 'changed on purpose' }).expect(204);

    const b = await browserLike(t.url);
    const late = await b.post('/api/auth/reset/confirm', { token, password: 'attacker chosen pw' }).expect(410);
    expect(ErrorBody.parse(late.body).error.code).toBe('gone');
    await b.post('/api/auth/signin', { email: user.email, password: 'attacker chosen pw' }).expect(401);
    await signedIn(t.url, user.email, 'changed on purpose');
  });

  it('a link mailed before the account signed out of every session no longer works', async () => {
    const user = await createUser(t.db, { name: 'Orrin Pale' });
    const token = await requestLink(user.email);
    const session = await signedIn(t.url, user.email, user.password);
    await session.post('/api/auth/signout').expect(204);

    const b = await browserLike(t.url);
    await b.post('/api/auth/reset/confirm', { token, password: 'attacker chosen pw' }).expect(410);
    await signedIn(t.url, user.email, user.password);
  });

  it(`refuses a link older than ${RESET_MINUTES} minutes with 410 and keeps the old password`, async () => {
    const user = await createUser(t.db);
    const token = await requestLink(user.email);
    t.clock.advance((RESET_MINUTES + 1) * 60_000);
    const b = await browserLike(t.url);
    await b.post('/api/auth/reset/confirm', { token, password: 'too late a secret' }).expect(410);
    await signedIn(t.url, user.email, user.password);
  });

  it('accepts a link just inside its lifetime', async () => {
    const user = await createUser(t.db);
    const token = await requestLink(user.email);
    t.clock.advance((RESET_MINUTES - 1) * 60_000);
    await (await browserLike(t.url)).post('/api/auth/reset/confirm', { token, password: 'just in time pw' }).expect(204);
  });

  it('answers 202 for an unknown address and sends nothing', async () => {
    const email = uniqueEmail('ghost');
    const b = await browserLike(t.url);
    await b.post('/api/auth/reset/request', { email }).expect(202);
    // A known address sent afterwards arrives, so anything for the ghost would have too.
    const known = await createUser(t.db);
    await requestLink(known.email);
    expect(await mailCount(t.db, email)).toBe(0);
  });

  it('gives 410 for a made-up token and 400 naming the field for a short password', async () => {
    const b = await browserLike(t.url);
    await b.post('/api/auth/reset/confirm', { token: 'made-up-token', password: 'long enough pw' }).expect(410);
    const res = await b.post('/api/auth/reset/confirm', { token: 'made-up-token', password: 'short' }).expect(400);
    expect(ErrorBody.parse(res.body).error.fields?.map((f) => f.path)).toEqual(['password']);
  });
});
