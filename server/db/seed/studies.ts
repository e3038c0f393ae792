import { StudyDefinition } from '../../../shared/schemas/study.ts';
import { studyPointUpload } from '../../../shared/study/collect.ts';
import { runStudyHere } from '../../../shared/study/run-all.ts';
import { listSetupSummaries } from '../../setups/index.ts';
import { insertNewStudyInTx } from '../../studies/studies.service.ts';
import { chooseStudyBaselineInTx, closeStudyRunInTx, storeStudyPointsInTx } from '../../studies/study-results.service.ts';
import { DEMO_USERS } from '../../core/demo-people.ts';
import type { SeedStep } from './seed-context.ts';

const BASE_SETUP = 'Brume Pipit front, baseline';
const ROADS = ['Town road, class C', 'Smooth motorway, class B'];

const person = (role: 'engineer' | 'lead') => DEMO_USERS.find((u) => u.role === role)!.name;

/**
 * One finished demo study on the Pipit front corner: rebound against spring rate, 4 × 4 points of
 * 15 s over the town road and the motorway at 20 m/s, run here by the same code the browser workers
 * run (a few tenths of a second), saved as the engineer, with the lead's baseline on the best compromise.
 * Skipped when the setups or roads steps did not make what it needs.
 */
export const seedStudies: SeedStep = async (trx, ctx) => {
  const ws = { workspaceId: ctx.workspaceId };
  const setup = (await listSetupSummaries(trx, ctx.workspaceId, 'exclude')).find((s) => s.name === BASE_SETUP);
  const roads = await trx.selectFrom('road').select(['id', 'name']).where('workspace_id', '=', ctx.workspaceId).where('name', 'in', ROADS).execute();
  if (!setup || roads.length === 0) return;
  const revision = await trx.selectFrom('setup_revision').select('id').where('setup_id', '=', setup.id).where('number', '=', setup.revision_number).executeTakeFirstOrThrow();
  const engineer = { id: ctx.users.engineer, name: person('engineer') };
  const at = new Date(ctx.now.getTime() - 2 * 86_400_000);

  const definition = StudyDefinition.parse({
    name: 'Pipit front: rebound against spring rate',
    base: { setupId: setup.id, revisionId: revision.id },
    axes: [
      { parameter: 'reboundScale', from: 0.7, to: 1.6, steps: 4 },
      { parameter: 'springRate', from: 26000, to: 38000, steps: 4 },
    ],
    roads: ROADS.flatMap((name) => roads.filter((r) => r.name === name).map((r) => ({ source: 'library' as const, roadId: r.id }))),
    speeds: [20],
    duration: 15,
    objectives: [
      { figure: 'bodyAccelWkRms', weight: 1 },
      { figure: 'tyreLoadRatio', weight: 1 },
    ],
    constraints: { maxStrokeUsed: 0.9, maxLiftOffFraction: 0.01, minTyreLoad: 400 },
  });
  const created = await insertNewStudyInTx(trx, ws, engineer, { definition }, at);
  if (!created.ok) throw new Error(`demo study refused: ${created.message}`);
  const detail = created.value;
  const { points, base } = runStudyHere(detail.definition, detail.baseSetup, detail.roads);
  const stored = await storeStudyPointsInTx(trx, ws, detail.id, { points: [...points, ...(base ? [base] : [])].map(studyPointUpload) }, at);
  if (!stored.ok) throw new Error(`demo study points refused: ${stored.message}`);
  const closed = await closeStudyRunInTx(trx, ws, engineer, detail.id, { status: 'complete', elapsedMs: 900, workers: 2 }, at);
  if (!closed.ok) throw new Error(`demo study run refused: ${closed.message}`);
  const best = closed.value.results?.best;
  if (best) {
    const chosen = await chooseStudyBaselineInTx(trx, ws, { id: ctx.users.lead, name: person('lead') }, detail.id, { pointIndex: best.pointIndex }, ctx.now);
    if (!chosen.ok) throw new Error(`demo baseline refused: ${chosen.message}`);
  }
};
