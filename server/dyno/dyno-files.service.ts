import { randomUUID } from 'node:crypto';
import { fitDamperCurves } from '../../shared/dyno/fit-curve.ts';
import { type DynoReadOutcome, summariseDyno } from '../../shared/dyno-upload/summarise-dyno.ts';
import { DynoParseOptions, type DynoDirection } from '../../shared/schemas/dyno.ts';
import {
  type ApplyDynoFitInput,
  type ApplyDynoFitResult,
  type DynoFileDetail,
  type DynoFileItem,
  DynoFileSummary,
  type DynoFilesResponse,
  type DynoUploadFields,
} from '../../shared/schemas/dyno-file.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import type { Db, Queryable } from '../db/database.ts';
import { fieldsOf } from '../core/errors.ts';
import { type DynoFileListRow, findDynoFile, insertDynoFile, linkProducedRevision, listDynoFiles } from './dyno-files.repository.ts';
import { findRevision, findSetup, latestRevisionNumber, parseStoredSetup, addRevisionInTx } from '../setups/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';

const noSetup = () => fail('not_found', 'No such setup in this workspace.');
const noFile = () => fail('not_found', 'No such dyno file for this setup.');

function toItem(r: DynoFileListRow): DynoFileItem {
  return {
    id: r.id,
    setupId: r.setup_id,
    filename: r.filename,
    bytes: r.bytes,
    uploadedBy: { id: r.uploaded_by, name: r.uploaded_by_name },
    createdAt: r.created_at,
    producedRevision: r.produced_revision_id && r.produced_revision_number !== null ? { id: r.produced_revision_id, number: r.produced_revision_number } : null,
    options: DynoParseOptions.parse(JSON.parse(r.options)),
    summary: DynoFileSummary.parse(JSON.parse(r.summary)),
  };
}

export async function listSetupDynoFiles(db: Db, ws: WorkspaceRef, setupId: string): Promise<Outcome<DynoFilesResponse>> {
  if (!(await findSetup(db, ws.workspaceId, setupId))) return noSetup();
  return ok({ files: (await listDynoFiles(db, ws.workspaceId, setupId)).map(toItem) });
}

/** One file with the loop of a raw record, read again from the kept text with the kept options. */
export async function getDynoFile(db: Db, ws: WorkspaceRef, setupId: string, fileId: string): Promise<Outcome<DynoFileDetail>> {
  const row = await findDynoFile(db, ws.workspaceId, setupId, fileId);
  if (!row) return (await findSetup(db, ws.workspaceId, setupId)) ? noFile() : noSetup();
  const item = toItem(row);
  const read = summariseDyno(row.content, item.options);
  if (!read.ok) throw new Error(`stored dyno file ${fileId} no longer reads: ${read.errors[0]?.message}`);
  return ok({ ...item, loop: read.loop });
}

/**
 * Keeps an uploaded dyno file against a setup. The file is read first; a bad file is refused
 * with every problem by line and nothing is saved.
 */
export async function uploadDynoFile(
  db: Db,
  ws: WorkspaceRef,
  actor: Actor,
  setupId: string,
  file: { text: string; filename: string; bytes: number },
  fields: DynoUploadFields,
  now: Date,
): Promise<Outcome<DynoFileItem>> {
  const setup = await findSetup(db, ws.workspaceId, setupId);
  if (!setup) return noSetup();
  const given = Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined)) as Partial<DynoParseOptions>;
  const read = summariseDyno(file.text, given);
  if (!read.ok) {
    const first = read.errors[0];
    return fail(
      'bad_request',
      `${file.filename} was not saved: ${first.line !== undefined ? `line ${first.line}: ` : ''}${first.message}`,
      read.errors.map((e) => ({ path: e.line !== undefined ? `line ${e.line}` : 'file', message: e.message })),
    );
  }
  return db.transaction().execute(async (trx) => ok(await insertDynoRecord(trx, ws, actor, setup, file, read, now)));
}

