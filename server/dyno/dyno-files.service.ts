import { randomUUID } from 'node:crypto';
import type { DynoReadOutcome } from '../../shared/dyno-upload/summarise-dyno.ts';
import { readGasDeclaration } from '../../shared/dyno/gas-declaration.ts';
import { staticGasForce } from '../../shared/sim/damper-gas.ts';
import { type DynoDirection, DynoLoop, DynoParseOptions } from '../../shared/schemas/dyno.ts';
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
import { type DynoFileListRow, findDynoFile, insertDynoFile, linkProducedRevision, listDynoFiles, storeDynoLoop } from './dyno-files.repository.ts';
import { findRevision, findSetup, latestRevisionNumber, parseStoredSetup, addRevisionInTx } from '../setups/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { readStored } from '../core/stored-json.ts';
import { runHeavy } from '../jobs/heavy-pool.ts';

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
    options: readStored(DynoParseOptions, r.options, `options of dyno file ${r.id}`),
    summary: readStored(DynoFileSummary, r.summary, `summary of dyno file ${r.id}`),
  };
}

export async function listSetupDynoFiles(db: Db, ws: WorkspaceRef, setupId: string): Promise<Outcome<DynoFilesResponse>> {
  if (!(await findSetup(db, ws.workspaceId, setupId))) return noSetup();
  return ok({ files: (await listDynoFiles(db, ws.workspaceId, setupId)).map(toItem) });
}

/**
 * One file with the loop of a raw record. The loop is kept when the file is read at upload; a file
 * kept before that is read once more in a worker thread, and its loop kept from then on.
 */
export async function getDynoFile(db: Db, ws: WorkspaceRef, setupId: string, fileId: string): Promise<Outcome<DynoFileDetail>> {
  const row = await findDynoFile(db, ws.workspaceId, setupId, fileId);
  if (!row) return (await findSetup(db, ws.workspaceId, setupId)) ? noFile() : noSetup();
  const item = toItem(row);
  if (item.summary.kind === 'peaks') return ok({ ...item, loop: null });
  if (row.loop !== null) return ok({ ...item, loop: readStored(DynoLoop, row.loop, `loop of dyno file ${fileId}`) });
  const done = await runHeavy('dynoRead', { text: row.content, options: item.options });
  if (!done.ok) return done;
  const read = done.value;
  if (!read.ok) throw new Error(`stored dyno file ${fileId} no longer reads: ${read.errors[0]?.message}`);
  if (read.loop) await storeDynoLoop(db, fileId, JSON.stringify(read.loop));
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
  // A file whose preamble says its readings include the gas force, uploaded without a gas force,
  // has the setup's static gas force taken out: keeping it would put a constant offset into every
  // fitted force. A gas force sent with the upload (0 included) is the engineer's choice and wins.
  if (given.gasForce === undefined && readGasDeclaration(file.text)?.says === 'included') {
    const latest = await findRevision(db, setupId, await latestRevisionNumber(db, setupId));
    if (latest) given.gasForce = staticGasForce(parseStoredSetup(latest.document, `of revision ${latest.id}`).damper.gas);
  }
  // A 2 MB record takes a good part of a second to read: a worker thread does it.
  const done = await runHeavy('dynoRead', { text: file.text, options: given });
  if (!done.ok) return done;
  const read = done.value;
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
    loop: read.loop ? JSON.stringify(read.loop) : null,
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
  const before = await findDynoFile(db, ws.workspaceId, setupId, fileId);
  if (!before) return (await findSetup(db, ws.workspaceId, setupId)) ? noFile() : noSetup();
  // The fit runs in a worker thread, outside the transaction; a file's peaks never change after upload.
  const fitted = await runHeavy('dynoFit', { peaks: toItem(before).summary.peaks, knots: input.knots, weighting: input.weighting });
  if (!fitted.ok) return fitted;
  const fit = fitted.value;
  return db.transaction().execute(async (trx) => {
    const setup = await findSetup(trx, ws.workspaceId, setupId);
    if (!setup) return noSetup();
    const row = await findDynoFile(trx, ws.workspaceId, setupId, fileId);
    if (!row) return noFile();
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
