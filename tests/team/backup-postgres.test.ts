import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { bundleServer, prepareDatabase, type ServerProcess, startServerProcess } from '../../server/bench/server-process.ts';
import { callJson, signInAs } from '../../server/bench/session-client.ts';
import { backupPostgres, restorePostgres } from '../../server/cli/postgres-backup.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { openDatabase } from '../../server/db/database.ts';
import { createClusterDatabase } from '../api/helpers/test-database.ts';
import { cornerDocument } from '../api/helpers/setup-fixtures.ts';

// `npm run backup` / `restore` with DATABASE_URL: pg_dump while the server writes, a restore
// that refuses while a server is connected, and after it every save acknowledged before the
// backup began, and none made after it.

const dir = mkdtempSync(join(tmpdir(), 'rw-pgbackup-'));
let bundle: Awaited<ReturnType<typeof bundleServer>> | undefined;
let server: ServerProcess | undefined;
afterAll(async () => {
  await server?.kill('SIGKILL');
  bundle?.remove();
  rmSync(dir, { recursive: true, force: true });
});

async function savedMessages(url: string): Promise<Set<string>> {
  const db = openDatabase(url);
  try {
    return new Set((await db.selectFrom('setup_revision').select('message').where('message', 'like', 'pg load %').execute()).map((r) => r.message));
  } finally {
    await db.destroy();
  }
}

describe('backup and restore on PostgreSQL', () => {
  it('dumps the live database while writes go on, refuses to restore under a running server, then restores the snapshot', async () => {
    const url = await createClusterDatabase('backup_pg');
    await prepareDatabase(url);
    bundle = await bundleServer();
    server = await startServerProcess({ dbPath: join(dir, 'unused.sqlite'), bundle: bundle.path, readyTimeoutMs: 180_000, env: { DATABASE_URL: url } });
    const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
    const session = await signInAs(server.url, engineer.email, DEMO_PASSWORD);
    const ws = Me.parse((await callJson(server.url, session, 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
    const setupId = SetupDetail.parse((await callJson(server.url, session, 'POST', `/api/workspaces/${ws}/setups`, { setup: cornerDocument('Backup corner PG') })).body).id;

    const acked: { message: string; at: number }[] = [];
    let stop = false;
    let serial = 0;
    const writer = (async () => {
      while (!stop) {
        const n = ++serial;
        const res = await callJson(server!.url, session, 'POST', `/api/workspaces/${ws}/setups/${setupId}/revisions`, {
          setup: cornerDocument('Backup corner PG', { sprungMass: 290 + n / 1000 }),
          message: `pg load ${n}`,
        });
        expect(res.status).toBe(201);
        acked.push({ message: `pg load ${n}`, at: Date.now() });
      }
    })();
    while (acked.length < 10) await new Promise((r) => setTimeout(r, 20));
    const started = Date.now();
    const backup = backupPostgres(url, join(dir, 'backups'));
    const before = acked.filter((a) => a.at < started).map((a) => a.message);
    while (acked.length < before.length + 5) await new Promise((r) => setTimeout(r, 20));
    stop = true;
    await writer;

    expect(backup.bytes).toBeGreaterThan(0);
    const refused = await restorePostgres(backup.path, url);
    expect(refused).toMatchObject({ ok: false, reason: expect.stringMatching(/in use .* stop every server process first/) });
    expect((await savedMessages(url)).size).toBe(acked.length);

    await server.kill('SIGTERM');
    server = undefined;
    const notADump = join(dir, 'not-a-dump.dump');
    writeFileSync(notADump, 'hello');
    expect(await restorePostgres(notADump, url)).toMatchObject({ ok: false, reason: expect.stringMatching(/not a PostgreSQL dump/) });
    expect((await savedMessages(url)).size).toBe(acked.length);

    expect(await restorePostgres(backup.path, url)).toEqual({ ok: true, pending: [] });
    const held = await savedMessages(url);
    for (const m of before) expect(held.has(m), `${m} acknowledged before the backup`).toBe(true);
    expect(held.size).toBeLessThan(acked.length);
  });
});
