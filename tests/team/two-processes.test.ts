import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { bundleServer, prepareDatabase, type ServerProcess, startServerProcess } from '../../server/bench/server-process.ts';
import { callJson, signInAs } from '../../server/bench/session-client.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { createClusterDatabase } from '../api/helpers/test-database.ts';
import { cornerDocument } from '../api/helpers/setup-fixtures.ts';

// Two real server processes (`server/main.ts`) on one PostgreSQL database, as a team would run
// them behind a load balancer: what one process decides (a sign-out, the attempts an address
// has used) holds on the other, because it lives in the database and not in process memory.

const dir = mkdtempSync(join(tmpdir(), 'rw-team-'));
const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
const SIGN_IN_LIMIT = 5;
let bundle: Awaited<ReturnType<typeof bundleServer>>;
let a: ServerProcess;
let b: ServerProcess;

beforeAll(async () => {
  const url = await createClusterDatabase('team_two');
  await prepareDatabase(url);
  bundle = await bundleServer();
  const start = () =>
    startServerProcess({ dbPath: join(dir, 'unused.sqlite'), bundle: bundle.path, readyTimeoutMs: 180_000, env: { DATABASE_URL: url, RIDEWRIGHT_RATE_LIMIT: String(SIGN_IN_LIMIT), TRUST_PROXY: 'loopback' } });
  [a, b] = await Promise.all([start(), start()]);
}, 240_000);

afterAll(async () => {
  await Promise.all([a?.kill(), b?.kill()]);
  bundle?.remove();
  rmSync(dir, { recursive: true, force: true });
});

describe('two server processes on one PostgreSQL database', () => {
  it('serve the same data: a revision saved through one is read through the other', async () => {
    const session = await signInAs(a.url, engineer.email, DEMO_PASSWORD);
    const ws = Me.parse((await callJson(b.url, session, 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
    const created = await callJson(a.url, session, 'POST', `/api/workspaces/${ws}/setups`, { setup: cornerDocument('Two-process corner') });
    expect(created.status).toBe(201);
    const id = SetupDetail.parse(created.body).id;
    const listed = SetupsResponse.parse((await callJson(b.url, session, 'GET', `/api/workspaces/${ws}/setups`)).body);
    expect(listed.setups.map((s) => s.id)).toContain(id);
  });

  it('a sign-out through one process ends the session on the other', async () => {
    const session = await signInAs(a.url, engineer.email, DEMO_PASSWORD);
    const ws = Me.parse((await callJson(a.url, session, 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
    expect((await callJson(b.url, session, 'GET', `/api/workspaces/${ws}/setups`)).status).toBe(200);
    expect((await callJson(a.url, session, 'POST', '/api/auth/signout')).status).toBeLessThan(300);
    expect((await callJson(b.url, session, 'GET', `/api/workspaces/${ws}/setups`)).status).toBe(401);
    expect((await callJson(a.url, session, 'GET', `/api/workspaces/${ws}/setups`)).status).toBe(401);
  });

  it('counts one address\'s sign-in attempts across both processes', async () => {
    const config = await fetch(`${a.url}/api/config`);
    const csrf = /rw_csrf=([^;]*)/.exec(config.headers.getSetCookie().join('\n'))![1];
    const statuses: number[] = [];
    for (let i = 0; i <= SIGN_IN_LIMIT; i++) {
      const server = i % 2 === 0 ? a : b;
      const res = await fetch(`${server.url}/api/auth/signin`, {
        method: 'POST',
        // one client address of its own (a documentation address, RFC 5737) behind the trusted proxy
        headers: { 'content-type': 'application/json', cookie: `rw_csrf=${csrf}`, 'x-csrf-token': csrf, 'x-forwarded-for': '203.0.113.7' },
        body: JSON.stringify({ email: `nobody.${i}@ridewright.test`, password: 'wrong password here' }),
      });
      statuses.push(res.status);
    }
    // each process alone has seen at most three attempts; only a shared count reaches the limit
    expect(statuses.slice(0, SIGN_IN_LIMIT)).toEqual(Array(SIGN_IN_LIMIT).fill(401));
    expect(statuses[SIGN_IN_LIMIT]).toBe(429);
  });
});
