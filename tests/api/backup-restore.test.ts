import { execFile } from 'node:child_process';
import { closeSync, copyFileSync, existsSync, mkdtempSync, openSync, rmSync, statSync, writeFileSync, writeSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { promisify } from 'node:util';
import SQLite from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { RevisionsResponse, SetupDetail } from '../../shared/schemas/setup-record.ts';
import { prepareDatabase, type ServerProcess, startServerProcess } from '../../server/bench/server-process.ts';
import { callJson, type Session, signInAs } from '../../server/bench/session-client.ts';
import { checkBackupFile } from '../../server/cli/restore-database.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { cornerDocument } from './helpers/setup-fixtures.ts';

// `npm run backup` copies the live database while the server (a child process) keeps taking
// writes; `npm run restore` puts a copy back once the server is stopped. Both CLIs run as
// their own processes, as an operator would run them.

const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const run = promisify(execFile);
const dir = mkdtempSync(join(tmpdir(), 'rw-backup-'));
const dbPath = join(dir, 'live.sqlite');
const backups = join(dir, 'backups');
const children = new Set<ServerProcess>();
afterAll(async () => {
  await Promise.all([...children].map((c) => c.kill('SIGKILL')));
  rmSync(dir, { recursive: true, force: true });
});

const cli = (script: string, args: string[]) =>
  run(process.execPath, ['--import', 'tsx', `server/cli/${script}.ts`, ...args], { cwd: ROOT, env: { ...process.env, RIDEWRIGHT_DB: dbPath } }).then(
    (r) => ({ code: 0, out: r.stdout, err: r.stderr }),
    (e: { code: number; stdout: string; stderr: string }) => ({ code: e.code, out: e.stdout, err: e.stderr }),
  );

async function serve(): Promise<ServerProcess> {
  const s = await startServerProcess({ dbPath, readyTimeoutMs: 180_000 });
  children.add(s);
  return s;
}

interface Ack {
  message: string;
  number: number;
  at: number;
}

const crashMessages = (file: string) => {
  const db = new SQLite(file, { readonly: true });
  try {
    const revisions = db.prepare<[], { message: string }>(`select message from setup_revision where message like 'load %'`).all().map((r) => r.message);
    const audited = db.prepare<[], { n: number }>(`select count(*) as n from audit_log where summary like '%: load %'`).get()!.n;
    return { revisions: new Set(revisions), audited };
  } finally {
    db.close();
  }
};

describe('backup and restore', () => {
  let backupFile = '';
  const acked: Ack[] = [];
  let session: Session;
  let setupId = '';
  let workspaceId = '';

  it('backs up the live database while writes go on; the copy holds every write acknowledged before it began', async () => {
    await prepareDatabase(dbPath);
    const server = await serve();
    session = await signInAs(server.url, DEMO_USERS.find((u) => u.role === 'engineer')!.email, DEMO_PASSWORD);
    workspaceId = Me.parse((await callJson(server.url, session, 'GET', '/api/auth/me')).body).memberships[0].workspaceId;
    setupId = SetupDetail.parse((await callJson(server.url, session, 'POST', `/api/workspaces/${workspaceId}/setups`, { setup: cornerDocument('Backup bench') })).body).id;

    let stop = false;
    let serial = 0;
    // each save differs (identical content is refused as a duplicate revision)
    const docFor = (n: number) => cornerDocument('Backup bench', { sprungMass: 290 + n / 1000 });
    const writer = async () => {
      while (!stop) {
        const message = `load ${++serial}`;
        const res = await callJson(server.url, session, 'POST', `/api/workspaces/${workspaceId}/setups/${setupId}/revisions`, { setup: docFor(serial), message });
        expect(res.status).toBe(201);
        acked.push({ message, number: SetupDetail.parse(res.body).revision.number, at: Date.now() });
      }
    };
    const writers = [writer(), writer()];
    while (acked.length < 20) await new Promise((r) => setTimeout(r, 20));

    const started = Date.now();
    const before = acked.filter((a) => a.at < started);
    const out = await cli('backup', ['--out', backups]);
    const finished = Date.now();
    stop = true;
    await Promise.all(writers);

    expect(out.code, out.err).toBe(0);
    const m = /backup written: (\S+) \(([\d.]+) kB, integrity_check ok\)/.exec(out.out);
    expect(m, out.out).not.toBeNull();
    backupFile = m![1];
    expect(statSync(backupFile).size / 1024).toBeCloseTo(Number(m![2]), 0);
    // writes were answered while the backup ran: the server was not paused for it
    expect(acked.filter((a) => a.at > started && a.at < finished).length).toBeGreaterThan(0);

    const check = checkBackupFile(backupFile);
    expect(check).toMatchObject({ ok: true, pending: [] });
    const held = crashMessages(backupFile);
    for (const a of before) expect(held.revisions.has(a.message), `${a.message} acknowledged before the backup`).toBe(true);
    // one consistent snapshot: each revision with its audit entry, never one without the other
    expect(held.audited).toBe(held.revisions.size);
    expect(existsSync(join(backups, `${backupFile.split('/').pop()}.partial`))).toBe(false);

    // the live database has gone on growing since
    expect(crashMessages(dbPath).revisions.size).toBeGreaterThan(held.revisions.size);
  }, 600_000);

  it('refuses to restore while the server has the database open, then restores once it is stopped, keeping the old file aside', async () => {
    const server = [...children][0];
    const refused = await cli('restore', [backupFile]);
    expect(refused.code).toBe(1);
    expect(refused.err).toMatch(/in use: stop the server first/);

    await server.kill('SIGTERM');
    children.delete(server);
    const liveBefore = crashMessages(dbPath).revisions.size;
    const done = await cli('restore', [backupFile]);
    expect(done.code, done.err).toBe(0);
    const aside = /kept as (\S+)/.exec(done.out)?.[1];
    expect(aside, done.out).toBeDefined();
    expect(crashMessages(aside!).revisions.size).toBe(liveBefore);

    const backupHeld = crashMessages(backupFile).revisions;
    const again = await serve();
    // every page of the history, newest first
    const messages: string[] = [];
    for (let before: number | null | undefined; before !== null; ) {
      const query = before === undefined ? '' : `?before=${before}`;
      const page = RevisionsResponse.parse((await callJson(again.url, session, 'GET', `/api/workspaces/${workspaceId}/setups/${setupId}/revisions${query}`)).body);
      messages.push(...page.revisions.map((r) => r.message));
      before = page.nextBefore;
    }
    const served = new Set(messages.filter((msg) => msg.startsWith('load ')));
    expect(served).toEqual(backupHeld);
    await again.kill('SIGTERM');
    children.delete(again);
  }, 600_000);

  it('refuses a damaged file, a file that is not a database, and one made by newer code, and leaves the live database alone', async () => {
    const liveSize = statSync(dbPath).size;
    const damaged = join(dir, 'damaged.sqlite');
    copyFileSync(backupFile, damaged);
    // page 2 (a table's root, 4 kB pages) overwritten: its b-tree header is no longer valid
    const h = openSync(damaged, 'r+');
    writeSync(h, Buffer.alloc(4096, 0x5a), 0, 4096, 4096);
    closeSync(h);

    const garbage = join(dir, 'garbage.sqlite');
    writeFileSync(garbage, 'these are not the pages you are looking for');

    const newer = join(dir, 'newer.sqlite');
    copyFileSync(backupFile, newer);
    const n = new SQLite(newer);
    n.prepare(`insert into kysely_migration (name, timestamp) values ('9999_from_the_future', ?)`).run(new Date().toISOString());
    n.close();

    expect(checkBackupFile(damaged)).toMatchObject({ ok: false });
    expect(checkBackupFile(garbage)).toMatchObject({ ok: false });
    const future = checkBackupFile(newer);
    expect(future.ok).toBe(false);
    if (!future.ok) expect(future.reason).toContain('9999_from_the_future');
    const refused = await cli('restore', [newer]);
    expect(refused.code).toBe(1);
    expect(refused.err).toMatch(/newer Ridewright/);
    expect(statSync(dbPath).size).toBe(liveSize);
  }, 300_000);
});
