import { Road } from '../../../shared/schemas/road.ts';
import { SaveRunInput } from '../../../shared/schemas/run-record.ts';
import { Setup } from '../../../shared/schemas/setup.ts';
import type { Role } from '../../../shared/schemas/workspace.ts';
import { toStoredSpectra, toStoredTraces } from '../../../shared/runs/stored-run.ts';
import { computeSpectra } from '../../../shared/sim/metrics/compute-metrics.ts';
import { runCorner } from '../../../shared/sim/run-corner.ts';
import { saveRunInTx } from '../../runs/runs.service.ts';
import type { Queryable } from '../database.ts';
import { DEMO_USERS } from '../../core/demo-people.ts';
import type { SeedStep } from './seed-context.ts';

/*
 * Two saved runs, computed here with the same code the browser runs: the Pipit front at its
 * first and latest revisions over the town road (the older one shows as superseded). Short
 * runs, because every test that seeds the demo pays for them.
 */
interface DemoRun {
  name: string;
  setup: string;
  /** Revision number; 'latest' for the newest. */
  revision: number | 'latest';
  road: string;
  speedKmh: number;
  duration: number;
  by: Role;
  daysAgo: number;
}

const demoRuns: DemoRun[] = [
  { name: 'Pipit front r1, town road at 50 km/h', setup: 'Brume Pipit front, baseline', revision: 1, road: 'Town road, class C', speedKmh: 50, duration: 10, by: 'engineer', daysAgo: 20 },
  { name: 'Pipit front latest, town road at 50 km/h', setup: 'Brume Pipit front, baseline', revision: 'latest', road: 'Town road, class C', speedKmh: 50, duration: 10, by: 'engineer', daysAgo: 3 },
];

async function revisionOf(trx: Queryable, workspaceId: string, setupName: string, revision: number | 'latest') {
  let q = trx
    .selectFrom('setup_revision as r')
    .innerJoin('setup as s', 's.id', 'r.setup_id')
    .select(['s.id as setup_id', 'r.number', 'r.document'])
    .where('s.workspace_id', '=', workspaceId)
    .where('s.name', '=', setupName);
  q = revision === 'latest' ? q.orderBy('r.number', 'desc') : q.where('r.number', '=', revision);
  const row = await q.executeTakeFirst();
  if (!row) throw new Error(`seed runs: no setup "${setupName}" revision ${revision}`);
  return row;
}

export const seedRuns: SeedStep = async (trx, ctx) => {
  const ws = { workspaceId: ctx.workspaceId, workspaceName: '', role: 'admin' as const };
  for (const r of demoRuns) {
    const revision = await revisionOf(trx, ctx.workspaceId, r.setup, r.revision);
    const road = await trx.selectFrom('road').select(['id', 'definition']).where('workspace_id', '=', ctx.workspaceId).where('name', '=', r.road).executeTakeFirst();
    if (!road) throw new Error(`seed runs: no library road "${r.road}"`);
    const setup = Setup.parse(JSON.parse(revision.document));
    const definition = Road.parse(JSON.parse(road.definition));
    const speed = r.speedKmh / 3.6;
    const run = runCorner({ setup, road: definition, speed, duration: r.duration });
    if (!run.ok) throw new Error(`seed runs: ${r.name}: ${run.reason}`);
    const input = SaveRunInput.parse({
      name: r.name,
      setupId: revision.setup_id,
      revisionNumber: revision.number,
      setup,
      roadId: road.id,
      road: definition,
      speed,
      duration: r.duration,
      result: run.result,
      traces: toStoredTraces(run.trace, run.result.settleTime),
      spectra: toStoredSpectra(computeSpectra(run.trace, { settleTime: run.result.settleTime })),
    });
    const person = DEMO_USERS.find((u) => u.role === r.by)!;
    const actor = { id: ctx.users[r.by], name: person.name, email: person.email, sessionVersion: 0, emailVerified: true };
    const saved = await saveRunInTx(trx, ws, actor, input, new Date(ctx.now.getTime() - r.daysAgo * 86_400_000));
    if (!saved.ok) throw new Error(`seed runs: ${r.name}: ${saved.message}`);
  }
};
