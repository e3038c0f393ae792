// Limits on actions that cost the server or reach other people's mailboxes (server/THREAT-MODEL.md):
// invitations per sender, per workspace and per recipient, password changes per user, failed
// sign-ins per account. Counted in the database, so every server process sees the same counts.
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { browserLike, signedIn } from './helpers/agents.ts';
import { mailCount } from './helpers/mail.ts';
import { addMember, createUser, createWorkspace, uniqueEmail } from './helpers/people.ts';
import { measuredCsv } from './helpers/road-dyno-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

const t = await createTestApp();
afterAll(() => t.close());

function limited(res: { status: number; headers: Record<string, string>; body: unknown }) {
  expect(res.status).toBe(429);
  expect(ErrorBody.parse(res.body).error.code).toBe('rate_limited');
  const retry = Number(res.headers['retry-after']);
  expect(retry).toBeGreaterThan(0);
  return retry;
}

describe('invitation limits', () => {
  it('stops a sender after 20 invitations in an hour and lets them go on an hour later', async () => {
    const workspaceId = await createWorkspace(t.db, 'Invite flood');
    const admin = await createUser(t.db, { name: 'Flood Admin' });
    await addMember(t.db, workspaceId, admin.id, 'admin');
    const s = await signedIn(t.url, admin.email, admin.password);
    const path = `/api/workspaces/${workspaceId}/invitations`;
    for (let i = 0; i < 20; i++) await s.post(path, { email: uniqueEmail(`flood${i}`), role: 'viewer' }).expect(201);
    const blocked = uniqueEmail('flood-blocked');
    const retry = limited(await s.post(path, { email: blocked, role: 'viewer' }));
    expect(retry).toBeLessThanOrEqual(3600);
    expect(await mailCount(t.db, blocked)).toBe(0);
    t.clock.advance(3601_000);
    await s.post(path, { email: blocked, role: 'viewer' }).expect(201);
  });

  it('sends one address at most 3 invitations a day, whoever sends them', async () => {
    const target = uniqueEmail('popular');
    for (let w = 0; w < 4; w++) {
      const workspaceId = await createWorkspace(t.db, `Recipient test ${w}`);
      const admin = await createUser(t.db);
      await addMember(t.db, workspaceId, admin.id, 'admin');
      const s = await signedIn(t.url, admin.email, admin.password);
      const res = await s.post(`/api/workspaces/${workspaceId}/invitations`, { email: target, role: 'viewer' });
      if (w < 3) expect(res.status).toBe(201);
      else limited(res);
    }
  });
});

describe('password change limit', () => {
  it('refuses the sixth change attempt in 15 minutes before checking the password', async () => {
    const user = await createUser(t.db);
    const s = await signedIn(t.url, user.email, user.password);
    const guesses = await Promise.all(Array.from({ length: 8 }, (_, i) => s.post('/api/auth/password', { currentPassword: `wrong guess ${i}`, newPassword: 'a brand new password' })));
    const statuses = guesses.map((r) => r.status).sort();
    expect(statuses.filter((c) => c === 400)).toHaveLength(5);
    expect(statuses.filter((c) => c === 429)).toHaveLength(3);
    // Even the right password waits now.
    limited(await s.post('/api/auth/password', { currentPassword: user.password, newPassword: 'a brand new password' }));
    t.clock.advance(15 * 60_000 + 1000);
    await s.post('/api/auth/password', { currentPassword: user.password, newPassword: 'a brand new password' }).expect(204);
  });
});

describe('sign-in back-off per account', () => {
  it('after 10 failed sign-ins for one account the next attempt waits, from any client, and unknown addresses behave the same', async () => {
    const user = await createUser(t.db);
    const unknown = uniqueEmail('nobody');
    for (const email of [user.email, unknown]) {
      for (let i = 0; i < 10; i++) {
        // A fresh client each time: the per-client-address limit alone would not stop this.
        const b = await browserLike(t.url);
        await b.post('/api/auth/signin', { email, password: `guess number ${i}` }).expect(401);
      }
      limited(await (await browserLike(t.url)).post('/api/auth/signin', { email, password: 'another guess' }));
    }
    limited(await (await browserLike(t.url)).post('/api/auth/signin', { email: user.email, password: user.password }));
    t.clock.advance(15 * 60_000 + 1000);
    await signedIn(t.url, user.email, user.password);
  });

  it('does not count sign-ins that succeed', async () => {
    const user = await createUser(t.db);
    for (let i = 0; i < 12; i++) await signedIn(t.url, user.email, user.password);
  });
});

describe('large jobs per person', () => {
  it('lets one person run two large jobs at once; a third waits its turn while others go on', async () => {
    const workspaceId = await createWorkspace(t.db, 'Heavy hands');
    const first = await createUser(t.db, { name: 'Busy Engineer' });
    const other = await createUser(t.db, { name: 'Other Engineer' });
    await addMember(t.db, workspaceId, first.id, 'engineer');
    await addMember(t.db, workspaceId, other.id, 'engineer');
    const a = await signedIn(t.url, first.email, first.password);
    const b = await signedIn(t.url, other.email, other.password);
    const csv = Buffer.from(measuredCsv(120_000));
    const upload = (s: typeof a, name: string) =>
      s.agent.post(`/api/workspaces/${workspaceId}/roads/measured`).set('x-csrf-token', s.csrf).field('name', name).attach('file', csv, 'profile.csv');
    const [r1, r2, r3, rOther] = await Promise.all([upload(a, 'One'), upload(a, 'Two'), upload(a, 'Three'), upload(b, 'Theirs')]);
    const statuses = [r1.status, r2.status, r3.status].sort();
    expect(statuses).toEqual([201, 201, 429]);
    const refused = [r1, r2, r3].find((r) => r.status === 429)!;
    limited(refused);
    expect(ErrorBody.parse(refused.body).error.message).toMatch(/2 large jobs running/);
    expect(rOther.status).toBe(201);
    // Once those finish, the same person may start again.
    expect((await upload(a, 'Four')).status).toBe(201);
  });

  it('counts 60 large jobs per person in ten minutes, in the database', async () => {
    const workspaceId = await createWorkspace(t.db, 'Many roads');
    const eng = await createUser(t.db, { name: 'Prolific Engineer' });
    await addMember(t.db, workspaceId, eng.id, 'engineer');
    const s = await signedIn(t.url, eng.email, eng.password);
    const road = (i: number) => s.post(`/api/workspaces/${workspaceId}/roads`, { name: `Bump ${i}`, definition: { kind: 'bump', height: 0.04, length: 0.6, at: 10 } });
    for (let i = 0; i < 60; i++) expect((await road(i)).status).toBe(201);
    const retry = limited(await road(60));
    expect(retry).toBeLessThanOrEqual(600);
    t.clock.advance(601_000);
    expect((await road(61)).status).toBe(201);
  });
});
