import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { bundleServer, prepareDatabase, type ServerProcess, startServerProcess } from '../../server/bench/server-process.ts';
import { callJson, signInAs } from '../../server/bench/session-client.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { openDatabase } from '../../server/db/database.ts';
import { createClusterDatabase } from '../api/helpers/test-database.ts';
import { cornerDocument } from '../api/helpers/setup-fixtures.ts';

// The SIGKILL test of tests/crash on PostgreSQL: the real server takes setup revisions from two
// writers and is killed at a random moment, again and again. After every kill the database must
// hold every revision whose save was answered 201 (same number), and each revision with its
// audit entry or neither (one transaction).

const KILLS = Number(process.env.CRASH_PG_KILLS ?? 10);
const dir = mkdtempSync(join(tmpdir(), 'rw-crash-pg-'));
let bundle: Awaited<ReturnType<typeof bundleServer>> | undefined;
let server: ServerProcess | undefined;
afterAll(async () => {
  await server?.kill('SIGKILL');
  bundle?.remove();
  rmSync(dir, { recursive: true, force: true });
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

describe('crash safety on PostgreSQL', () => {
  it(`keeps every acknowledged save through ${KILLS} SIGKILLs of the server`, async () => {
    const url = await createClusterDatabase('crash_pg');
    await prepareDatabase(url);
    bundle = await bundleServer();
    const start = () => startServerProcess({ dbPath: join(dir, 'unused.sqlite'), bundle: bundle!.path, readyTimeoutMs: 180_000, env: { DATABASE_URL: url } });
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
    const db = openDatabase(url);
    const acks = new Map<string, number>();
    let serial = 0;
    let setupId = '';
    let cutOff = 0;
    try {
      for (let k = 0; k < KILLS; k++) {
        server = await start();
        const session = await signInAs(server.url, engineer.email, DEMO_PASSWORD);
        const ws = Me.parse((await callJson(server.url, session, 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
        if (!setupId) setupId = SetupDetail.parse((await callJson(server.url, session, 'POST', `/api/workspaces/${ws}/setups`, { setup: cornerDocument('Crash corner PG') })).body).id;
        let down = false;
        const writer = async () => {
          while (!down) {
            const n = ++serial;
            const message = `crash pg #${n}`;
            try {
              const res = await callJson(server!.url, session, 'POST', `/api/workspaces/${ws}/setups/${setupId}/revisions`, {
                setup: cornerDocument('Crash corner PG', { sprungMass: 300 + n / 1000 }),
                message,
              });
              if (res.status === 201) acks.set(message, SetupDetail.parse(res.body).revision.number);
              else expect.fail(`save answered ${res.status}: ${JSON.stringify(res.body)}`);
            } catch (err) {
              if (!down) throw err;
              cutOff++;
            }
          }
        };
        const writers = [writer(), writer()];
        await sleep(200 + Math.random() * 800);
        down = true;
        await server.kill('SIGKILL');
        await Promise.all(writers);

        const rows = await db.selectFrom('setup_revision').select(['message', 'number']).where('setup_id', '=', setupId).where('message', 'like', 'crash pg #%').execute();
        const held = new Map(rows.map((r) => [r.message, r.number]));
        for (const [message, number] of acks) expect(held.get(message), `acknowledged save "${message}"`).toBe(number);
        const audited = await db
          .selectFrom('audit_log')
          .select((eb) => eb.fn.countAll<number>().as('n'))
          .where('action', '=', 'setup.revised')
          .where('summary', 'like', '%: crash pg #%')
          .executeTakeFirstOrThrow();
        expect(Number(audited.n), 'a revision without its audit entry, or the reverse').toBe(rows.length);
      }
    } finally {
      await db.destroy();
    }
    expect(acks.size).toBeGreaterThan(KILLS);
    console.log(`crash on PostgreSQL: ${KILLS} kills, ${acks.size} saves acknowledged and kept, ${cutOff} cut off by a kill`);
  });
});
