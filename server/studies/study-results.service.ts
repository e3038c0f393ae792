import type { FieldIssue } from '../../shared/errors.ts';
import type { FinishStudyRunInput, SaveStudyPointsInput, SetStudyBaselineInput, StudyDetail, StudyResultsSummary } from '../../shared/schemas/study-record.ts';
import { type StudyPointResult, StudyPointValues } from '../../shared/schemas/study-result.ts';
import { jobsByPoint, judgeUploadedPoint, studyRoadNames } from '../../shared/study/collect.ts';
import { describePoint } from '../../shared/study/describe-point.ts';
import { expandStudy } from '../../shared/study/expand.ts';
import { studyBestCompromise, studyTradeOff } from '../../shared/study/study-compromise.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { NewStudyPointRow } from './studies.tables.ts';
import { findStudy, findStudyPoint, listStudyPoints, updateStudyRow, upsertStudyPoints } from './studies.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { definitionOf, mustDetail, toPointResult, typedInRoads } from './studies.service.ts';
import { readStored } from '../core/stored-json.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { runHeavy } from '../jobs/heavy-pool.ts';

/**
 * A study's results: the points a browser run saves (checked and judged again here), the close
 * of a run with its summary, and the lead's baseline. Each has a form taking the caller's
 * transaction (the demo seed) and one opening its own.
 */


const noStudy = () => fail('not_found', 'No such study in this workspace.');

export function pointRow(studyId: string, p: StudyPointResult): NewStudyPointRow {
  return {
    study_id: studyId,
    idx: p.index,
    params: JSON.stringify(p.values),
    metrics: JSON.stringify(p.runs),
    figures: JSON.stringify(p.figures),
    objectives: JSON.stringify(p.objectives),
    feasible: p.feasible ? 1 : 0,
    reasons: JSON.stringify(p.violations),
  };
}

/**
 * Saves finished points of a run in the browser (a run saves in slices as it goes). Each point
 * is checked against the jobs its definition expands to and judged again here with the shared
 * code; one bad point refuses the whole slice, so nothing half-checked is stored. The run is
 * audited once, when it is finished (`finishStudyRun`), not per slice.
 */
export function saveStudyPoints(db: Db, ws: WorkspaceRef, studyId: string, input: SaveStudyPointsInput, now: Date): Promise<Outcome<{ saved: number }>> {
  return db.transaction().execute((trx) => storeStudyPointsInTx(trx, ws, studyId, input, now));
}

export async function storeStudyPointsInTx(trx: Queryable, ws: WorkspaceRef, studyId: string, input: SaveStudyPointsInput, now: Date): Promise<Outcome<{ saved: number }>> {
  const row = await findStudy(trx, ws.workspaceId, studyId);
  if (!row) return noStudy();
  const def = definitionOf(row);
  const expanded = expandStudy(def);
  const expected = jobsByPoint(expanded);
  const names = studyRoadNames(def, typedInRoads(def));
  const issues: FieldIssue[] = [];
  const rows: NewStudyPointRow[] = [];
  const indices = new Set<number>();
  input.points.forEach((upload, i) => {
    if (indices.has(upload.index)) issues.push({ path: `points.${i}.index`, message: `Point ${upload.index} is sent twice.` });
    indices.add(upload.index);
    const judged = judgeUploadedPoint(def, expanded, expected, upload, names, `points.${i}`);
    if (judged.ok) rows.push(pointRow(studyId, judged.point));
    else issues.push(...judged.issues);
  });
  if (issues.length) return fail('bad_request', 'Some points do not belong to this study; nothing was saved.', issues.slice(0, 50));
  await upsertStudyPoints(trx, rows);
  await updateStudyRow(trx, studyId, { updated_at: now.toISOString() });
  return ok({ saved: rows.length });
}

/**
 * Closes a run: the results summary (counts, best compromise, trade-off front) is rebuilt from
 * every saved point. The study is complete when every planned point (and the base setup's runs)
 * is saved, whatever the browser says; asking for complete with points missing is refused.
 */
export async function finishStudyRun(db: Db, ws: WorkspaceRef, actor: Actor, studyId: string, input: FinishStudyRunInput, now: Date): Promise<Outcome<StudyDetail>> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  if (!row) return noStudy();
  // Ranking thousands of points takes a while: a worker thread does it, outside the transaction.
  const all = (await listStudyPoints(db, studyId)).map(toPointResult);
  const points = all.filter((p) => p.index >= 0);
  const base = all.find((p) => p.index === -1) ?? null;
  const done = await runHeavy('studyRunFigures', { def: definitionOf(row), points, base });
  if (!done.ok) return done;
  return db.transaction().execute((trx) => closeStudyRunInTx(trx, ws, actor, studyId, input, now, { pointCount: points.length, ...done.value }));
}

/** Ranking figures worked out before the transaction, for the point count they were made from. */
interface RankedFigures {
  pointCount: number;
  compromise: StudyResultsSummary['compromise'];
  tradeOff: StudyResultsSummary['tradeOff'];
}

