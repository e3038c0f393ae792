import { randomUUID } from 'node:crypto';
import { z } from 'zod';
import type { FieldIssue } from '../../shared/errors.ts';
import { Road } from '../../shared/schemas/road.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { type CreateStudyInput, type StudiesResponse, type StudyDetail, StudyResultsSummary, type StudyPointDraft, type StudySummary } from '../../shared/schemas/study-record.ts';
import { StudyDefinition } from '../../shared/schemas/study.ts';
import { StudyPointResult } from '../../shared/schemas/study-result.ts';
import { applyPoint } from '../../shared/study/apply-point.ts';
import { ensembleFigures } from '../../shared/study/ensemble.ts';
import { studyRoadNames } from '../../shared/study/collect.ts';
import { describePoint } from '../../shared/study/describe-point.ts';
import { plannedCounts, pointValuesAt } from '../../shared/study/expand.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { StudyPointRow } from './studies.tables.ts';
import {
  deleteStudyRow,
  findLibraryRoads,
  findStudy,
  insertStudy,
  listStudies as listStudyRows,
  listStudyPoints,
  type StudyListRow,
  type StudyViewRow,
  withStudyBytes,
} from './studies.repository.ts';
import { findRoadDefinitionTexts } from '../roads/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { readStored } from '../core/stored-json.ts';
import { withRawJson } from '../core/json-splice.ts';

/** Studies saved before road versions keep their own copy of each road (`study.roads`). */
const StoredRoads = z.array(Road);
/** Per definition road: the library road and version it refers to, or null when typed in. */
const StudyRoadRefs = z.array(z.object({ roadId: z.string(), version: z.number().int().positive() }).nullable());
type StudyRoadRefs = z.infer<typeof StudyRoadRefs>;

/** The roads typed into the definition, by position (library roads are named in their entries). */
export const typedInRoads = (def: StudyDefinition): (Road | undefined)[] => def.roads.map((entry) => (entry.source === 'inline' ? entry.road : undefined));

/**
 * JSON text of each road a study runs over, in the definition's order: typed-in roads from the
 * definition, library roads at the version the study refers to, as stored (a library definition
 * was checked against the road schema when it was saved and can be megabytes).
 */
async function studyRoadTexts(db: Queryable, row: Pick<StudyViewRow, 'id' | 'workspace_id' | 'roads' | 'road_refs'>, def: StudyDefinition): Promise<string[]> {
  if (row.road_refs === null) return readStored(StoredRoads, row.roads, 'study roads').map((r) => JSON.stringify(r));
  const refs = readStored(StudyRoadRefs, row.road_refs, 'study road refs');
  const texts = await findRoadDefinitionTexts(db, row.workspace_id, refs.filter((r) => r !== null));
  return def.roads.map((entry, i) => {
    if (entry.source === 'inline') return JSON.stringify(entry.road);
    const ref = refs[i];
    const text = ref ? texts.get(`${ref.roadId}@${ref.version}`) : undefined;
    if (text === undefined) throw new Error(`study ${row.id} refers to road ${ref ? `${ref.roadId}@${ref.version}` : i} which is not kept`);
    return text;
  });
}

/** The roads a study runs over, as objects; each distinct stored definition is read once. */
export async function studyRoadsOf(db: Queryable, row: Pick<StudyViewRow, 'id' | 'workspace_id' | 'roads' | 'road_refs'>, def: StudyDefinition): Promise<Road[]> {
  const parsed = new Map<string, Road>();
  return (await studyRoadTexts(db, row, def)).map((text) => {
    if (!parsed.has(text)) parsed.set(text, JSON.parse(text) as Road);
    return parsed.get(text) as Road;
  });
}
import { findRevisionInWorkspace } from '../setups/index.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';


const noStudy = () => fail('not_found', 'No such study in this workspace.');


export function definitionOf(row: Pick<StudyViewRow, 'definition'>): StudyDefinition {
  return readStored(StudyDefinition, row.definition, 'study definition');
}

