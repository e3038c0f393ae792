import { spawnSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { z } from 'zod';
import { DEMO_PASSWORD, DEMO_USERS } from '../core/demo-people.ts';
import { prepareDatabase, startServerProcess } from './server-process.ts';
import { callJson, type Session, sessionHeaders, signInAs } from './session-client.ts';

// `npm run bench:api -- --abuse [--seconds 10] [--root <other checkout>] [--scenario <name>]`
// While four heavy requests of one kind are kept in flight (a new one starts as each ends), one
// client sends light reads back to back (config, me, the setups list) and records each one's
// latency. A server that does heavy work on its request thread shows it here as seconds.
// `--root` runs the server of another checkout (e.g. a worktree of an older commit) on its own
// migrated and seeded database, so before and after come from one run of this command.
// Figures, never assertions: the machine is shared.

const at = (name: string) => process.argv.indexOf(`--${name}`);
const seconds = Number(process.argv[at('seconds') + 1]) > 0 && at('seconds') >= 0 ? Number(process.argv[at('seconds') + 1]) : 10;
const roots = process.argv.flatMap((a, i) => (a === '--root' ? [resolve(process.argv[i + 1])] : []));
const only = at('scenario') >= 0 ? process.argv[at('scenario') + 1] : undefined;

interface Heavy {
  name: string;
  /** One heavy request as `who`; resolves with its status. */
  fire(who: Session): Promise<number>;
}

const pct = (xs: number[], p: number) => {
  const s = [...xs].sort((a, b) => a - b);
  return s.length ? s[Math.min(s.length - 1, Math.floor((p / 100) * s.length))] : NaN;
};

/** A measured profile CSV of `rows` rows (about 14 bytes each). */
const profileCsv = (rows: number) => ['distance [m],elevation [mm]', ...Array.from({ length: rows }, (_, i) => `${(i * 0.02).toFixed(2)},${(3 * Math.sin(i / 150)).toFixed(3)}`)].join('\n');

/** A raw dyno record of about `bytes`: sine strokes, force in N, compression positive. */
function dynoRecord(bytes: number): string {
  const lines = ['# invented bench record', 'time [s],displacement [mm],force [N]'];
  let size = 60;
  for (let i = 0; size < bytes; i++) {
    const t = i * 0.001;
    const x = 25 * Math.sin(2 * Math.PI * 1.5 * t);
    const v = 2 * Math.PI * 1.5 * 25 * Math.cos(2 * Math.PI * 1.5 * t);
    const line = `${t.toFixed(3)},${x.toFixed(3)},${(150 + 6 * v).toFixed(1)}`;
    lines.push(line);
    size += line.length + 1;
  }
  return lines.join('\n');
}

async function upload(base: string, who: Session, path: string, files: { name: string; text: string }[], fields: Record<string, string> = {}): Promise<number> {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.append(k, v);
  for (const f of files) form.append('file', new Blob([f.text], { type: 'text/csv' }), f.name);
  const res = await fetch(`${base}${path}`, { method: 'POST', headers: { cookie: who.cookie, 'x-csrf-token': who.csrf }, body: form });
  await res.arrayBuffer();
  return res.status;
}

async function benchOne(root: string | undefined) {
  const dir = mkdtempSync(join(tmpdir(), 'rw-bench-abuse-'));
  const dbPath = join(dir, 'bench.sqlite');
  if (root) {
    for (const step of ['server/db/migrate-to-latest.ts', 'server/db/seed.ts']) {
      const r = spawnSync(process.execPath, ['--import', 'tsx', step], { cwd: root, env: { ...process.env, RIDEWRIGHT_DB: dbPath }, encoding: 'utf8' });
      if (r.status !== 0) throw new Error(`${step} in ${root} failed:\n${r.stderr}`);
    }
  } else await prepareDatabase(dbPath);
  // The per-person window (60 large jobs per ten minutes) would refuse most of a long run: lifted
  // here so each scenario keeps four requests in flight; the two-at-once limit stays.
  const server = await startServerProcess({ dbPath, root, env: { LOG_LEVEL: 'warn', RIDEWRIGHT_HEAVY_JOBS_PER_10MIN: '0' } });
  const base = server.url;
  try {
    const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;
    const [admin, lead, engineer, engineer2, viewer] = await Promise.all(['admin', 'lead', 'engineer', 'engineer', 'viewer'].map((r) => signInAs(base, email(r), DEMO_PASSWORD)));
    const writers = [admin, lead, engineer, engineer2];
    // Only what every version of the server answers (the `--root` checkout may be older).
    const me = z.object({ memberships: z.array(z.object({ workspaceId: z.string() })) }).parse((await callJson(base, viewer, 'GET', '/api/auth/me')).body);
    const ws = `/api/workspaces/${me.memberships[0].workspaceId}`;
    const list = (await callJson(base, viewer, 'GET', `${ws}/setups`)).body as { setups: { id: string }[] };
    const setupId = list.setups[0].id;
    const sheets = (await callJson(base, viewer, 'GET', `${ws}/target-sheets`)).body as { sheets: { id: string }[] };
    const studies = (await callJson(base, viewer, 'GET', `${ws}/studies`)).body as { studies: { id: string; status: string }[] };
    const study = studies.studies.find((s) => s.status !== 'draft') ?? studies.studies[0];

    const bigProfile = profileCsv(499_000); // about 7 MB
    const bigDyno = dynoRecord(2_000_000);
    const setupRoad = await upload(base, admin, `${ws}/roads/measured`, [{ name: 'long-profile.csv', text: bigProfile }], { name: 'Bench long profile' });
    const roads = (await callJson(base, viewer, 'GET', `${ws}/roads`)).body as { roads: { id: string; name: string }[] };
    const bigRoadId = roads.roads.find((r) => r.name === 'Bench long profile')?.id;

    const heavies: Heavy[] = [
      { name: 'iso8608 road 5 km, nMax 100', fire: async (w) => (await callJson(base, w, 'POST', `${ws}/roads`, { name: 'Bench ISO', definition: { kind: 'iso8608', class: 'C', seed: 3, length: 5000, nMax: 100 } })).status },
      { name: 'dyno upload 2 MB record', fire: (w) => upload(base, w, `${ws}/setups/${setupId}/dyno-files`, [{ name: 'bench-record.csv', text: bigDyno }]) },
      { name: 'sheet check 12 x 2 MB', fire: (w) => upload(base, w, `${ws}/target-sheets/${sheets.sheets[0]?.id}/checks`, Array.from({ length: 12 }, (_, i) => ({ name: `unit-${i}.csv`, text: bigDyno }))) },
      { name: 'study finish', fire: async (w) => (await fetch(`${base}${ws}/studies/${study?.id}/results`, { method: 'PUT', headers: sessionHeaders(w), body: JSON.stringify({ status: 'partial', elapsedMs: 1 }) })).status },
      { name: 'read big measured road', fire: async (w) => (await fetch(`${base}${ws}/roads/${bigRoadId}`, { headers: sessionHeaders(w) }).then(async (r) => (await r.arrayBuffer(), r.status))) },
      { name: 'measured upload 7 MB', fire: (w) => upload(base, w, `${ws}/roads/measured`, [{ name: 'profile.csv', text: bigProfile }], { name: 'Bench profile' }) },
    ];

    const rows: string[] = [];
    const scenarios: (Heavy | null)[] = [null, ...heavies.filter((h) => !only || h.name.includes(only))];
    for (const heavy of scenarios) {
      const stopAt = Date.now() + seconds * 1000;
      const statuses = new Map<number, number>();
      let completed = 0;
      const heavyLoops = heavy
        ? writers.map(async (w) => {
            while (Date.now() < stopAt) {
              const status = await heavy.fire(w).catch(() => 0);
              statuses.set(status, (statuses.get(status) ?? 0) + 1);
              completed++;
            }
          })
        : [];
      // Let the heavy requests reach the server before measuring.
      if (heavy) await new Promise((r) => setTimeout(r, 300));
      const light: number[] = [];
      const paths = ['/api/config', '/api/auth/me', `${ws}/setups`];
      for (let i = 0; Date.now() < stopAt; i++) {
        const t0 = performance.now();
        const res = await fetch(`${base}${paths[i % 3]}`, { headers: sessionHeaders(viewer) });
        await res.arrayBuffer();
        light.push(performance.now() - t0);
      }
      await Promise.all(heavyLoops);
      const codes = [...statuses].sort(([a], [b]) => a - b).map(([c, n]) => `${c}×${n}`).join(' ');
      rows.push(
        `${(heavy?.name ?? 'no heavy load').padEnd(30)}${String(completed).padStart(6)}  ${codes.padEnd(22)}${String(light.length).padStart(7)}${pct(light, 50).toFixed(1).padStart(9)}${pct(light, 99).toFixed(1).padStart(9)}${Math.max(...light).toFixed(0).padStart(9)}`,
      );
    }
    console.log(`\nserver: ${root ?? 'this checkout'} (big road upload for the read scenario: ${setupRoad})`);
    console.log('scenario (4 in flight)         heavy  heavy statuses          light   p50 ms   p99 ms   max ms');
    for (const r of rows) console.log(r);
  } finally {
    await server.kill();
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Runs the abuse benchmark against this checkout, then each `--root` checkout. */
export async function runAbuseBench(): Promise<void> {
  console.log(`abuse benchmark: ${seconds} s per scenario, light reads one after another as the demo viewer`);
  for (const root of [undefined, ...roots]) await benchOne(root);
}
