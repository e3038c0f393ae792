import { randomUUID } from 'node:crypto';
import { Metrics } from '../../shared/schemas/metrics.ts';
import { rideJudgement } from '../../shared/sim/metrics/rms-method.ts';
import { ModalResult } from '../../shared/schemas/modal.ts';
import { Road } from '../../shared/schemas/road.ts';
import { type RunList, type RunListQuery, type RunSummary, type SavedRun, type SaveRunInput, StoredTraces } from '../../shared/schemas/run-record.ts';
import { RunRequest, RunResult } from '../../shared/schemas/run.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import { effectiveSeed, roadLabel } from '../../shared/runs/road-label.ts';
import type { SessionUser, WorkspaceContext } from '../auth/request-context.ts';
import type { Db, Queryable } from '../db/database.ts';
import { fieldsOf } from '../core/errors.ts';
import { deleteRunRow, findLibraryRoad, findRunRow, insertRun, listRunRows, type RunSummaryRow, setupExists } from './runs.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { findRevisionInWorkspace } from '../setups/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { readStored } from '../core/stored-json.ts';

/** JSON with object keys sorted, so two equal documents compare equal whatever their key order. */
function canonical(value: unknown): string {
  return JSON.stringify(value, (_key, v: unknown) =>
    v && typeof v === 'object' && !Array.isArray(v) ? Object.fromEntries(Object.entries(v as Record<string, unknown>).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))) : v,
  );
}

function toSummary(row: RunSummaryRow): RunSummary {
  const road = readStored(Road, row.road, `road of run ${row.id}`);
  const metrics = readStored(Metrics, row.metrics, `metrics of run ${row.id}`);
  const modal = readStored(ModalResult, row.modal, `modal figures of run ${row.id}`);
  const judged = rideJudgement(road.kind, metrics);
  return {
    id: row.id,
    name: row.name,
    setupId: row.setup_id,
    setupName: row.setup_name,
    revisionNumber: row.revision_number,
    latestRevision: Number(row.latest_revision ?? row.revision_number),
    roadId: row.road_id,
    roadName: roadLabel(road, row.seed ?? undefined),
    roadKind: road.kind,
    speed: row.speed,
    duration: row.duration,
    seed: row.seed,
    headline: {
      bodyAccelWkRms: metrics.bodyAccelWkRms,
      comfort: judged.verdict?.primary ?? null,
      lead: judged.lead,
      bodyAccelPeak: metrics.bodyAccelPeak,
      vdv: metrics.vdv,
      ...(metrics.mtvv === undefined ? {} : { mtvv: metrics.mtvv }),
      tyreLoadRatio: metrics.tyreLoadRatio,
      liftOffFraction: metrics.liftOffFraction,
      bodyHz: modal.body.naturalHz,
    },
    createdBy: { id: row.created_by, name: row.created_by_name },
    createdAt: row.created_at,
  };
}

export async function listRuns(db: Db, ws: WorkspaceContext, query: RunListQuery): Promise<RunList> {
  const rows = await listRunRows(db, ws.workspaceId, { setupId: query.setupId, limit: query.limit ?? 200 });
  return { runs: rows.map(toSummary) };
}

export async function getRun(db: Db, ws: WorkspaceContext, runId: string): Promise<Outcome<SavedRun>> {
  const row = await findRunRow(db, ws.workspaceId, runId);
  if (!row) return fail('not_found', 'No such saved run.');
  const result = RunResult.parse({ ...JSON.parse(row.result), metrics: JSON.parse(row.metrics), modal: JSON.parse(row.modal) });
  const traces = StoredTraces.parse({ ...JSON.parse(row.trace_info), data: Buffer.from(row.traces).toString('base64') });
  return ok({
    ...toSummary(row),
    request: readStored(RunRequest, row.request, `request of run ${row.id}`),
    result,
    traces,
    spectra: row.spectra && row.spectra_length ? { length: row.spectra_length, data: Buffer.from(row.spectra).toString('base64') } : null,
  });
}

/**
 * Saves a run the browser computed. The setup it ran must be exactly the named revision's
 * document (else the figures would be labelled with a revision they did not come from), and
 * the request is rebuilt here from that revision, the road and the options, so the stored
 * request reproduces the figures with `npm run sim`.
 */