/**
 * A stored point. Its spread over the seeds is not stored but worked out again from its runs
 * with the shared code (cheap next to reading the runs), so it cannot disagree with them.
 */
export function toPointResult(r: StudyPointRow, def?: Pick<StudyDefinition, 'aggregate' | 'seeds'>): StudyPointResult {
  const point = StudyPointResult.parse({
    index: r.idx,
    values: JSON.parse(r.params),
    runs: JSON.parse(r.metrics),
    figures: JSON.parse(r.figures),
    objectives: JSON.parse(r.objectives),
    feasible: r.feasible === 1,
    violations: JSON.parse(r.reasons),
  });
  if (def && def.seeds > 1) {
    const { spread } = ensembleFigures(point.runs, def.aggregate, def.seeds);
    if (spread) point.spread = spread;
  }
  return point;
}

export function toSummary(row: StudyListRow, def: StudyDefinition = definitionOf(row)): StudySummary {
  const baselineValues = row.baseline_point_index !== null ? pointValuesAt(def.axes, row.baseline_point_index) : undefined;
  return {
    id: row.id,
    name: row.name,
    status: row.status,
    base: { setupId: row.base_setup_id, setupName: row.base_setup_name, revisionNumber: row.base_revision_number },
    axes: def.axes,
    roadNames: studyRoadNames(def, typedInRoads(def)),
    speeds: def.speeds,
    plannedPoints: row.planned_points,
    plannedRuns: row.planned_runs,
    results: row.results ? readStored(StudyResultsSummary, row.results, 'study results') : null,
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
  const points = (await listStudyPoints(db, row.id)).map((r) => toPointResult(r, def));
  return {
    ...toSummary(row, def),
    definition: def,
    baseSetup: readStored(Setup, row.base_document, 'study base setup'),
    roads: await studyRoadsOf(db, row, def),
    points: points.filter((p) => p.index >= 0),
    basePoint: points.find((p) => p.index === -1) ?? null,
  };
}

export async function mustDetail(db: Queryable, ws: WorkspaceRef, studyId: string): Promise<StudyDetail> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  if (!row) throw new Error(`study ${studyId} vanished inside its own transaction`);
  return detailOf(db, row);
}

export async function listStudies(db: Db, ws: WorkspaceRef): Promise<StudiesResponse> {
  return { studies: (await listStudyRows(db, ws.workspaceId)).map((r) => toSummary(r)) };
}

export async function getStudy(db: Db, ws: WorkspaceRef, studyId: string): Promise<Outcome<StudyDetail>> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  return row ? ok(await detailOf(db, row)) : noStudy();
}

/** `StudyDetail` as JSON text for a read: the roads go out as stored, not parsed and written again. */
export async function getStudyJson(db: Db, ws: WorkspaceRef, studyId: string): Promise<Outcome<string>> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  if (!row) return noStudy();
  const def = definitionOf(row);
  const points = (await listStudyPoints(db, row.id)).map((r) => toPointResult(r, def));
  const head: Omit<StudyDetail, 'roads'> = {
    ...toSummary(row, def),
    definition: def,
    baseSetup: readStored(Setup, row.base_document, 'study base setup'),
    points: points.filter((p) => p.index >= 0),
    basePoint: points.find((p) => p.index === -1) ?? null,
  };
  return ok(withRawJson(head, 'roads', `[${(await studyRoadTexts(db, row, def)).join(',')}]`));
}

/**
 * Resolves the definition against the workspace: the base revision must be in it, and each
 * library road too. Library roads are named and referred to at their current version (the study
 * runs that version after the library changes); no copy is stored.
 */
