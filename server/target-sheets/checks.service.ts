import { randomUUID } from 'node:crypto';
import { DynoParseOptions } from '../../shared/schemas/dyno.ts';
import {
  type ConformityChecksResponse,
  type ConformityRecordDetail,
  ConformityReport,
  type DynoCheckFields,
  MeasuredDamper,
  TargetSheetStatus,
} from '../../shared/schemas/target-sheet.ts';
import { checkConformity } from '../../shared/target-sheet/conformity.ts';
import { conformityToCsv } from '../../shared/target-sheet/to-csv.ts';
import { z } from 'zod';
import type { Db, Queryable } from '../db/database.ts';
import { type DynoCheckViewRow, findDynoCheck, findSheet, insertDynoCheck, listDynoChecks } from './target-sheets.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { toSheet } from './target-sheets.service.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { runHeavy } from '../jobs/heavy-pool.ts';


/** What `dyno_check.result` holds. */
const StoredResult = z.object({
  report: ConformityReport,
  measured: z.array(MeasuredDamper),
  sheetStatus: TargetSheetStatus,
  options: DynoParseOptions,
});

const noSheet = () => fail('not_found', 'No such target sheet in this workspace.');

function toRecord(r: DynoCheckViewRow): ConformityRecordDetail {
  const parsed = StoredResult.safeParse(JSON.parse(r.result));
  if (!parsed.success) throw new Error(`stored dyno check ${r.id} no longer matches the schema: ${parsed.error.issues[0]?.message}`);
  const { report, measured, sheetStatus } = parsed.data;
  return {
    id: r.id,
    sheetId: r.sheet_id,
    createdAt: r.created_at,
    createdBy: { id: r.uploaded_by, name: r.uploaded_by_name },
    fileNames: measured.map((m) => m.fileName),
    report,
    measured,
    sheetStatus,
  };
}

export async function listSheetChecks(db: Db, ws: WorkspaceRef, sheetId: string): Promise<Outcome<ConformityChecksResponse>> {
  if (!(await findSheet(db, ws.workspaceId, sheetId))) return noSheet();
  return ok({ checks: (await listDynoChecks(db, sheetId)).map(toRecord) });
}

export async function sheetCheckCsv(db: Db, ws: WorkspaceRef, sheetId: string, checkId: string): Promise<Outcome<{ fileName: string; csv: string }>> {
  const sheet = await findSheet(db, ws.workspaceId, sheetId);
  if (!sheet) return noSheet();
  const row = await findDynoCheck(db, sheetId, checkId);
  if (!row) return fail('not_found', 'No such dyno check for this sheet.');
  return ok({ fileName: `${sheet.number}-check-${row.created_at.slice(0, 10)}.csv`, csv: conformityToCsv(toRecord(row).report) });
}

/**
 * Checks one or more measured dampers (one file each, any layout the dyno reader knows) against
 * every reference point of the sheet and keeps the result. Every file is read before anything is
 * saved: one bad file refuses the whole upload, naming the file and line.
 */
export async function runSheetCheck(
  db: Db,
  ws: WorkspaceRef,
  actor: Actor,
  sheetId: string,
  files: { content: Uint8Array; filename: string; bytes: number }[],
  fields: DynoCheckFields,
  now: Date,
): Promise<Outcome<ConformityRecordDetail>> {
  if (!(await findSheet(db, ws.workspaceId, sheetId))) return noSheet();
  // Reading a dozen 2 MB records takes seconds: a worker thread does it, and hands back the
  // files as they are kept, already as bytes.
  const done = await runHeavy('sheetCheckFiles', { files, fields });
  if (!done.ok) return done;
  const read = done.value;
  if (!read.ok) return read;
  const kept = { filenames: files.map((f) => f.filename), content: read.value.contentBytes };
  return db.transaction().execute((trx) => storeSheetCheckInTx(trx, ws, actor, sheetId, kept, read.value, now));
}

/** Checks already-read dampers against the sheet and keeps the result, inside an open transaction. */
export async function storeSheetCheckInTx(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  sheetId: string,
  files: { filenames: string[]; content: string | Uint8Array },
  read: { measured: MeasuredDamper[]; options: Partial<DynoParseOptions> },
  now: Date,
): Promise<Outcome<ConformityRecordDetail>> {
  const row = await findSheet(trx, ws.workspaceId, sheetId);
  if (!row) return noSheet();
  const { measured, options } = read;
  const sheet = toSheet(row);
  const report = checkConformity(sheet, measured.map((m) => ({ label: m.label, peaks: m.peaks })));
  const id = randomUUID();
  const { content } = files;
  await insertDynoCheck(trx, {
    id,
    sheet_id: sheetId,
    filename: files.filenames.join(', '),
    content,
    bytes: typeof content === 'string' ? Buffer.byteLength(content) : content.byteLength,
    result: JSON.stringify({ report, measured, sheetStatus: sheet.status, options: DynoParseOptions.parse(options) }),
    uploaded_by: actor.id,
    created_at: now.toISOString(),
  });
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'target_sheet.checked',
    entityType: 'target_sheet',
    entityId: sheetId,
    summary: `${actor.name} checked ${measured.length} damper${measured.length === 1 ? '' : 's'} against ${sheet.number}: ${report.passed} passed, ${report.failed} failed.`,
    at: now,
  });
  const stored = await findDynoCheck(trx, sheetId, id);
  if (!stored) throw new Error(`dyno check ${id} vanished inside its own transaction`);
  return ok(toRecord(stored));
}
