import { randomUUID } from 'node:crypto';
import type { FieldIssue } from '../../shared/errors.ts';
import { Road } from '../../shared/schemas/road.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import type {
  CreateStudyInput,
  FinishStudyRunInput,
  OpenedStudyPoint,
  OpenPointAsSetupInput,
  SaveStudyPointsInput,
  SetStudyBaselineInput,
  StudiesResponse,
  StudyDetail,
  StudyResultsSummary,
  StudySummary,
} from '../../shared/schemas/study-record.ts';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import type { StudyPointResult } from '../../shared/schemas/study-result.ts';
import { applyPoint } from '../../shared/study/apply-point.ts';
import { jobsByPoint, judgeUploadedPoint, studyRoadNames } from '../../shared/study/collect.ts';
import { describePoint } from '../../shared/study/describe-point.ts';
import { expandStudy, plannedCounts, pointValuesAt } from '../../shared/study/expand.ts';
import { studyBestCompromise, studyTradeOff } from '../../shared/study/study-compromise.ts';
import type { WorkspaceContext } from '../auth/request-context.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { NewStudyPointRow, StudyPointRow } from '../db/study-tables.ts';
import {
  deleteStudyRow,
  findBaseRevision,
  findLibraryRoads,
  findStudy,
  findStudyPoint,
  insertStudy,
  listStudies as listStudyRows,
  listStudyPoints,
  type StudyViewRow,
  updateStudyRow,
  upsertStudyPoints,
} from '../repositories/studies.ts';
import { recordAudit } from './audit.ts';
import { fail, ok, type Outcome } from './outcome.ts';
import { type Actor, addRevision } from './setups.ts';

type Ws = Pick<WorkspaceContext, 'workspaceId'>;

const noStudy = () => fail('not_found', 'No such study in this workspace.');

/** A stored JSON column read back; a parse failure is a bug (only this service writes them). */
const parsed = <T>(text: string): T => JSON.parse(text) as T;

export function definitionOf(row: Pick<StudyViewRow, 'definition'>): StudyDefinition {
  return StudyDefinition.parse(parsed(row.definition));
}

export function toPointResult(r: StudyPointRow): StudyPointResult {
  return {
    index: r.idx,
    values: parsed(r.params),
    runs: parsed(r.metrics),
    figures: parsed(r.figures),
    objectives: parsed(r.objectives),
    feasible: r.feasible === 1,
    violations: parsed(r.reasons),
  };
}

export function toSummary(row: StudyViewRow, def: StudyDefinition = definitionOf(row)): StudySummary {
  const roads = parsed<Road[]>(row.roads);
  const baselineValues = row.baseline_point_index !== null ? pointValuesAt(def.axes, row.baseline_point_index) : undefined;
  return {
    id: row.id,
    name: row.name,
    status: row.status,
    base: { setupId: row.base_setup_id, setupName: row.base_setup_name, revisionNumber: row.base_revision_number },
    axes: def.axes,
    roadNames: studyRoadNames(def, roads),
    speeds: def.speeds,
    plannedPoints: row.planned_points,
    plannedRuns: row.planned_runs,
    results: row.results ? parsed<StudyResultsSummary>(row.results) : null,
    baseline:
      row.baseline_point_index !== null && row.chosen_by && row.chosen_at
        ? {
            pointIndex: row.baseline_point_index,
            label: baselineValues ? describePoint(def.axes, baselineValues) : `point ${row.baseline_point_index}`,
            chosenBy: { id: row.chosen_by, name: row.chosen_by_name ?? 'someone' },
            chosenAt: row.chosen_at,
          }
        : null,
    createdBy: { id: row.created_by, name: row.created_by_name },
    createdAt: row.created_at,
    updatedAt: row.updated_at,
  };
}

/** The full study: summary, definition, the snapshots it runs from, and its saved points. */
export async function detailOf(db: Queryable, row: StudyViewRow): Promise<StudyDetail> {
  const def = definitionOf(row);
  const points = (await listStudyPoints(db, row.id)).map(toPointResult);
  return {
    ...toSummary(row, def),
    definition: def,
    baseSetup: Setup.parse(parsed(row.base_document)),
    roads: parsed<unknown[]>(row.roads).map((r) => Road.parse(r)),
    points: points.filter((p) => p.index >= 0),
    basePoint: points.find((p) => p.index === -1) ?? null,
  };
}