/** Inserts a file already read, with its audit entry, in the caller's transaction (the demo seed uses this too). */
export async function insertDynoRecord(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  setup: { id: string; name: string },
  file: { text: string; filename: string; bytes: number },
  read: Extract<DynoReadOutcome, { ok: true }>,
  now: Date,
): Promise<DynoFileItem> {
  const id = randomUUID();
  await insertDynoFile(trx, {
    id,
    workspace_id: ws.workspaceId,
    setup_id: setup.id,
    produced_revision_id: null,
    filename: file.filename,
    bytes: file.bytes,
    content: file.text,
    options: JSON.stringify(read.options),
    summary: JSON.stringify(read.summary),
    uploaded_by: actor.id,
    created_at: now.toISOString(),
  });
  const points = read.summary.peaks.compression.length + read.summary.peaks.rebound.length;
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'dyno_file.uploaded',
    entityType: 'dyno_file',
    entityId: id,
    summary: `${actor.name} uploaded the dyno file ${file.filename} (${points} points) for "${setup.name}".`,
    at: now,
  });
  const row = await findDynoFile(trx, ws.workspaceId, setup.id, id);
  if (!row) throw new Error(`dyno file ${id} vanished inside its own transaction`);
  return toItem(row);
}

/** Forces of a fitted table rounded to 0.1 N: finer than any dyno reads, and easier to read back. */
const roundTable = (table: [number, number][]) => table.map(([v, f]) => [v, Math.round(f * 10) / 10] as [number, number]);

/**
 * Fits the chosen directions at the chosen speeds and saves the latest revision with those
 * curves replaced as the next revision (source `dyno-fit:<file id>`), linking the file to it.
 * A fit that fails, or a curve the setup schema refuses, saves nothing.
 */
export async function applyDynoFit(db: Db, ws: WorkspaceRef, actor: Actor, setupId: string, fileId: string, input: ApplyDynoFitInput, now: Date): Promise<Outcome<ApplyDynoFitResult>> {
  return db.transaction().execute(async (trx) => {
    const setup = await findSetup(trx, ws.workspaceId, setupId);
    if (!setup) return noSetup();
    const row = await findDynoFile(trx, ws.workspaceId, setupId, fileId);
    if (!row) return noFile();
    const item = toItem(row);
    const fit = fitDamperCurves(item.summary.peaks, input.knots, { weighting: input.weighting });
    const failed = input.directions.flatMap((d) => {
      const f = fit[d];
      return f.ok ? [] : [{ path: `knots.${d}`, message: `${d}: ${f.message}` }];
    });
    if (failed.length) return fail('bad_request', `The fit could not be made: ${failed.map((f) => f.message).join('; ')}`, failed);

    const latest = await latestRevisionNumber(trx, setupId);
    const current = await findRevision(trx, setupId, latest);
    if (!current) throw new Error(`setup ${setupId} lost its latest revision`);
    const document = parseStoredSetup(current.document, `of revision ${current.id}`);
    const damper = { ...document.damper };
    for (const d of input.directions as DynoDirection[]) {
      const f = fit[d];
      if (f.ok) damper[d] = roundTable(f.table) as Setup['damper'][typeof d];
    }
    const next = Setup.safeParse({ ...document, damper });
    if (!next.success) return fail('bad_request', 'The fitted curve is not a valid damper curve; nothing was saved.', fieldsOf(next.error));

    const added = await addRevisionInTx(trx, ws, actor, setupId, { document: next.data, message: input.message, source: `dyno-fit:${fileId}`, basedOn: input.basedOn }, now);
    if (!added.ok) return added;
    await linkProducedRevision(trx, fileId, added.value.id);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'dyno_file.applied',
      entityType: 'dyno_file',
      entityId: fileId,
      summary: `${actor.name} applied the ${input.directions.join(' and ')} fit of ${row.filename} to "${setup.name}" as revision ${added.value.number}.`,
      at: now,
    });
    const linked = await findDynoFile(trx, ws.workspaceId, setupId, fileId);
    if (!linked) throw new Error(`dyno file ${fileId} vanished inside its own transaction`);
    return ok({ file: toItem(linked), revision: added.value, fit });
  });
}
