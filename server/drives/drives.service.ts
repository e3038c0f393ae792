import { randomUUID } from 'node:crypto';
import { type ApplyDriveFitInput, type ApplyDriveFitResult, DriveData, type DriveDetail, type DriveItem, type DrivesResponse, DriveSummary, type DriveUploadFields } from '../../shared/schemas/drive.ts';
import type { DriveReadResult } from '../../shared/drive/read-drive.ts';
import type { Db, Queryable } from '../db/database.ts';
import { findDrive, findDriveData, insertDrive, linkDriveRevision, type DriveListRow, listDrives } from './drives.repository.ts';
import { addRevisionInTx, findSetup, parseStoredSetup, findRevision, latestRevisionNumber } from '../setups/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { readStored } from '../core/stored-json.ts';
import { fieldsAFitChanges } from '../../shared/drive/fit-parameters.ts';
import type { Setup } from '../../shared/schemas/setup.ts';
import { runHeavy } from '../jobs/heavy-pool.ts';

const noSetup = () => fail('not_found', 'No such setup in this workspace.');
const noDrive = () => fail('not_found', 'No such drive for this setup.');

function toItem(r: DriveListRow): DriveItem {
  return {
    id: r.id,
    setupId: r.setup_id,
    filename: r.filename,
    bytes: r.bytes,
    note: r.note,
    uploadedBy: { id: r.uploaded_by, name: r.uploaded_by_name },
    createdAt: r.created_at,
    producedRevision: r.produced_revision_id && r.produced_revision_number !== null ? { id: r.produced_revision_id, number: r.produced_revision_number } : null,
    summary: readStored(DriveSummary, r.summary, `summary of drive ${r.id}`),
  };
}

export async function listSetupDrives(db: Db, ws: WorkspaceRef, setupId: string): Promise<Outcome<DrivesResponse>> {
  if (!(await findSetup(db, ws.workspaceId, setupId))) return noSetup();
  return ok({ drives: (await listDrives(db, ws.workspaceId, setupId)).map(toItem) });
}

/** One drive with its signals (the browser fits the model to them in a worker). */
export async function getDrive(db: Db, ws: WorkspaceRef, setupId: string, driveId: string): Promise<Outcome<DriveDetail>> {
  const row = await findDriveData(db, ws.workspaceId, setupId, driveId);
  if (!row) return (await findSetup(db, ws.workspaceId, setupId)) ? noDrive() : noSetup();
  return ok({ ...toItem(row), data: readStored(DriveData, row.data, `signals of drive ${driveId}`) });
}

/**
 * Keeps a drive log against a setup. The file is read in a worker thread first; a bad file is
 * refused with its problems by line and column, and nothing is saved.
 */
export async function uploadDrive(
  db: Db,
  ws: WorkspaceRef,
  actor: Actor,
  setupId: string,
  file: { text: string; filename: string; bytes: number },
  fields: DriveUploadFields,
  now: Date,
): Promise<Outcome<DriveItem>> {
  const setup = await findSetup(db, ws.workspaceId, setupId);
  if (!setup) return noSetup();
  const done = await runHeavy('driveRead', { text: file.text });
  if (!done.ok) return done;
  const read = done.value;
  if (!read.ok) {
    const first = read.errors[0];
    const where = (e: typeof first) => [e.line !== undefined ? `line ${e.line}` : null, e.column ? `column ${e.column}` : null].filter(Boolean).join(', ');
    return fail(
      'bad_request',
      `${file.filename} was not saved: ${where(first) ? `${where(first)}: ` : ''}${first.message}`,
      read.errors.map((e) => ({ path: where(e) || 'file', message: e.message })),
    );
  }
  return db.transaction().execute(async (trx) => ok(await insertDriveRecord(trx, ws, actor, setup, file, fields, read, now)));
}

