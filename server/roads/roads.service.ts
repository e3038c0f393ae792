import { randomUUID } from 'node:crypto';
import { roadFigures, type RoadFiguresOutcome } from '../../shared/road-library/road-figures.ts';
import {
  type CreateRoadInput,
  type MeasuredUploadFields,
  RoadDetail,
  RoadFigures,
  type RoadListItem,
  type RoadsResponse,
  type RoadSource,
  type UpdateRoadInput,
} from '../../shared/schemas/road-record.ts';
import { Road } from '../../shared/schemas/road.ts';
import type { Db, Queryable } from '../db/database.ts';
import {
  deleteRoadRow,
  findRoad,
  findRoadListItem,
  findRoadWithDefinitionBytes,
  insertRoad,
  isRoadVersionReferenced,
  keepCurrentRoadVersion,
  listRoads,
  type RoadDetailRow,
  type RoadListRow,
  updateRoadRow,
} from './roads.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { runHeavy } from '../jobs/heavy-pool.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { withRawJson } from '../core/json-splice.ts';


const noRoad = () => fail('not_found', 'No such road in this workspace.');

/** JSON bytes of `head` with `key` set to stored JSON bytes (see `withRawJson`, its text form). */
function jsonAround(head: object, key: string, rawJson: Uint8Array): Buffer {
  const [open, close] = withRawJson(head, key, '\u0000').split('\u0000');
  return Buffer.concat([Buffer.from(open!), rawJson, Buffer.from(close!)]);
}

function toListItem(r: RoadListRow): RoadListItem {
  return {
    id: r.id,
    name: r.name,
    kind: r.kind as RoadListItem['kind'],
    source: r.source,
    figures: RoadFigures.parse(JSON.parse(r.summary)),
    createdBy: { id: r.created_by, name: r.created_by_name },
    createdAt: r.created_at,
    changedBy: { id: r.updated_by, name: r.updated_by_name },
    changedAt: r.updated_at,
  };
}

function toDetail(r: RoadDetailRow): RoadDetail {
  const definition = Road.safeParse(JSON.parse(r.definition));
  if (!definition.success) throw new Error(`stored road ${r.id} no longer matches the road schema: ${definition.error.issues[0]?.message}`);
  return { ...toListItem(r), definition: definition.data };
}

/** Figures of a road, or a 400 naming the definition field at fault (e.g. too many samples). */
export function figuresOrFail(road: Road): Outcome<RoadFigures> {
  return asOutcome(roadFigures(road));
}

function asOutcome(out: RoadFiguresOutcome): Outcome<RoadFigures> {
  if (out.ok) return ok(out.figures);
  const [path, ...rest] = out.reason.split(': ');
  return rest.length ? fail('bad_request', 'The road definition needs attention.', [{ path: path.replace(/^road\./, 'definition.'), message: rest.join(': ') }]) : fail('bad_request', out.reason);
}

/** `figuresOrFail` in a worker thread (resampling and the class fit can take seconds). */
async function figuresInWorker(road: Road): Promise<Outcome<RoadFigures>> {
  const done = await runHeavy('roadFigures', road);
  return done.ok ? asOutcome(done.value) : done;
}

export async function listRoadLibrary(db: Db, ws: WorkspaceRef): Promise<RoadsResponse> {
  return { roads: (await listRoads(db, ws.workspaceId)).map(toListItem) };
}

/**
 * A road with its definition, as JSON text: the stored definition (checked when it was saved, up
 * to megabytes for a measured profile) is sent as it is, never parsed again on a read.
 */
export async function getRoadJson(db: Db, ws: WorkspaceRef, roadId: string): Promise<Outcome<{ body: Buffer; etag: string }>> {
  const row = await findRoadWithDefinitionBytes(db, ws.workspaceId, roadId);
  if (!row) return noRoad();
  // The body is the bytes of the stored text around the small head; the tag names the version
  // and the last change, so nobody hashes megabytes to make one.
  const body = jsonAround(toListItem(row), 'definition', row.definition_bytes);
  return ok({ body, etag: `W/"road-${row.id}-v${row.version}-${Date.parse(row.updated_at)}"` });
}

