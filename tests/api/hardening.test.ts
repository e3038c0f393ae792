import { createHash } from 'node:crypto';
import pino from 'pino';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { CreatedShareLink } from '../../shared/schemas/share-link.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { CSRF_COOKIE } from '../../server/auth/csrf.ts';
import { SESSION_COOKIE } from '../../server/auth/session.ts';
import { routeKey } from '../../server/http/registry.ts';
import { browserLike, signedIn } from './helpers/agents.ts';
import { anonymousHeaders, addMember, createUser, createWorkspace } from './helpers/people.ts';
import { peaksCsv } from './helpers/road-dyno-fixtures.ts';
import { sendAs } from './helpers/route-matrix.ts';
import { createRoleWorld } from './helpers/role-world.ts';
import { cornerDocument, freshSetup } from './helpers/setup-fixtures.ts';
import { memoryFleetQueue } from './helpers/memory-fleet-queue.ts';
import { createTestApp, type TestApp } from './helpers/test-app.ts';
import { allEntries } from './matrix/all-entries.ts';

// The HTTP controls of server/THREAT-MODEL.md, each checked over every route it applies to
// (read from the route registry, so a route added later is covered or fails here).

async function withApp<T>(overrides: Parameters<typeof createTestApp>[0], body: (t: TestApp) => Promise<T>): Promise<T> {
  // the team-workers routes answer as they would with Redis (the real queue is tested in tests/fleet/)
  const t = await createTestApp({ fleet: memoryFleetQueue(), ...overrides });
  try {
    return await body(t);
  } finally {
    await t.close();
  }
}

