import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import pino from 'pino';
import { afterAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { callJson, type Session, signInAs } from '../../server/bench/session-client.ts';
import { prepareDatabase } from '../../server/bench/server-process.ts';
import { copySqliteToPostgres } from '../../server/cli/copy-database.ts';
import { loadConfig } from '../../server/config.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { clusterDatabaseUrl, createClusterDatabase } from '../api/helpers/test-database.ts';
import { type RunningServer, startServer } from '../../server/start-server.ts';

// `npm run db:copy`: the seeded demo database copied from SQLite into an empty PostgreSQL
// database gives the same answers from the API, list for list and field for field.

const dir = mkdtempSync(join(tmpdir(), 'rw-copy-'));
const servers: RunningServer[] = [];
afterAll(async () => {
  for (const s of servers) await s.close();
  rmSync(dir, { recursive: true, force: true });
});

async function serve(env: Record<string, string>): Promise<RunningServer> {
  const config = loadConfig({ PORT: '0', RIDEWRIGHT_SECRET: 'copy-test-secret-copy-test-secret-0123', RIDEWRIGHT_DEMO: '1', RIDEWRIGHT_RATE_LIMIT: '0', ...env });
  const server = await startServer(config, pino({ level: 'silent' }), { kind: 'none' });
  servers.push(server);
  return server;
}

const readPaths = (ws: string, setupId: string) => [
  '/api/auth/me',
  `/api/workspaces/${ws}/setups`,
  `/api/workspaces/${ws}/setups/${setupId}`,
  `/api/workspaces/${ws}/setups/${setupId}/revisions`,
  `/api/workspaces/${ws}/vehicles`,
  `/api/workspaces/${ws}/roads`,
  `/api/workspaces/${ws}/runs`,
  `/api/workspaces/${ws}/studies`,
  `/api/workspaces/${ws}/target-sheets`,
  `/api/workspaces/${ws}/members`,
  `/api/workspaces/${ws}/audit`,
];

describe('npm run db:copy', () => {
  it('copies every table of a seeded SQLite database into empty PostgreSQL, and the API answers the same from both', async () => {
    const file = join(dir, 'demo.sqlite');
    await prepareDatabase(file);
    const url = await createClusterDatabase('copy_target', { empty: true });

    const copied = await copySqliteToPostgres(file, url);
    const rows = Object.fromEntries(copied.map((c) => [c.table, c.rows]));
    expect(rows.setup_revision).toBeGreaterThan(0);
    expect(rows.target_sheet).toBeGreaterThan(0);
    expect(rows.run).toBeGreaterThan(0);

    const fromFile = await serve({ RIDEWRIGHT_DB: file });
    const fromPostgres = await serve({ DATABASE_URL: url, RIDEWRIGHT_DB: join(dir, 'unused.sqlite') });
    const admin = DEMO_USERS.find((u) => u.role === 'admin')!;
    const sessions: [Session, Session] = [await signInAs(fromFile.url, admin.email, DEMO_PASSWORD), await signInAs(fromPostgres.url, admin.email, DEMO_PASSWORD)];
    const ws = Me.parse((await callJson(fromFile.url, sessions[0], 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
    const setups = (await callJson(fromFile.url, sessions[0], 'GET', `/api/workspaces/${ws}/setups`)).body as { setups: { id: string }[] };
    for (const path of readPaths(ws, setups.setups[0].id)) {
      const [a, b] = await Promise.all([callJson(fromFile.url, sessions[0], 'GET', path), callJson(fromPostgres.url, sessions[1], 'GET', path)]);
      expect(a.status, path).toBe(200);
      expect(b, path).toEqual(a);
    }
  });

  it('refuses to copy into a database that already holds data, and changes nothing there', async () => {
    const file = join(dir, 'again.sqlite');
    await prepareDatabase(file);
    const url = clusterDatabaseUrl('copy_target');
    await expect(copySqliteToPostgres(file, url)).rejects.toThrow(/not empty: table \w+ has \d+ rows/);
  });
});
