import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../core/demo-people.ts';
import { adminQuery, startLocalPostgres } from '../db/local-postgres.ts';
import { prepareDatabase, startServerProcess } from './server-process.ts';
import { callJson, sessionHeaders, signInAs } from './session-client.ts';

// `npm run bench:api [-- --duration 5 --runs 3 --connections 10] [-- --soak 300] [-- --abuse …]`
//   `[-- --db postgres [--processes 2]]`: the same on a throwaway PostgreSQL cluster (Debian's
//   package, default durability), with one or more server processes sharing it; the load is split
//   evenly over the processes, as a load balancer would.
// (`--abuse`: light-read latency under heavy requests, server/bench/abuse-load.ts)
// Starts the real server (child process, temp SQLite seeded with the demo workspace, loopback,
// rate limit off, request logging off), signs in as the demo engineer and drives representative
// read and write routes with autocannon. Prints requests/s, p50 and p99 latency (medians over
// the runs), errors and non-2xx answers, and the server's resident memory before and after.
// `--soak N` then runs a mixed read/write load for N seconds and reports errors and memory.
// Figures, never assertions: the machine is shared.

if (process.argv.includes('--abuse')) {
  const { runAbuseBench } = await import('./abuse-load.ts');
  await runAbuseBench();
  process.exit(0);
}

function arg(name: string, fallback: number): number {
  const at = process.argv.indexOf(`--${name}`);
  const v = at >= 0 ? Number(process.argv[at + 1]) : NaN;
  return Number.isFinite(v) && v > 0 ? v : fallback;
}
const duration = arg('duration', 5);
const runs = arg('runs', 3);
const connections = arg('connections', 10);
const soak = arg('soak', 0);
const processes = arg('processes', 1);
const onPostgres = process.argv.includes('postgres');

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const mb = (b: number) => `${(b / 1024 / 1024).toFixed(0)} MB`;

interface Scenario {
  name: string;
  kind: 'read' | 'write';
  method: 'GET' | 'POST' | 'PATCH';
  path: string;
  body?: unknown;
  vary?: boolean;
}

let saves = 0;
/** A revision body with a sprung mass of its own (grams apart), so no two saves are identical. */
const variedSave = (body: unknown) => {
  const b = body as { setup: { sprungMass: number }; message: string };
  saves++;
  return JSON.stringify({ ...b, setup: { ...b.setup, sprungMass: b.setup.sprungMass + (saves % 100_000) / 1000 } });
};

