import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import autocannon from 'autocannon';
import { Me } from '../../shared/schemas/account.ts';
import { SetupDetail, SetupsResponse } from '../../shared/schemas/setup-record.ts';
import { DEMO_PASSWORD, DEMO_USERS } from '../core/demo-people.ts';
import { prepareDatabase, startServerProcess } from './server-process.ts';
import { callJson, sessionHeaders, signInAs } from './session-client.ts';

// `npm run bench:api [-- --duration 5 --runs 3 --connections 10] [-- --soak 300] [-- --abuse …]`
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

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
const mb = (b: number) => `${(b / 1024 / 1024).toFixed(0)} MB`;

interface Scenario {
  name: string;
  kind: 'read' | 'write';
  method: 'GET' | 'POST' | 'PATCH';
  path: string;
  body?: unknown;
}

const dir = mkdtempSync(join(tmpdir(), 'rw-bench-api-'));
const dbPath = join(dir, 'bench.sqlite');
await prepareDatabase(dbPath);
const server = await startServerProcess({ dbPath, env: { LOG_LEVEL: 'warn' } });
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
    { name: 'POST revision (save)', kind: 'write', method: 'POST', path: `${base}/setups/${setupId}/revisions`, body: { setup: doc, message: 'bench save' } },
    { name: 'POST vehicle (create)', kind: 'write', method: 'POST', path: `${base}/vehicles`, body: { name: 'Bench vehicle' } },
  ];

  const fire = (opts: autocannon.Options) => autocannon({ connections, ...opts });
  const rssStart = server.rssBytes();
  console.log(`server ${server.url}, pid ${server.pid}; ${connections} connections, ${runs} × ${duration} s per route; RSS at start ${mb(rssStart)}\n`);
  console.log('route                         kind    req/s   p50 ms  p99 ms  errors  non-2xx  server CPU ms/req');
  const table: Record<string, unknown>[] = [];
  for (const s of scenarios) {
    const results = [];
    const cpu: number[] = [];
    for (let i = 0; i < runs; i++) {
      const cpuBefore = server.cpuMs();
      results.push(await fire({ url: `${server.url}${s.path}`, method: s.method, headers, body: s.body === undefined ? undefined : JSON.stringify(s.body), duration }));
      cpu.push((server.cpuMs() - cpuBefore) / Math.max(1, results[results.length - 1].requests.total));
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
    const r = await fire({
      url: server.url,
      duration: soak,
      headers,
      requests: mix.map((s) => ({ method: s.method, path: s.path, body: s.body === undefined ? undefined : JSON.stringify(s.body) })),
    });
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
  await server.kill('SIGTERM');
  rmSync(dir, { recursive: true, force: true });
}