const kindWords: Record<Road['kind'], string> = {
  iso8608: 'ISO 8608 random road',
  measured: 'measured profile',
  sine: 'sine road',
  sweep: 'swept sine',
  bump: 'bump',
  pothole: 'pothole',
  kerb: 'kerb',
};

/**
 * Saves a road with its figures. `source` says whether it was typed in or uploaded; the summary
 * (length, step, fitted ISO class) is computed here so lists never recompute it.
 */
export async function saveNewRoad(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateRoadInput, source: RoadSource, now: Date): Promise<Outcome<RoadDetail>> {
  const figures = await figuresInWorker(input.definition);
  if (!figures.ok) return figures;
  return db.transaction().execute(async (trx) => ok(await insertRoadRecordInTx(trx, ws, actor, input, source, figures.value, now)));
}

/**
 * Inserts a road with figures already computed, and its audit entry, in the caller's
 * transaction (the demo seed uses this too).
 */
export async function insertRoadRecordInTx(trx: Queryable, ws: WorkspaceRef, actor: Actor, input: CreateRoadInput, source: RoadSource, figures: RoadFigures, now: Date): Promise<RoadDetail> {
  const definition = JSON.stringify({ ...input.definition, name: input.name });
  const id = await insertRoadRowInTx(trx, ws, actor, { name: input.name, kind: input.definition.kind, definition }, source, figures, now);
  const row = await findRoad(trx, ws.workspaceId, id);
  if (!row) throw new Error(`road ${id} vanished inside its own transaction`);
  return toDetail(row);
}

/** The road row and its audit entry; `definition` is the road's JSON text, already checked. */
async function insertRoadRowInTx(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  road: { name: string; kind: Road['kind']; definition: string | Uint8Array },
  source: RoadSource,
  figures: RoadFigures,
  now: Date,
): Promise<string> {
  const id = randomUUID();
  const at = now.toISOString();
  await insertRoad(trx, {
    id,
    workspace_id: ws.workspaceId,
    name: road.name,
    kind: road.kind,
    definition: road.definition,
    bytes: typeof road.definition === 'string' ? Buffer.byteLength(road.definition) : road.definition.byteLength,
    source,
    summary: JSON.stringify(figures),
    created_by: actor.id,
    created_at: at,
    updated_by: actor.id,
    updated_at: at,
  });
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: source === 'measured' ? 'road.uploaded' : 'road.created',
    entityType: 'road',
    entityId: id,
    summary: `${actor.name} ${source === 'measured' ? 'uploaded' : 'added'} the ${kindWords[road.kind]} "${road.name}".`,
    at: now,
  });
  return id;
}

export function createRoad(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateRoadInput, now: Date): Promise<Outcome<RoadDetail>> {
  return saveNewRoad(db, ws, actor, input, input.definition.kind === 'measured' ? 'measured' : 'defined', now);
}