const dir = mkdtempSync(join(tmpdir(), 'rw-bench-api-'));
const dbPath = join(dir, 'bench.sqlite');
const cluster = onPostgres ? await startLocalPostgres() : null;
if (cluster) await adminQuery(cluster.url(), 'create database bench');
const target = cluster ? cluster.url('bench') : dbPath;
await prepareDatabase(target);
const env = { LOG_LEVEL: 'warn', ...(cluster ? { DATABASE_URL: target } : {}) };
const servers = await Promise.all(Array.from({ length: cluster ? processes : 1 }, () => startServerProcess({ dbPath, env })));
const server = servers[0];
console.log(`database: ${cluster ? `PostgreSQL (${cluster.binDir}), ${servers.length} server process(es)` : 'SQLite file, 1 server process'}`);
try {
  const engineer = DEMO_USERS.find((u) => u.role === 'engineer')!;
  const session = await signInAs(server.url, engineer.email, DEMO_PASSWORD);
  const headers = sessionHeaders(session);
  const me = await callJson(server.url, session, 'GET', '/api/auth/me');
  const ws = Me.parse(me.body).memberships[0].workspaceId;
  const setups = SetupsResponse.parse((await callJson(server.url, session, 'GET', `/api/workspaces/${ws}/setups`)).body).setups;
  if (!setups.length) throw new Error('the demo seed has no setups to read');
  const setupId = setups[0].id;
  const detail = SetupDetail.parse((await callJson(server.url, session, 'GET', `/api/workspaces/${ws}/setups/${setupId}`)).body);
  const doc = detail.revision.document;
  const base = `/api/workspaces/${ws}`;

  const scenarios: Scenario[] = [
    { name: 'GET /api/auth/me', kind: 'read', method: 'GET', path: '/api/auth/me' },
    { name: 'GET setups (list)', kind: 'read', method: 'GET', path: `${base}/setups` },
    { name: 'GET setup (detail)', kind: 'read', method: 'GET', path: `${base}/setups/${setupId}` },
    { name: 'GET revisions', kind: 'read', method: 'GET', path: `${base}/setups/${setupId}/revisions` },
    { name: 'GET roads', kind: 'read', method: 'GET', path: `${base}/roads` },
    { name: 'GET runs', kind: 'read', method: 'GET', path: `${base}/runs` },
    // each save differs from the one before (the same content twice is refused as a duplicate)
    { name: 'POST revision (save)', kind: 'write', method: 'POST', path: `${base}/setups/${setupId}/revisions`, body: { setup: doc, message: 'bench save' }, vary: true },
    { name: 'POST vehicle (create)', kind: 'write', method: 'POST', path: `${base}/vehicles`, body: { name: 'Bench vehicle' } },
  ];

  const requestFor = (s: Scenario) => ({
    method: s.method,
    path: s.path,
    body: s.body === undefined ? undefined : JSON.stringify(s.body),
    ...(s.vary ? { setupRequest: (req: { body?: unknown }) => ({ ...req, body: variedSave(s.body) }) } : {}),
  });
  /** One autocannon per server process, connections split evenly; figures combined. */
  const fire = async (opts: Omit<autocannon.Options, 'url'>) => {
    const each = await Promise.all(servers.map((sv) => autocannon({ ...opts, url: sv.url, connections: Math.max(1, Math.round(connections / servers.length)) })));
    return {
      requests: { average: each.reduce((n, r) => n + r.requests.average, 0), total: each.reduce((n, r) => n + r.requests.total, 0) },
      latency: { p50: median(each.map((r) => r.latency.p50)), p99: Math.max(...each.map((r) => r.latency.p99)) },
      errors: each.reduce((n, r) => n + r.errors, 0),
      timeouts: each.reduce((n, r) => n + r.timeouts, 0),
      non2xx: each.reduce((n, r) => n + r.non2xx, 0),
    };
  };
  const cpuMs = () => servers.reduce((n, sv) => n + sv.cpuMs(), 0);
  const rssStart = server.rssBytes();
  console.log(`server ${server.url}, pid ${server.pid}; ${connections} connections, ${runs} × ${duration} s per route; RSS at start ${mb(rssStart)}\n`);
  console.log('route                         kind    req/s   p50 ms  p99 ms  errors  non-2xx  server CPU ms/req');
  const table: Record<string, unknown>[] = [];
  for (const s of scenarios) {
    const results = [];
    const cpu: number[] = [];
    for (let i = 0; i < runs; i++) {
      const cpuBefore = cpuMs();
      results.push(await fire({ headers, duration, requests: [requestFor(s)] }));
      cpu.push((cpuMs() - cpuBefore) / Math.max(1, results[results.length - 1].requests.total));
    }
    const row = {
      route: s.name,
      kind: s.kind,
      reqPerSec: Math.round(median(results.map((r) => r.requests.average))),
      p50: median(results.map((r) => r.latency.p50)),
      p99: median(results.map((r) => r.latency.p99)),
      errors: results.reduce((n, r) => n + r.errors + r.timeouts, 0),
      non2xx: results.reduce((n, r) => n + r.non2xx, 0),
      // What a request costs the server's one thread, whatever else the machine runs: 1000 / this
      // is the request rate one free core would reach.
      cpuMsPerRequest: Number(median(cpu).toFixed(3)),
    };
    table.push(row);
    console.log(
      `${s.name.padEnd(30)}${s.kind.padEnd(6)}${String(row.reqPerSec).padStart(7)}${String(row.p50).padStart(9)}${String(row.p99).padStart(8)}${String(row.errors).padStart(8)}${String(row.non2xx).padStart(9)}${row.cpuMsPerRequest.toFixed(2).padStart(19)}`,
    );
  }
  const rssAfter = server.rssBytes();
  console.log(`\nserver RSS: ${mb(rssStart)} before, ${mb(rssAfter)} after`);

  let soakSummary: Record<string, unknown> | undefined;
  if (soak > 0) {
    // Mixed load: mostly reads, a save in every six requests, as a team at work would make.
    const mix = scenarios.filter((s) => s.name !== 'POST vehicle (create)');
    const rssBefore = server.rssBytes();
    console.log(`\nsoak: ${soak} s, ${connections} connections, mixed reads and saves...`);
    const r = await fire({ duration: soak, headers, requests: mix.map(requestFor) });
    soakSummary = {
      seconds: soak,
      requests: r.requests.total,
      reqPerSec: Math.round(r.requests.average),
      p50: r.latency.p50,
      p99: r.latency.p99,
      errors: r.errors + r.timeouts,
      non2xx: r.non2xx,
      rssBefore: mb(rssBefore),
      rssAfter: mb(server.rssBytes()),
    };
    console.log(`soak: ${JSON.stringify(soakSummary)}`);
    if (r.errors + r.timeouts + r.non2xx > 0) process.exitCode = 1;
  }
  console.log(`\n${JSON.stringify({ connections, runs, duration, rssStart: mb(rssStart), rssAfter: mb(rssAfter), table, soak: soakSummary })}`);
} finally {
  await Promise.all(servers.map((sv) => sv.kill('SIGTERM')));
  await cluster?.stop();
  rmSync(dir, { recursive: true, force: true });
}