export function saveRun(db: Db, ws: WorkspaceContext, actor: SessionUser, input: SaveRunInput, now: Date): Promise<Outcome<RunSummary>> {
  return db.transaction().execute((trx) => saveRunInTx(trx, ws, actor, input, now));
}

/** `saveRun` inside a transaction the caller holds (the demo seed, which runs in one). */
export async function saveRunInTx(db: Queryable, ws: WorkspaceContext, actor: SessionUser, input: SaveRunInput, now: Date): Promise<Outcome<RunSummary>> {
  const revision = await findRevisionInWorkspace(db, ws.workspaceId, input.setupId, { number: input.revisionNumber });
  if (!revision) {
    if (!(await setupExists(db, ws.workspaceId, input.setupId))) return fail('not_found', 'No such setup in this workspace.', [{ path: 'setupId', message: 'No such setup' }]);
    return fail('not_found', `The setup has no revision ${input.revisionNumber}.`, [{ path: 'revisionNumber', message: 'No such revision' }]);
  }
  const stored = Setup.parse(JSON.parse(revision.document));
  if (canonical(stored) !== canonical(input.setup)) {
    return fail('conflict', `These figures come from a setup that differs from revision ${revision.number}; save the setup as a new revision and run it again.`, [
      { path: 'setup', message: `differs from revision ${revision.number}` },
    ]);
  }

  let road = input.road;
  const roadId = input.roadId ?? null;
  if (roadId) {
    const libraryRoad = await findLibraryRoad(db, ws.workspaceId, roadId);
    if (!libraryRoad) return fail('not_found', 'No such road in this workspace.', [{ path: 'roadId', message: 'No such road' }]);
    road ??= Road.parse(JSON.parse(libraryRoad.definition));
  }
  if (!road) return fail('bad_request', 'Give the road that was run.', [{ path: 'road', message: 'Required' }]);

  const parsed = RunRequest.safeParse({ ...input.options, setup: input.setup, road, speed: input.speed, duration: input.duration, seed: input.seed });
  if (!parsed.success) return fail('bad_request', 'The run request is not valid.', fieldsOf(parsed.error));
  const result = input.result;
  if (result.speed !== input.speed || result.duration !== input.duration || result.setupName !== input.setup.name) {
    return fail('bad_request', 'The figures do not belong to this request (speed, duration or setup name differ).', [{ path: 'result', message: 'does not match the request' }]);
  }

  const id = randomUUID();
  const seed = effectiveSeed(road, input.seed);
  const { metrics, modal, ...rest } = result;
  const { data: traceData, ...traceInfo } = input.traces;
  await insertRun(db, {
    id,
    workspace_id: ws.workspaceId,
    setup_id: input.setupId,
    revision_id: revision.id,
    road_id: roadId,
    name: input.name,
    road: JSON.stringify(road),
    speed: input.speed,
    duration: input.duration,
    seed,
    request: JSON.stringify(parsed.data),
    metrics: JSON.stringify(metrics),
    modal: JSON.stringify(modal),
    result: JSON.stringify(rest),
    trace_info: JSON.stringify(traceInfo),
    traces: Buffer.from(traceData, 'base64'),
    spectra_length: input.spectra?.length ?? null,
    spectra: input.spectra ? Buffer.from(input.spectra.data, 'base64') : null,
    created_by: actor.id,
    created_at: now.toISOString(),
  });
  await recordAudit(db, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'run.saved',
    entityType: 'run',
    entityId: id,
    summary: `${actor.name} saved the run “${input.name}” of ${revision.setup_name} revision ${revision.number} on ${roadLabel(road, input.seed)}.`,
    at: now,
  });
  const saved = await findRunRow(db, ws.workspaceId, id);
  if (!saved) throw new Error(`saved run ${id} is missing`);
  return ok(toSummary(saved));
}

export async function deleteRun(db: Db, ws: WorkspaceContext, actor: SessionUser, runId: string, now: Date): Promise<Outcome<void>> {
  return db.transaction().execute(async (trx) => {
    const row = await findRunRow(trx, ws.workspaceId, runId);
    if (!row) return fail('not_found', 'No such saved run.');
    await deleteRunRow(trx, ws.workspaceId, runId);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'run.deleted',
      entityType: 'run',
      entityId: runId,
      summary: `${actor.name} deleted the saved run “${row.name}” of ${row.setup_name} revision ${row.revision_number}.`,
      at: now,
    });
    return ok(undefined);
  });
}