/** Rows per table: enough to see that a refused request stored nothing. */
const rowCounts = async (t: TestApp) => {
  const counts: Record<string, number> = {};
  for (const table of await t.db.introspection.getTables()) {
    counts[table.name] = Number((await t.db.selectFrom(table.name as 'user').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
  }
  return counts;
};

/**
 * Every stored row, except the limits' own counting (`throttle_event`): a refused large job still
 * counts against its sender's per-person limit, which is the point of the limit.
 */
const tableDump = async (t: TestApp) => {
  const tables = (await t.db.introspection.getTables()).filter((table) => table.name !== 'throttle_event');
  let out = '';
  for (const table of tables) out += JSON.stringify(await t.db.selectFrom(table.name as 'user').selectAll().execute());
  return out;
};

describe('security headers', () => {
  it('sends a strict CSP and the other helmet headers on API answers and on errors', async () => {
    await withApp({}, async (t) => {
      for (const res of [await request(t.url).get('/api/config'), await request(t.url).get('/api/no/such/route'), await request(t.url).get('/api/auth/me')]) {
        const csp = String(res.headers['content-security-policy']);
        expect(csp).toContain("default-src 'self'");
        expect(csp).toContain("script-src 'self'");
        expect(csp).toContain("object-src 'none'");
        expect(csp).toContain("frame-ancestors 'none'");
        expect(csp).not.toMatch(/unsafe-(inline|eval)/);
        expect(res.headers['x-content-type-options']).toBe('nosniff');
        expect(res.headers['referrer-policy']).toBe('no-referrer');
        expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
        expect(res.headers['x-powered-by']).toBeUndefined();
      }
    });
  });
});

describe('rate limits', () => {
  const mustLimit = ['POST /api/auth/signin', 'POST /api/auth/signup', 'POST /api/auth/reset/request', 'POST /api/auth/reset/confirm', 'POST /api/invitations/:token/accept'];

  it('are declared on sign-in, sign-up, both reset steps and invitation accept', async () => {
    await withApp({}, async (t) => {
      const limited = t.routes.filter((r) => r.rateLimited).map(routeKey);
      expect(limited).toEqual(expect.arrayContaining(mustLimit));
    });
  });

  it('answer 429 in ErrorBody after the limit, per route and per client address behind a trusted proxy', async () => {
    await withApp({ rateLimit: 2, trustProxy: 'loopback' }, async (t) => {
      for (const route of t.routes.filter((r) => r.rateLimited)) {
        const path = route.path.replace(':token', 'a'.repeat(43));
        const from = (ip: string) => request(t.url)[route.method](path).set(anonymousHeaders(t)).set('X-Forwarded-For', ip).send({});
        for (let i = 0; i < 2; i++) expect((await from('198.51.100.7')).status, routeKey(route)).not.toBe(429);
        const refused = await from('198.51.100.7');
        expect(refused.status, routeKey(route)).toBe(429);
        expect(ErrorBody.parse(refused.body).error.code).toBe('rate_limited');
        expect(refused.headers['retry-after'] ?? refused.headers.ratelimit).toBeDefined();
        expect((await from('203.0.113.9')).status, `${routeKey(route)} from another address`).not.toBe(429);
      }
    });
  });
});

describe('body and upload limits', () => {
  it('answers 413 to a JSON body over 1 MB on every route that takes one, and stores nothing', async () => {
    await withApp({}, async (t) => {
      const world = await createRoleWorld(t);
      const huge = { name: 'x'.repeat(1_100_000) };
      const writes = t.routes.filter((r) => r.method !== 'get' && !r.before?.length);
      expect(writes.length).toBeGreaterThan(20);
      for (const route of writes) {
        const req = await allEntries[routeKey(route)].build(world, 'admin');
        const before = await rowCounts(t);
        const res = await sendAs(world, route.method, { path: req.path, body: huge }, route.access === 'public' ? 'signedOut' : 'admin');
        expect(res.status, routeKey(route)).toBe(413);
        expect(ErrorBody.parse(res.body).error.code).toBe('payload_too_large');
        expect(await rowCounts(t), `${routeKey(route)} stored something`).toEqual(before);
      }
    });
  }, 120_000);

  it('refuses every upload route with 413 once the workspace is at its upload quota, naming the limit; nothing is stored', async () => {
    await withApp({ uploadQuotaBytes: 10 }, async (t) => {
      const world = await createRoleWorld(t);
      const uploads = t.routes.filter((r) => r.before?.length);
      expect(uploads.length).toBeGreaterThanOrEqual(3);
      for (const route of uploads) {
        const req = await allEntries[routeKey(route)].build(world, 'admin');
        const before = await tableDump(t);
        const res = await sendAs(world, route.method, req, 'admin');
        expect(res.status, routeKey(route)).toBe(413);
        expect(ErrorBody.parse(res.body).error.message).toMatch(/limit/);
        expect(await tableDump(t)).toBe(before);
      }
    });
  });

  it('counts what a workspace already keeps: the upload that would pass the quota is refused, another workspace is not affected', async () => {
    const bytes = Buffer.byteLength(peaksCsv);
    await withApp({ uploadQuotaBytes: Math.round(bytes * 1.5) }, async (t) => {
      const world = await createRoleWorld(t);
      const setup = await freshSetup(t.db, world.workspaceId, world.members.engineer);
      const path = `/api/workspaces/${world.workspaceId}/setups/${setup.id}/dyno-files`;
      const upload = () => sendAs(world, 'post', { path, customize: (r) => r.attach('file', Buffer.from(peaksCsv), 'peaks.csv') }, 'engineer');
      expect((await upload()).status).toBe(201);
      const second = await upload();
      expect(second.status).toBe(413);
      expect(ErrorBody.parse(second.body).error.fields?.[0]?.path).toBe('file');
      const other = await createWorkspace(t.db, 'Other bench');
      const engineer = await createUser(t.db);
      await addMember(t.db, other, engineer.id, 'engineer');
      const otherSetup = await freshSetup(t.db, other, engineer);
      const s = await signedIn(t.url, engineer.email, engineer.password);
      await s.agent.post(`/api/workspaces/${other}/setups/${otherSetup.id}/dyno-files`).set('x-csrf-token', s.csrf).attach('file', Buffer.from(peaksCsv), 'peaks.csv').expect(201);
    });
  });
});

describe('share-link tokens', () => {
  it('are 32 random bytes each, never repeat, are stored only as SHA-256, and a near miss opens nothing', async () => {
    await withApp({}, async (t) => {
      const ws = await createWorkspace(t.db);
      const eng = await createUser(t.db);
      await addMember(t.db, ws, eng.id, 'engineer');
      const s = await signedIn(t.url, eng.email, eng.password);
      const setup = SetupDetail.parse((await s.post(`/api/workspaces/${ws}/setups`, { setup: cornerDocument('Token bench') }).expect(201)).body);
      const tokens: string[] = [];
      for (let i = 0; i < 40; i++) {
        const created = CreatedShareLink.parse((await s.post(`/api/workspaces/${ws}/share-links`, { objectType: 'setup_revision', objectId: setup.revision.id }).expect(201)).body);
        expect(created.token).toMatch(/^[A-Za-z0-9_-]{43}$/);
        expect(Buffer.from(created.token, 'base64url')).toHaveLength(32);
        tokens.push(created.token);
      }
      expect(new Set(tokens).size).toBe(tokens.length);
      // every bit position takes both values across 40 tokens (a stuck bit would show)
      const bits = tokens.map((tk) => Buffer.from(tk, 'base64url'));
      for (let bit = 0; bit < 256; bit++) {
        const ones = bits.filter((b) => (b[bit >> 3] >> (bit & 7)) & 1).length;
        expect(ones, `bit ${bit}`).toBeGreaterThan(0);
        expect(ones, `bit ${bit}`).toBeLessThan(tokens.length);
      }
      const hashes = (await t.db.selectFrom('share_link').select('token_hash').execute()).map((r) => r.token_hash);
      for (const tk of tokens) expect(hashes).toContain(createHash('sha256').update(tk).digest('hex'));
      const dump = await tableDump(t);
      for (const tk of tokens) expect(dump).not.toContain(tk);
      const nearMiss = `${tokens[0].slice(0, -1)}${tokens[0].endsWith('A') ? 'B' : 'A'}`;
      await request(t.url).get(`/api/shared/${tokens[0]}`).expect(200);
      expect((await request(t.url).get(`/api/shared/${nearMiss}`)).status).toBe(404);
    });
  });
});

describe('session cookies', () => {
  async function signInCookies(t: TestApp, headers: Record<string, string>) {
    const u = await createUser(t.db);
    const b = await browserLike(t.url);
    const res = await b.agent.post('/api/auth/signin').set('x-csrf-token', b.csrf).set(headers).send({ email: u.email, password: u.password }).expect(200);
    const csrf = await request(t.url).get('/api/config').set(headers);
    const all = [...(res.headers['set-cookie'] as unknown as string[]), ...(csrf.headers['set-cookie'] as unknown as string[])];
    return { session: all.find((c) => c.startsWith(`${SESSION_COOKIE}=`))!, csrf: all.find((c) => c.startsWith(`${CSRF_COOKIE}=`))! };
  }

  it('are Secure, HttpOnly and SameSite=Lax when a trusted proxy says the client used HTTPS', async () => {
    await withApp({ trustProxy: 'loopback' }, async (t) => {
      const { session, csrf } = await signInCookies(t, { 'X-Forwarded-Proto': 'https' });
      expect(session).toMatch(/;\s*Secure/i);
      expect(session).toMatch(/;\s*HttpOnly/i);
      expect(session).toMatch(/;\s*SameSite=Lax/i);
      expect(csrf).toMatch(/;\s*Secure/i);
      expect(csrf).not.toMatch(/HttpOnly/i);
      const plain = await signInCookies(t, {});
      expect(plain.session).not.toMatch(/Secure/i);
    });
  });

  it('ignore X-Forwarded-Proto from a client when no proxy is trusted', async () => {
    await withApp({ trustProxy: false }, async (t) => {
      const { session } = await signInCookies(t, { 'X-Forwarded-Proto': 'https' });
      expect(session).not.toMatch(/Secure/i);
    });
  });
});

describe('request logs', () => {
  it('never hold a share-link or invitation token', async () => {
    const lines: string[] = [];
    const logger = pino({ level: 'info' }, { write: (line: string) => void lines.push(line) });
    await withApp({ logger }, async (t) => {
      const token = 'S'.repeat(43);
      await request(t.url).get(`/api/shared/${token}`).expect(404);
      await request(t.url).get(`/api/invitations/${token}?x=1`);
      await request(t.url).post(`/api/invitations/${token}/accept`).set(anonymousHeaders(t)).send({});
      await request(t.url).get(`/api/shared/${token}%E0%A4%A`).expect(400);
      const log = lines.join('');
      expect(log).toContain('/api/shared/[token]');
      expect(log).toContain('/api/invitations/[token]');
      expect(log).not.toContain(token);
    });
  });
});