async function mustDetail(db: Queryable, ws: Ws, studyId: string): Promise<StudyDetail> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  if (!row) throw new Error(`study ${studyId} vanished inside its own transaction`);
  return detailOf(db, row);
}

export async function listStudies(db: Db, ws: Ws): Promise<StudiesResponse> {
  return { studies: (await listStudyRows(db, ws.workspaceId)).map((r) => toSummary(r)) };
}

export async function getStudy(db: Db, ws: Ws, studyId: string): Promise<Outcome<StudyDetail>> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  return row ? ok(await detailOf(db, row)) : noStudy();
}

/**
 * Resolves the definition against the workspace: the base revision must be in it, and each
 * library road too. Library roads are copied into the study (and named), so the study runs the
 * same after the library changes.
 */
async function resolve(db: Queryable, ws: Ws, def: StudyDefinition) {
  const issues: FieldIssue[] = [];
  const base = await findBaseRevision(db, ws.workspaceId, def.base.setupId, def.base.revisionId);
  if (!base) issues.push({ path: 'definition.base.revisionId', message: 'No such revision of that setup in this workspace.' });
  const ids = def.roads.flatMap((r) => (r.source === 'library' ? [r.roadId] : []));
  const found = new Map((await findLibraryRoads(db, ws.workspaceId, ids)).map((r) => [r.id, r]));
  const roads: Road[] = [];
  const entries = def.roads.map((entry, i) => {
    if (entry.source === 'inline') {
      roads.push(entry.road);
      return entry;
    }
    const row = found.get(entry.roadId);
    if (!row) {
      issues.push({ path: `definition.roads.${i}.roadId`, message: 'No such road in this workspace’s library.' });
      return entry;
    }
    roads.push(Road.parse(JSON.parse(row.definition)));
    return { ...entry, name: entry.name ?? row.name };
  });
  if (issues.length || !base) return { ok: false as const, issues };
  return { ok: true as const, base, roads, def: { ...def, roads: entries } };
}

export function createStudy(db: Db, ws: Ws, actor: Actor, input: CreateStudyInput, now: Date): Promise<Outcome<StudyDetail>> {
  return db.transaction().execute(async (trx) => {
    const r = await resolve(trx, ws, input.definition);
    if (!r.ok) return fail('bad_request', 'The study needs attention; nothing was saved.', r.issues);
    const id = randomUUID();
    const at = now.toISOString();
    const planned = plannedCounts(r.def);
    await insertStudy(trx, {
      id,
      workspace_id: ws.workspaceId,
      name: r.def.name,
      definition: JSON.stringify(r.def),
      base_setup_id: r.def.base.setupId,
      base_revision_id: r.base.id,
      base_revision_number: r.base.number,
      base_document: r.base.document,
      roads: JSON.stringify(r.roads),
      planned_points: planned.points,
      planned_runs: planned.runs,
      status: 'draft',
      results: null,
      baseline_point_index: null,
      chosen_by: null,
      chosen_at: null,
      created_by: actor.id,
      created_at: at,
      updated_at: at,
    });
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'study.created',
      entityType: 'study',
      entityId: id,
      summary: `${actor.name} defined study "${r.def.name}" on ${r.base.setup_name} revision ${r.base.number}: ${planned.points} points, ${planned.runs} runs.`,
      at: now,
    });
    return ok(await mustDetail(trx, ws, id));
  });
}

export function deleteStudy(db: Db, ws: Ws, actor: Actor, studyId: string, now: Date): Promise<Outcome<null>> {
  return db.transaction().execute(async (trx) => {
    const row = await findStudy(trx, ws.workspaceId, studyId);
    if (!row) return noStudy();
    await deleteStudyRow(trx, studyId);
    await recordAudit(trx, { workspaceId: ws.workspaceId, actorId: actor.id, action: 'study.deleted', entityType: 'study', entityId: studyId, summary: `${actor.name} deleted study "${row.name}".`, at: now });
    return ok(null);
  });
}