async function resolve(db: Queryable, ws: WorkspaceRef, def: StudyDefinition) {
  const issues: FieldIssue[] = [];
  const base = await findRevisionInWorkspace(db, ws.workspaceId, def.base.setupId, { id: def.base.revisionId });
  if (!base) issues.push({ path: 'definition.base.revisionId', message: 'No such revision of that setup in this workspace.' });
  const ids = def.roads.flatMap((r) => (r.source === 'library' ? [r.roadId] : []));
  const found = new Map((await findLibraryRoads(db, ws.workspaceId, ids)).map((r) => [r.id, r]));
  const refs: StudyRoadRefs = [];
  const entries = def.roads.map((entry, i) => {
    if (entry.source === 'inline') {
      refs.push(null);
      return entry;
    }
    const row = found.get(entry.roadId);
    if (!row) {
      issues.push({ path: `definition.roads.${i}.roadId`, message: 'No such road in this workspace’s library.' });
      refs.push(null);
      return entry;
    }
    refs.push({ roadId: row.id, version: row.version });
    return { ...entry, name: entry.name ?? row.name };
  });
  if (issues.length || !base) return { ok: false as const, issues };
  return { ok: true as const, base, refs, def: { ...def, roads: entries } };
}

export function createStudy(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateStudyInput, now: Date): Promise<Outcome<StudyDetail>> {
  return db.transaction().execute((trx) => insertNewStudyInTx(trx, ws, actor, input, now));
}

/** A new study in the caller's transaction (the demo seed uses this too). */
export async function insertNewStudyInTx(trx: Queryable, ws: WorkspaceRef, actor: Actor, input: CreateStudyInput, now: Date): Promise<Outcome<StudyDetail>> {
  const r = await resolve(trx, ws, input.definition);
  if (!r.ok) return fail('bad_request', 'The study needs attention; nothing was saved.', r.issues);
  const id = randomUUID();
  const at = now.toISOString();
  const planned = plannedCounts(r.def);
  await insertStudy(trx, withStudyBytes({
    id,
    workspace_id: ws.workspaceId,
    name: r.def.name,
    definition: JSON.stringify(r.def),
    base_setup_id: r.def.base.setupId,
    base_revision_id: r.base.id,
    base_revision_number: r.base.number,
    base_document: r.base.document,
    roads: '[]',
    road_refs: JSON.stringify(r.refs),
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
  }));
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
}

export function deleteStudy(db: Db, ws: WorkspaceRef, actor: Actor, studyId: string, now: Date): Promise<Outcome<null>> {
  return db.transaction().execute(async (trx) => {
    const row = await findStudy(trx, ws.workspaceId, studyId);
    if (!row) return noStudy();
    await deleteStudyRow(trx, studyId);
    await recordAudit(trx, { workspaceId: ws.workspaceId, actorId: actor.id, action: 'study.deleted', entityType: 'study', entityId: studyId, summary: `${actor.name} deleted study "${row.name}".`, at: now });
    return ok(null);
  });
}

/**
 * A study point as the next revision of the base setup: the base revision's document with the
 * point's values applied (the same code the runs used), saved with source `study:<id>`.
 */
/** A point applied to the study's base revision, stored nowhere: the bench shows it as an unsaved draft. */
export async function studyPointDraft(db: Db, ws: WorkspaceRef, studyId: string, index: number): Promise<Outcome<StudyPointDraft>> {
  const row = await findStudy(db, ws.workspaceId, studyId);
  if (!row) return noStudy();
  const def = definitionOf(row);
  const values = pointValuesAt(def.axes, index);
  if (!values) return fail('not_found', `This study has no point ${index}.`);
  if (!row.base_setup_id || row.base_setup_name === null) return fail('conflict', 'The setup this study started from no longer exists, so there is nothing to open the point in.');
  const applied = applyPoint(readStored(Setup, row.base_document, 'study base setup'), values);
  if (!applied.ok) return fail('conflict', `This point does not make a valid setup: ${applied.message}`);
  const pointLabel = describePoint(def.axes, values);
  return ok({
    setupId: row.base_setup_id,
    setupName: row.base_setup_name,
    baseRevisionNumber: row.base_revision_number,
    pointLabel,
    setup: applied.setup,
    message: `From study "${row.name}", point ${index + 1}: ${pointLabel} (on revision ${row.base_revision_number})`,
  });
}
