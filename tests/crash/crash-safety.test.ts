import { copyFileSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import SQLite from 'better-sqlite3';
import { afterAll, describe, expect, it } from 'vitest';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail } from '../../shared/schemas/setup-record.ts';
import { bundleServer, prepareDatabase, type ServerProcess, startServerProcess } from '../../server/bench/server-process.ts';
import { callJson, type Session, signInAs } from '../../server/bench/session-client.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../../server/core/demo-people.ts';
import { cornerDocument } from '../api/helpers/setup-fixtures.ts';

// The real server (`node --import tsx server/main.ts`, its own SQLite file, demo seed, loopback,
// rate limit off) takes setup revisions from several writers at once and is killed with SIGKILL
// at a random moment, again and again. After every kill, before the restart, the file must pass
// `PRAGMA integrity_check`, hold every revision whose save was answered 201 (same number, same
// message), and hold each revision together with its audit entry or neither (one transaction).
// Lanes with separate databases run side by side so the restarts share the wait for CPU.

const KILLS = Number(process.env.CRASH_KILLS ?? 100);
const LANES = Number(process.env.CRASH_LANES ?? 3);

interface Ack {
  setupId: string;
  number: number;
  message: string;
}

interface LaneResult {
  kills: number;
  acknowledged: number;
  /** Saves cut off by the kill: the client never learnt whether they were kept. */
  cutOff: number;
  /** Of those, how many the database turned out to hold (either answer is correct). */
  cutOffKept: number;
  otherStatuses: number[];
}

const dir = mkdtempSync(join(tmpdir(), 'rw-crash-'));
const template = join(dir, 'template.sqlite');
const running = new Set<ServerProcess>();
// server/main.ts compiled once (esbuild, as tsx would on every start): a hundred restarts on a
// shared 2-core machine cost half the CPU this way; CRASH_TSX=1 starts it through tsx instead.
const bundle = process.env.CRASH_TSX ? null : await bundleServer();
afterAll(async () => {
  await Promise.all([...running].map((s) => s.kill('SIGKILL')));
  rmSync(dir, { recursive: true, force: true });
  bundle?.remove();
});

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));
const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;

async function start(dbPath: string): Promise<ServerProcess> {
  const s = await startServerProcess({ dbPath, readyTimeoutMs: 180_000, bundle: bundle?.path });
  running.add(s);
  return s;
}

/** Checks the file after a kill; returns the messages of crash revisions it holds. */
function verify(dbPath: string, acks: Ack[]): Set<string> {
  const db = new SQLite(dbPath);
  try {
    expect(db.pragma('integrity_check', { simple: true })).toBe('ok');
    const rows = db.prepare<[], { setup_id: string; number: number; message: string }>(`select setup_id, number, message from setup_revision where message like 'crash %'`).all();
    const held = new Map(rows.map((r) => [r.message, r]));
    for (const ack of acks) {
      const row = held.get(ack.message);
      expect(row, `acknowledged save "${ack.message}" is missing`).toBeDefined();
      expect(row).toMatchObject({ setup_id: ack.setupId, number: ack.number });
    }
    const audited = db.prepare<[], { n: number }>(`select count(*) as n from audit_log where action = 'setup.revised' and summary like '%: crash %'`).get()!.n;
    expect(audited, 'a revision without its audit entry, or the reverse').toBe(rows.length);
    return new Set(held.keys());
  } finally {
    db.close();
  }
}

async function lane(index: number, kills: number): Promise<LaneResult> {
  const dbPath = join(dir, `lane-${index}.sqlite`);
  copyFileSync(template, dbPath);
  let server = await start(dbPath);
  const session: Session = await signInAs(server.url, engineer.email, DEMO_PASSWORD);
  const me = Me.parse((await callJson(server.url, session, 'GET', '/api/auth/me')).body);
  const ws = me.memberships[0].workspaceId;
  const setupIds: string[] = [];
  for (const name of ['A', 'B']) {
    const res = await callJson(server.url, session, 'POST', `/api/workspaces/${ws}/setups`, { setup: cornerDocument(`Crash lane ${index} ${name}`) });
    expect(res.status).toBe(201);
    setupIds.push(SetupDetail.parse(res.body).id);
  }
  // each save differs: identical content is refused as a duplicate revision
  const docFor = (n: number) => cornerDocument('Crash corner', { sprungMass: 305 + n / 1000 });
  const acks: Ack[] = [];
  const cutOff: string[] = [];
  const otherStatuses: number[] = [];
  let serial = 0;

  for (let k = 0; k < kills; k++) {
    if (k > 0) server = await start(dbPath);
    const url = server.url;
    let down = false;
    const writer = async (setupId: string) => {
      while (!down) {
        const n = ++serial;
        const message = `crash L${index} #${n}`;
        try {
          const res = await callJson(url, session, 'POST', `/api/workspaces/${ws}/setups/${setupId}/revisions`, { setup: docFor(n), message });
          if (res.status === 201) acks.push({ setupId, number: SetupDetail.parse(res.body).revision.number, message });
          else otherStatuses.push(res.status);
        } catch {
          cutOff.push(message); // connection reset or refused: the kill came first
          return;
        }
      }
    };
    // two writers on one setup (they race for the next number), one on the other
    const writers = [writer(setupIds[0]), writer(setupIds[0]), writer(setupIds[1])];
    // a random moment once writes flow (the first answers after a start are slow: cold code)
    const flowing = acks.length;
    for (let waited = 0; acks.length === flowing && waited < 30_000; waited += 10) await sleep(10);
    await sleep(Math.random() * 250);
    await server.kill('SIGKILL');
    running.delete(server);
    down = true;
    await Promise.all(writers);
    verify(dbPath, acks);
  }
  const held = verify(dbPath, acks);
  return { kills, acknowledged: acks.length, cutOff: cutOff.length, cutOffKept: cutOff.filter((m) => held.has(m)).length, otherStatuses };
}

describe('crash safety under SIGKILL', () => {
  it(`keeps every acknowledged write and a sound file over ${KILLS} kills`, async () => {
    await prepareDatabase(template);
    const per = Array.from({ length: LANES }, (_, i) => Math.floor(KILLS / LANES) + (i < KILLS % LANES ? 1 : 0));
    const results = await Promise.all(per.map((n, i) => lane(i, n)));
    const total = results.reduce(
      (a, r) => ({ kills: a.kills + r.kills, acknowledged: a.acknowledged + r.acknowledged, cutOff: a.cutOff + r.cutOff, cutOffKept: a.cutOffKept + r.cutOffKept }),
      { kills: 0, acknowledged: 0, cutOff: 0, cutOffKept: 0 },
    );
    console.log(`[crash] ${JSON.stringify(total)} lanes=${LANES}`);
    expect(total.kills).toBeGreaterThanOrEqual(KILLS);
    // the kills must land while writes are going on, else the test shows nothing
    expect(total.acknowledged).toBeGreaterThan(total.kills);
    expect(total.cutOff).toBeGreaterThan(total.kills / 2);
    expect(results.flatMap((r) => r.otherStatuses)).toEqual([]);
  }, 1_800_000);
});
