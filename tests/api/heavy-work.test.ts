// Heavy work runs in the server's worker threads (server/jobs/heavy-pool.ts): a big upload does
// not hold other members' requests, and a full queue says "come back" instead of piling up.
import { afterAll, describe, expect, it } from 'vitest';
import { ErrorBody } from '../../shared/errors.ts';
import { configureHeavyPool } from '../../server/jobs/heavy-pool.ts';
import { signedIn } from './helpers/agents.ts';
import { addMember, createUser, createWorkspace } from './helpers/people.ts';
import { measuredCsv } from './helpers/road-dyno-fixtures.ts';
import { createTestApp } from './helpers/test-app.ts';

// One person fills the queue here: the per-person limits (tests/api/limits.test.ts) are lifted.
const t = await createTestApp({ heavyJobs: { atOnce: 0, perWindow: 0 } });
afterAll(async () => {
  await configureHeavyPool({});
  await t.close();
});
const workspaceId = await createWorkspace(t.db, 'Heavy bench');
const engineer = await createUser(t.db);
await addMember(t.db, workspaceId, engineer.id, 'engineer');
const eng = await signedIn(t.url, engineer.email, engineer.password);
const big = measuredCsv(400_000); // 100 km at 0.25 m, ~6 MB

const upload = (name: string) =>
  eng.agent
    .post(`/api/workspaces/${workspaceId}/roads/measured`)
    .set('x-csrf-token', eng.csrf)
    .field('name', name)
    .attach('file', Buffer.from(big), 'long-profile.csv');

describe('heavy work off the request thread', () => {
  it('answers a light read while a 400 000-row upload is being parsed', async () => {
    const order: string[] = [];
    const heavy = upload('Long profile').then((r) => {
      order.push('upload');
      return r;
    });
    // Let the upload reach the worker before the light read is sent.
    await new Promise((r) => setTimeout(r, 300));
    const light = await eng.get('/api/config');
    order.push('read');
    expect(light.status).toBe(200);
    expect((await heavy).status).toBe(201);
    expect(order).toEqual(['read', 'upload']);
  });

  it('answers 503 with Retry-After when the queue is full, and saves nothing for it', async () => {
    await configureHeavyPool({ maxThreads: 1, maxQueue: 1 });
    const before = Number((await t.db.selectFrom('road').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
    const results = await Promise.all([0, 1, 2, 3].map((i) => upload(`Burst ${i}`)));
    const refused = results.filter((r) => r.status === 503);
    expect(refused.length).toBeGreaterThan(0);
    for (const r of refused) {
      expect(ErrorBody.parse(r.body).error.code).toBe('busy');
      expect(Number(r.headers['retry-after'])).toBeGreaterThan(0);
    }
    const saved = results.filter((r) => r.status === 201).length;
    expect(saved + refused.length).toBe(4);
    const after = Number((await t.db.selectFrom('road').select((eb) => eb.fn.countAll<number>().as('n')).executeTakeFirstOrThrow()).n);
    expect(after - before).toBe(saved);
  });
});
