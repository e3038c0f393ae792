import { readFileSync } from 'node:fs';
import seedrandom from 'seedrandom';
import { summariseDyno } from '../../../shared/dyno-upload/summarise-dyno.ts';
import { Road, type RoadInput } from '../../../shared/schemas/road.ts';
import type { Role } from '../../../shared/schemas/workspace.ts';
import { listSetupSummaries } from '../../setups/index.ts';
import { insertDynoRecord } from '../../dyno/dyno-files.service.ts';
import { figuresOrFail, insertRoadRecordInTx } from '../../roads/roads.service.ts';
import { DEMO_USERS } from '../../core/demo-people.ts';
import type { SeedStep } from './seed-context.ts';
import type { Actor } from '../../core/actor.ts';

/**
 * An invented measured profile: 300 m of a worn lane sampled every 0.1 m, made from a seeded
 * random walk for the long waves, a few patches and a transverse joint. Nothing here was measured.
 */
export function inventedLaneProfile(): [number, number][] {
  const rng = seedrandom('brume-test-lane');
  const dx = 0.1;
  const points: [number, number][] = [];
  let slow = 0;
  let mid = 0;
  for (let i = 0; i <= 3000; i++) {
    const x = i * dx;
    slow = 0.995 * slow + 0.002 * (rng() - 0.5);
    mid = 0.9 * mid + 0.004 * (rng() - 0.5);
    const patch = x > 120 && x < 124 ? 0.006 : 0;
    const joint = Math.abs(x - 210) < 0.15 ? -0.008 : 0;
    const grade = 0.004 * x;
    points.push([Number(x.toFixed(1)), Number((grade + slow + mid + patch + joint).toFixed(5))]);
  }
  return points;
}

const demoRoads: { name: string; by: Role; daysAgo: number; definition: RoadInput }[] = [
  { name: 'Smooth motorway, class B', by: 'engineer', daysAgo: 25, definition: { kind: 'iso8608', class: 'B', seed: 101 } },
  { name: 'Town road, class C', by: 'engineer', daysAgo: 25, definition: { kind: 'iso8608', class: 'C', seed: 202 } },
  { name: 'Broken B-road, class D', by: 'lead', daysAgo: 18, definition: { kind: 'iso8608', class: 'D', seed: 303 } },
  { name: 'Kerb drop, 80 mm', by: 'engineer', daysAgo: 10, definition: { kind: 'kerb', height: -0.08, rampLength: 0.04, at: 5 } },
  { name: 'Pothole, 40 mm deep', by: 'engineer', daysAgo: 10, definition: { kind: 'pothole', depth: 0.04, length: 0.6, at: 8 } },
  { name: 'Test lane behind the works (invented)', by: 'lead', daysAgo: 6, definition: { kind: 'measured', points: inventedLaneProfile(), detrend: 'linear' } },
];

const DYNO_EXAMPLE = new URL('../../../examples/dyno/pipit-front-peaks.csv', import.meta.url);
const DYNO_SETUP = 'Brume Pipit front, baseline';

function actorOf(role: Role, users: Record<Role, string>): Actor {
  const person = DEMO_USERS.find((u) => u.role === role);
  if (!person) throw new Error(`no demo person with role ${role}`);
  return { id: users[role], name: person.name };
}

const daysBefore = (now: Date, days: number) => new Date(now.getTime() - days * 86_400_000);

/** A few library roads (ISO B/C/D, a kerb, a pothole, an invented measured lane) and one dyno file on the Pipit front corner. */
export const seedRoadsDyno: SeedStep = async (trx, ctx) => {
  const ws = { workspaceId: ctx.workspaceId };
  for (const r of demoRoads) {
    const definition = Road.parse(r.definition);
    const figures = figuresOrFail(definition);
    if (!figures.ok) throw new Error(`demo road ${r.name} refused: ${figures.message}`);
    await insertRoadRecordInTx(trx, ws, actorOf(r.by, ctx.users), { name: r.name, definition }, definition.kind === 'measured' ? 'measured' : 'defined', figures.value, daysBefore(ctx.now, r.daysAgo));
  }

  const setup = (await listSetupSummaries(trx, ctx.workspaceId, 'exclude')).find((s) => s.name === DYNO_SETUP);
  if (!setup) return;
  const text = readFileSync(DYNO_EXAMPLE, 'utf8');
  const read = summariseDyno(text);
  if (!read.ok) throw new Error(`demo dyno file refused: ${read.errors[0]?.message}`);
  await insertDynoRecord(trx, ws, actorOf('engineer', ctx.users), setup, { text, filename: 'pipit-front-peaks.csv', bytes: Buffer.byteLength(text) }, read, daysBefore(ctx.now, 3));
};