/** Rename or redefine a road; runs that drove it keep their own copy of the old definition. */
export async function updateRoad(db: Db, ws: WorkspaceRef, actor: Actor, roadId: string, input: UpdateRoadInput, now: Date): Promise<Outcome<RoadDetail>> {
  // Worked out before the transaction, in a worker thread (see figuresInWorker).
  const newFigures = input.definition ? await figuresInWorker(input.definition) : null;
  if (newFigures && !newFigures.ok) return newFigures;
  return db.transaction().execute(async (trx) => {
    const row = await findRoad(trx, ws.workspaceId, roadId);
    if (!row) return noRoad();
    const current = toDetail(row);
    const name = input.name ?? current.name;
    const definition = input.definition ?? current.definition;
    let summary = row.summary;
    if (input.definition) {
      if (current.source === 'measured' && input.definition.kind !== 'measured') {
        return fail('bad_request', 'A measured road stays measured; add a new road for a different kind.', [{ path: 'definition.kind', message: 'must stay measured' }]);
      }
      if (!newFigures?.ok) throw new Error('figures of a new definition were not worked out');
      summary = JSON.stringify(newFigures.value);
    }
    const at = now.toISOString();
    // A study that ran this version keeps running it: the old definition is kept before it is replaced.
    const version = input.definition ? row.version + 1 : row.version;
    if (input.definition && (await isRoadVersionReferenced(trx, ws.workspaceId, roadId, row.version))) await keepCurrentRoadVersion(trx, ws.workspaceId, roadId, at);
    const definitionText = JSON.stringify({ ...definition, name });
    await updateRoadRow(trx, ws.workspaceId, roadId, {
      version,
      name,
      kind: definition.kind,
      definition: definitionText,
      bytes: Buffer.byteLength(definitionText),
      summary,
      source: definition.kind === 'measured' ? 'measured' : 'defined',
      updated_by: actor.id,
      updated_at: at,
    });
    const what = [input.name !== undefined && input.name !== current.name ? `renamed "${current.name}" to "${name}"` : '', input.definition ? `changed the definition of "${name}"` : '']
      .filter(Boolean)
      .join(' and ');
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'road.updated',
      entityType: 'road',
      entityId: roadId,
      summary: `${actor.name} ${what || `saved "${name}" unchanged`}.`,
      at: now,
    });
    const updated = await findRoad(trx, ws.workspaceId, roadId);
    if (!updated) throw new Error(`road ${roadId} vanished inside its own transaction`);
    return ok(toDetail(updated));
  });
}

/** Removes a road from the library; saved runs keep their own copy, studies the version they refer to. */
export async function deleteRoad(db: Db, ws: WorkspaceRef, actor: Actor, roadId: string, now: Date): Promise<Outcome<null>> {
  return db.transaction().execute(async (trx) => {
    // the list row, not the document: a removal never reads megabytes of points
    const row = await findRoadListItem(trx, ws.workspaceId, roadId);
    if (!row) return noRoad();
    if (await isRoadVersionReferenced(trx, ws.workspaceId, roadId, row.version)) await keepCurrentRoadVersion(trx, ws.workspaceId, roadId, now.toISOString());
    await deleteRoadRow(trx, ws.workspaceId, roadId);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'road.deleted',
      entityType: 'road',
      entityId: roadId,
      summary: `${actor.name} removed the road "${row.name}" from the library.`,
      at: now,
    });
    return ok(null);
  });
}

/** Largest measured profile file accepted, bytes, and its rows (about 500 000 rows of two short numbers). */
export const MEASURED_MAX_BYTES = 8 * 1024 * 1024;
export const MEASURED_MAX_ROWS = 500_000;

/**
 * A measured profile from an uploaded CSV: parsed (line-numbered errors, nothing saved when the
 * file is bad), checked against the road schema, then saved with its figures.
 */
export async function uploadMeasuredRoad(
  db: Db,
  ws: WorkspaceRef,
  actor: Actor,
  file: { content: Uint8Array; filename: string },
  fields: MeasuredUploadFields,
  now: Date,
): Promise<Outcome<Buffer>> {
  // Decoding, parsing, checking, the figures and the JSON of up to 500 000 rows are made in a
  // worker thread; this thread stores the bytes as text and answers with them, never decoding them.
  const done = await runHeavy('measuredUpload', { content: file.content, filename: file.filename, fields, maxRows: MEASURED_MAX_ROWS });
  if (!done.ok) return done;
  const out = done.value;
  if (!out.ok) return fail('bad_request', out.message, out.fields);
  const road = { name: fields.name, kind: 'measured' as const, definition: out.definitionBytes };
  return db.transaction().execute(async (trx) => {
    const id = await insertRoadRowInTx(trx, ws, actor, road, 'measured', out.figures, now);
    const row = await findRoadListItem(trx, ws.workspaceId, id);
    if (!row) throw new Error(`road ${id} vanished inside its own transaction`);
    return ok(jsonAround(toListItem(row), 'definition', out.definitionBytes));
  });
}