function pointRow(studyId: string, p: StudyPointResult): NewStudyPointRow {
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
export function saveStudyPoints(db: Db, ws: Ws, studyId: string, input: SaveStudyPointsInput, now: Date): Promise<Outcome<{ saved: number }>> {
  return db.transaction().execute(async (trx) => {
    const row = await findStudy(trx, ws.workspaceId, studyId);
    if (!row) return noStudy();
    const def = definitionOf(row);
    const expanded = expandStudy(def);
    const expected = jobsByPoint(expanded);
    const names = studyRoadNames(def, parsed<Road[]>(row.roads));
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
  });
}

/**
 * Closes a run: the results summary (counts, best compromise, trade-off front) is rebuilt from
 * every saved point. The study is complete when every planned point (and the base setup's runs)
 * is saved, whatever the browser says; asking for complete with points missing is refused.
 */
export function finishStudyRun(db: Db, ws: Ws, actor: Actor, studyId: string, input: FinishStudyRunInput, now: Date): Promise<Outcome<StudyDetail>> {
  return db.transaction().execute(async (trx) => {
    const row = await findStudy(trx, ws.workspaceId, studyId);
    if (!row) return noStudy();
    const def = definitionOf(row);
    const all = (await listStudyPoints(trx, studyId)).map(toPointResult);
    const points = all.filter((p) => p.index >= 0);
    const base = all.find((p) => p.index === -1);
    const needsBase = !def.axes.some((a) => a.parameter === 'speed');
    const complete = points.length === row.planned_points && (!needsBase || base !== undefined);
    if (input.status === 'complete' && !complete) {
      const missing = row.planned_points - points.length + (needsBase && !base ? 1 : 0);
      return fail('bad_request', 'The run is not complete.', [{ path: 'status', message: `${missing} point${missing === 1 ? ' is' : 's are'} not saved yet; finish as partial, or save them first.` }]);
    }
    if (points.length === 0) return fail('conflict', 'No point of this study has been saved yet; save points before finishing a run.');
    const status = complete ? 'complete' : 'partial';
    const compromise = studyBestCompromise(def, points);
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
      tradeOff: studyTradeOff(def, points),
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
  });
}

/** The lead's pick: a saved point becomes the study's baseline (or none, with null). */
export function setStudyBaseline(db: Db, ws: Ws, actor: Actor, studyId: string, input: SetStudyBaselineInput, now: Date): Promise<Outcome<StudyDetail>> {
  return db.transaction().execute(async (trx) => {
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
    const label = describePoint(def.axes, parsed(point.params));
    await audit('study.baseline_set', `${actor.name} chose ${label} as the baseline of study "${row.name}"${point.feasible ? '' : ' (it breaks a limit)'}.`);
    return ok(await mustDetail(trx, ws, studyId));
  });
}

/**
 * A study point as the next revision of the base setup: the base revision's document with the
 * point's values applied (the same code the runs used), saved with source `study:<id>`.
 */
export function openPointAsSetup(db: Db, ws: Ws, actor: Actor, studyId: string, index: number, input: OpenPointAsSetupInput, now: Date): Promise<Outcome<OpenedStudyPoint>> {
  return db.transaction().execute(async (trx) => {
    const row = await findStudy(trx, ws.workspaceId, studyId);
    if (!row) return noStudy();
    const def = definitionOf(row);
    const values = pointValuesAt(def.axes, index);
    if (!values) return fail('not_found', `This study has no point ${index}.`);
    if (!row.base_setup_id || row.base_setup_name === null) return fail('conflict', 'The setup this study started from no longer exists, so there is nothing to add a revision to.');
    const applied = applyPoint(Setup.parse(parsed(row.base_document)), values);
    if (!applied.ok) return fail('conflict', `This point does not make a valid setup: ${applied.message}`);
    const label = describePoint(def.axes, values);
    const message = input.message?.trim() || `From study "${row.name}": ${label} (on revision ${row.base_revision_number})`;
    const added = await addRevision(trx, ws, actor, row.base_setup_id, { document: applied.setup, message, source: `study:${studyId}` }, now);
    if (!added.ok) return added;
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'study.point_opened',
      entityType: 'study',
      entityId: studyId,
      summary: `${actor.name} saved ${label} of study "${row.name}" as revision ${added.value.number} of ${row.base_setup_name}.`,
      at: now,
    });
    return ok({ setupId: row.base_setup_id, setupName: row.base_setup_name, revisionNumber: added.value.number });
  });
}