async function insertDriveRecord(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  setup: { id: string; name: string },
  file: { text: string; filename: string; bytes: number },
  fields: DriveUploadFields,
  read: Extract<DriveReadResult, { ok: true }>,
  now: Date,
): Promise<DriveItem> {
  const id = randomUUID();
  const summary = JSON.stringify(read.summary);
  await insertDrive(trx, {
    id,
    workspace_id: ws.workspaceId,
    setup_id: setup.id,
    produced_revision_id: null,
    filename: file.filename,
    note: fields.note || null,
    bytes: Buffer.byteLength(file.text) + Buffer.byteLength(read.dataJson) + Buffer.byteLength(summary),
    content: file.text,
    summary,
    data: read.dataJson,
    uploaded_by: actor.id,
    created_at: now.toISOString(),
  });
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'drive.uploaded',
    entityType: 'drive',
    entityId: id,
    summary: `${actor.name} uploaded the drive ${file.filename} (${read.summary.duration.toFixed(1)} s) for "${setup.name}".`,
    at: now,
  });
  const row = await findDrive(trx, ws.workspaceId, setup.id, id);
  if (!row) throw new Error(`drive ${id} vanished inside its own transaction`);
  return toItem(row);
}

/**
 * Saves a corner fitted to a drive as the next revision (source `drive-fit:<drive id>`). The
 * message always names the drive, whatever the person wrote, so the revision cites its evidence.
 * Only the parameters a drive fit can change may differ from the latest revision.
 */
export async function applyDriveFit(db: Db, ws: WorkspaceRef, actor: Actor, setupId: string, driveId: string, input: ApplyDriveFitInput, now: Date): Promise<Outcome<ApplyDriveFitResult>> {
  return db.transaction().execute(async (trx) => {
    const setup = await findSetup(trx, ws.workspaceId, setupId);
    if (!setup) return noSetup();
    const drive = await findDrive(trx, ws.workspaceId, setupId, driveId);
    if (!drive) return noDrive();
    const latest = await findRevision(trx, setupId, await latestRevisionNumber(trx, setupId));
    if (!latest) throw new Error(`setup ${setupId} lost its latest revision`);
    const current = parseStoredSetup(latest.document, `of revision ${latest.id}`);
    const changed = changedOutsideFit(current, input.setup);
    if (changed.length) return fail('bad_request', `A drive fit changes masses, rates and damper force scales only; ${changed.join(', ')} differ from the latest revision.`, changed.map((path) => ({ path: `setup.${path}`, message: 'not something a drive fit changes' })));
    const cite = `fitted to drive ${drive.filename} (${drive.created_at.slice(0, 10)}, id ${drive.id})`;
    const message = input.message.trim() ? `${input.message.trim()} — ${cite}` : `Corner ${cite}`;
    const added = await addRevisionInTx(trx, ws, actor, setupId, { document: input.setup, message: message.slice(0, 500), source: `drive-fit:${driveId}`, basedOn: input.basedOn }, now);
    if (!added.ok) return added;
    await linkDriveRevision(trx, driveId, added.value.id);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'drive.applied',
      entityType: 'drive',
      entityId: driveId,
      summary: `${actor.name} saved the fit to drive ${drive.filename} as revision ${added.value.number} of "${setup.name}".`,
      at: now,
    });
    const linked = await findDrive(trx, ws.workspaceId, setupId, driveId);
    if (!linked) throw new Error(`drive ${driveId} vanished inside its own transaction`);
    return ok({ drive: toItem(linked), revision: added.value });
  });
}

/** Top-level fields (and the damper tables' velocities and gas) that differ although no drive fit parameter changes them. */
function changedOutsideFit(current: Setup, next: Setup): string[] {
  const fitted = fieldsAFitChanges(current);
  const before = current as Record<string, unknown>;
  const after = next as Record<string, unknown>;
  const keys = new Set([...Object.keys(before), ...Object.keys(after)]);
  const out = [...keys].filter((k) => !fitted.has(k) && JSON.stringify(before[k]) !== JSON.stringify(after[k]));
  const b = before.damper as { compression: [number, number][]; rebound: [number, number][]; gas?: unknown };
  const a = after.damper as typeof b;
  for (const d of ['compression', 'rebound'] as const) {
    if (JSON.stringify(b[d].map((p) => p[0])) !== JSON.stringify(a[d].map((p) => p[0]))) out.push(`damper.${d}`);
  }
  if (JSON.stringify(b.gas) !== JSON.stringify(a.gas)) out.push('damper.gas');
  return out;
}