/**
 * Closes a run inside the caller's transaction. Without `ranked` (the demo seed) the ranking is
 * worked out here; with it, a slice saved meanwhile (a different point count) is refused.
 */
export async function closeStudyRunInTx(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  studyId: string,
  input: FinishStudyRunInput,
  now: Date,
  ranked?: RankedFigures,
): Promise<Outcome<StudyDetail>> {
  const row = await findStudy(trx, ws.workspaceId, studyId);
  if (!row) return noStudy();
  const def = definitionOf(row);
  const all = (await listStudyPoints(trx, studyId)).map(toPointResult);
  const points = all.filter((p) => p.index >= 0);
  if (ranked && ranked.pointCount !== points.length) return fail('conflict', 'Points were saved while the run was being finished; finish it again.');
  const base = all.find((p) => p.index === -1);
  const needsBase = !def.axes.some((a) => a.parameter === 'speed');
  const complete = points.length === row.planned_points && (!needsBase || base !== undefined);
  if (input.status === 'complete' && !complete) {
    const missing = row.planned_points - points.length + (needsBase && !base ? 1 : 0);
    return fail('bad_request', 'The run is not complete.', [{ path: 'status', message: `${missing} point${missing === 1 ? ' is' : 's are'} not saved yet; finish as partial, or save them first.` }]);
  }
  if (points.length === 0) return fail('conflict', 'No point of this study has been saved yet; save points before finishing a run.');
  const status = complete ? 'complete' : 'partial';
  const compromise = ranked?.compromise ?? studyBestCompromise(def, points, undefined, base ?? null);
  const winner = compromise.ok ? points[compromise.winner] : undefined;
  const summary: StudyResultsSummary = {
    plannedPoints: row.planned_points,
    savedPoints: points.length,
    feasiblePoints: points.filter((p) => p.feasible).length,
    plannedRuns: row.planned_runs,
    savedRuns: all.reduce((n, p) => n + p.runs.length, 0),
    elapsedMs: input.elapsedMs,
    workers: input.workers ?? null,
    ranBy: { id: actor.id, name: actor.name },
    ranAt: now.toISOString(),
    compromise,
    tradeOff: ranked?.tradeOff ?? studyTradeOff(def, points, base ?? null),
    best: winner ? { pointIndex: winner.index, label: describePoint(def.axes, winner.values) } : null,
  };
  await updateStudyRow(trx, studyId, { status, results: JSON.stringify(summary), updated_at: now.toISOString() });
  const verdict = summary.best ? ` Best compromise: ${summary.best.label}.` : '';
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'study.results_saved',
    entityType: 'study',
    entityId: studyId,
    summary: `${actor.name} saved ${status === 'complete' ? 'complete' : 'partial'} results of study "${row.name}": ${points.length} of ${row.planned_points} points, ${summary.feasiblePoints} within the limits.${verdict}`,
    at: now,
  });
  return ok(await mustDetail(trx, ws, studyId));
}

/** The lead's pick: a saved point becomes the study's baseline (or none, with null). */
export function setStudyBaseline(db: Db, ws: WorkspaceRef, actor: Actor, studyId: string, input: SetStudyBaselineInput, now: Date): Promise<Outcome<StudyDetail>> {
  return db.transaction().execute((trx) => chooseStudyBaselineInTx(trx, ws, actor, studyId, input, now));
}

export async function chooseStudyBaselineInTx(trx: Queryable, ws: WorkspaceRef, actor: Actor, studyId: string, input: SetStudyBaselineInput, now: Date): Promise<Outcome<StudyDetail>> {
  const row = await findStudy(trx, ws.workspaceId, studyId);
  if (!row) return noStudy();
  const def = definitionOf(row);
  const at = now.toISOString();
  const audit = (action: string, summary: string) => recordAudit(trx, { workspaceId: ws.workspaceId, actorId: actor.id, action, entityType: 'study', entityId: studyId, summary, at: now });
  if (input.pointIndex === null) {
    await updateStudyRow(trx, studyId, { baseline_point_index: null, chosen_by: null, chosen_at: null, updated_at: at });
    if (row.baseline_point_index !== null) await audit('study.baseline_cleared', `${actor.name} cleared the baseline of study "${row.name}".`);
    return ok(await mustDetail(trx, ws, studyId));
  }
  const point = await findStudyPoint(trx, studyId, input.pointIndex);
  if (!point) return fail('bad_request', 'That point has no saved results.', [{ path: 'pointIndex', message: `Point ${input.pointIndex} is not among the saved points of this study.` }]);
  await updateStudyRow(trx, studyId, { baseline_point_index: input.pointIndex, chosen_by: actor.id, chosen_at: at, updated_at: at });
  const label = describePoint(def.axes, readStored(StudyPointValues, point.params, 'study point values'));
  await audit('study.baseline_set', `${actor.name} chose ${label} as the baseline of study "${row.name}"${point.feasible ? '' : ' (it breaks a limit)'}.`);
  return ok(await mustDetail(trx, ws, studyId));
}
