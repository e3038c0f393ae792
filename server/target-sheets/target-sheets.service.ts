import { randomUUID } from 'node:crypto';
import {
  type CreateTargetSheetInput,
  type SupersedeTargetSheetInput,
  type TargetSheet,
  TargetSheetContent,
  type TargetSheetDetail,
  type TargetSheetsResponse,
  type TargetSheetStatus,
  type TargetSheetTransitionResult,
} from '../../shared/schemas/target-sheet.ts';
import { sheetCautions } from '../../shared/target-sheet/cautions.ts';
import { canSupersede, checkTransition, type SheetTransition } from '../../shared/target-sheet/lifecycle.ts';
import { defaultReferenceSpeeds, defaultTolerance, targetPointsFromCurve, targetSheetContentFromSetup } from '../../shared/target-sheet/reference-speeds.ts';
import { nextSheetNumber, workspaceShortCode } from '../../shared/target-sheet/sheet-number.ts';
import { targetSheetToCsv } from '../../shared/target-sheet/to-csv.ts';
import type { WorkspaceContext } from '../auth/request-context.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { AppDeps } from '../deps.ts';
import { fieldsOf } from '../core/errors.ts';
import {
  deleteSheet,
  findSheet,
  findSheetInForce,
  insertSheet,
  insertSheetEvent,
  listSheetEvents,
  listSheetNumbers,
  listSheets,
  type SheetViewRow,
  updateSheet,
} from './target-sheets.repository.ts';
import { findRevision, findSetup, latestRevisionNumber, parseStoredSetup } from '../setups/index.ts';
import { recordAudit } from '../audit/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import { mailSheetDecision, type SheetMailFacts } from './sheet-mail.service.ts';
import { workspaceSettings } from '../workspaces/index.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';

/** Sheets also need the workspace's name (mail) and the caller's role (release rules). */
type SheetWorkspace = WorkspaceRef & Pick<WorkspaceContext, 'workspaceName' | 'role'>;
export type SheetDeps = Pick<AppDeps, 'db' | 'mailer' | 'publicUrl' | 'clock'>;

const noSheet = () => fail('not_found', 'No such target sheet in this workspace.');

/**
 * A stored body read back. Bodies are validated before they are saved, so a failure here
 * means the database was edited by hand: a bug.
 */
function parseStoredContent(json: string, sheetId: string): TargetSheetContent {
  const parsed = TargetSheetContent.safeParse(JSON.parse(json));
  if (!parsed.success) throw new Error(`stored target sheet ${sheetId} no longer matches the schema: ${parsed.error.issues[0]?.message}`);
  return parsed.data;
}

export function toSheet(r: SheetViewRow): TargetSheet {
  return {
    ...parseStoredContent(r.document, r.id),
    id: r.id,
    number: r.number,
    workspaceId: r.workspace_id,
    setupId: r.setup_id,
    setupRevision: r.revision_number,
    setupName: r.setup_name,
    status: r.status,
    returnReason: r.return_reason,
    author: { id: r.author_id, name: r.author_name },
    approver: r.decided_by && r.decided_by_name !== null ? { id: r.decided_by, name: r.decided_by_name } : null,
    createdAt: r.created_at,
    updatedAt: r.updated_at,
    submittedAt: r.submitted_at,
    decidedAt: r.decided_at,
    supersedes: r.supersedes_id && r.supersedes_number !== null ? { id: r.supersedes_id, number: r.supersedes_number } : null,
    supersededBy: r.superseded_by_id && r.superseded_by_number !== null ? { id: r.superseded_by_id, number: r.superseded_by_number } : null,
    releaseComment: r.release_comment,
  };
}

async function detailOf(db: Queryable, workspaceId: string, sheetId: string): Promise<TargetSheetDetail | undefined> {
  const row = await findSheet(db, workspaceId, sheetId);
  if (!row) return undefined;
  const events = await listSheetEvents(db, sheetId);
  const inForce = row.status === 'released' ? undefined : await findSheetInForce(db, workspaceId, row.setup_id, row.id);
  return {
    sheet: toSheet(row),
    replaces: inForce ? toSheet(inForce) : null,
    history: events.map((e) => ({ from: e.from_status, to: e.to_status, by: { id: e.actor_id, name: e.actor_name }, at: e.at, reason: e.reason })),
  };
}

async function mustDetail(db: Queryable, workspaceId: string, sheetId: string): Promise<TargetSheetDetail> {
  const detail = await detailOf(db, workspaceId, sheetId);
  if (!detail) throw new Error(`target sheet ${sheetId} vanished inside its own transaction`);
  return detail;
}

export async function listTargetSheets(db: Db, ws: SheetWorkspace): Promise<TargetSheetsResponse> {
  return { sheets: (await listSheets(db, ws.workspaceId)).map(toSheet) };
}

export async function getTargetSheet(db: Db, ws: SheetWorkspace, sheetId: string): Promise<Outcome<TargetSheetDetail>> {
  const detail = await detailOf(db, ws.workspaceId, sheetId);
  return detail ? ok(detail) : noSheet();
}

async function event(db: Queryable, sheetId: string, from: TargetSheetStatus | null, to: TargetSheetStatus, actor: Actor, at: Date, reason: string | null = null) {
  await insertSheetEvent(db, { id: randomUUID(), sheet_id: sheetId, from_status: from, to_status: to, actor_id: actor.id, reason, at: at.toISOString() });
}

/** Reads one revision of a setup of this workspace; a failure names the missing piece. */
async function revisionDocument(db: Queryable, workspaceId: string, setupId: string, revision: number) {
  const setup = await findSetup(db, workspaceId, setupId);
  if (!setup) return fail('not_found', 'No such setup in this workspace.', [{ path: 'setupId', message: 'No such setup' }]);
  const row = await findRevision(db, setupId, revision);
  if (!row) return fail('not_found', `"${setup.name}" has no revision ${revision}.`, [{ path: 'revision', message: `No revision ${revision}` }]);
  return ok({ setup, document: parseStoredSetup(row.document, `of revision ${row.id}`) });
}

/** Inserts a new draft with the next number of the year; shared by create and supersede. */
async function insertDraft(
  trx: Queryable,
  ws: SheetWorkspace,
  actor: Actor,
  init: { setupId: string; revision: number; content: TargetSheetContent; supersedesId: string | null },
  now: Date,
): Promise<{ id: string; number: string }> {
  const number = nextSheetNumber(workspaceShortCode(ws.workspaceName), now.getUTCFullYear(), await listSheetNumbers(trx, ws.workspaceId));
  const id = randomUUID();
  const at = now.toISOString();
  await insertSheet(trx, {
    id,
    workspace_id: ws.workspaceId,
    number,
    setup_id: init.setupId,
    revision_number: init.revision,
    document: JSON.stringify(init.content),
    status: 'draft',
    return_reason: null,
    author_id: actor.id,
    submitted_at: null,
    decided_by: null,
    decided_at: null,
    released_at: null,
    release_comment: null,
    supersedes_id: init.supersedesId,
    superseded_by_id: null,
    created_at: at,
    updated_at: at,
  });
  await event(trx, id, null, 'draft', actor, now);
  return { id, number };
}

/**
 * A new draft whose targets are read off the damper curve of one setup revision at the chosen
 * (or default) reference speeds, with one band for every point and the damper's static gas force.
 */
export async function createTargetSheet(deps: SheetDeps, ws: SheetWorkspace, actor: Actor, input: CreateTargetSheetInput): Promise<Outcome<TargetSheetDetail>> {
  const now = deps.clock();
  return deps.db.transaction().execute((trx) => createTargetSheetInTx(trx, ws, actor, input, now));
}

/** `createTargetSheet` inside an open transaction (the demo seed runs in one). */
export async function createTargetSheetInTx(trx: Queryable, ws: SheetWorkspace, actor: Actor, input: CreateTargetSheetInput, now: Date): Promise<Outcome<TargetSheetDetail>> {
  const read = await revisionDocument(trx, ws.workspaceId, input.setupId, input.revision);
  if (!read.ok) return read;
  const tolerance = { tolPct: input.tolPct ?? defaultTolerance.tolPct, floorN: input.floorN ?? defaultTolerance.floorN };
  const content = targetSheetContentFromSetup(read.value.document, input.speeds ?? defaultReferenceSpeeds, tolerance);
  const checked = TargetSheetContent.safeParse(content);
  if (!checked.success) return fail('bad_request', 'The targets read from this revision are not a valid sheet.', fieldsOf(checked.error));
  const { id, number } = await insertDraft(trx, ws, actor, { setupId: input.setupId, revision: input.revision, content: checked.data, supersedesId: null }, now);
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'target_sheet.created',
    entityType: 'target_sheet',
    entityId: id,
    summary: `${actor.name} drafted target sheet ${number} from "${read.value.setup.name}" revision ${input.revision}.`,
    at: now,
  });
  return ok(await mustDetail(trx, ws.workspaceId, id));
}

/**
 * Saves a draft's targets, bands, gas force and notes. A returned sheet may be edited too: the
 * save reopens it as a draft. In review and released sheets refuse (409).
 */
export async function saveTargetSheet(deps: SheetDeps, ws: SheetWorkspace, actor: Actor, sheetId: string, content: TargetSheetContent): Promise<Outcome<TargetSheetDetail>> {
  const now = deps.clock();
  return deps.db.transaction().execute((trx) => saveTargetSheetInTx(trx, ws, actor, sheetId, content, now));
}

/** `saveTargetSheet` inside an open transaction. Only the body's own fields are kept. */
export async function saveTargetSheetInTx(trx: Queryable, ws: SheetWorkspace, actor: Actor, sheetId: string, content: TargetSheetContent, now: Date): Promise<Outcome<TargetSheetDetail>> {
  const row = await findSheet(trx, ws.workspaceId, sheetId);
  if (!row) return noSheet();
  if (row.status === 'released') return fail('conflict', `${row.number} is released and cannot change; draft a new sheet that supersedes it.`);
  if (row.status === 'in_review') return fail('conflict', `${row.number} is in review; a lead must send it back before it can change.`);
  const body = TargetSheetContent.parse(content);
  if (row.status === 'returned') await event(trx, sheetId, 'returned', 'draft', actor, now);
  await updateSheet(trx, sheetId, { document: JSON.stringify(body), status: 'draft', updated_at: now.toISOString() });
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: 'target_sheet.edited',
    entityType: 'target_sheet',
    entityId: sheetId,
    summary: `${actor.name} edited target sheet ${row.number}${row.status === 'returned' ? ' (reopened after it was sent back)' : ''}.`,
    at: now,
  });
  return ok(await mustDetail(trx, ws.workspaceId, sheetId));
}

const pastTense: Record<SheetTransition['action'], string> = { submit: 'submitted', release: 'released', return: 'sent back', reopen: 'reopened' };

/**
 * Moves a sheet along its life cycle (shared/target-sheet/lifecycle.ts decides what is allowed
 * for the caller's role), records the change, and e-mails: every lead on submit, the author on
 * release or return. Mail goes out after the change is saved; a failed send is logged, not undone.
 */
export async function moveTargetSheet(
  deps: SheetDeps,
  ws: SheetWorkspace,
  actor: Actor,
  sheetId: string,
  to: TargetSheetStatus,
  reason?: string,
  comment?: string,
): Promise<Outcome<TargetSheetTransitionResult>> {
  const now = deps.clock();
  const moved = await deps.db.transaction().execute((trx) => moveTargetSheetInTx(trx, ws, actor, sheetId, to, reason, now, comment));
  if (!moved.ok) return moved;
  const { action, facts, detail } = moved.value;
  const notified = await mailSheetDecision(deps, ws, actor, action, facts);
  return ok({ ...detail, notified, notice: action === 'release' ? sheetCautions.release : null });
}

/** What a status change did, for the mail that follows it. */
export interface SheetMove {
  action: SheetTransition['action'];
  facts: SheetMailFacts;
  detail: TargetSheetDetail;
}

/** True when the workspace asks for a second person and `actorId` wrote or last submitted the sheet. */
async function wantsSecondPerson(trx: Queryable, workspaceId: string, authorId: string, sheetId: string, actorId: string): Promise<boolean> {
  if (!(await workspaceSettings(trx, workspaceId)).releaseNeedsSecondPerson) return false;
  if (authorId === actorId) return true;
  const submits = (await listSheetEvents(trx, sheetId)).filter((e) => e.to_status === 'in_review');
  return submits.at(-1)?.actor_id === actorId;
}

/** `moveTargetSheet` inside an open transaction, without the mail (the demo seed sends none). */
export async function moveTargetSheetInTx(
  trx: Queryable,
  ws: SheetWorkspace,
  actor: Actor,
  sheetId: string,
  to: TargetSheetStatus,
  reason: string | undefined,
  now: Date,
  comment?: string,
): Promise<Outcome<SheetMove>> {
  const at = now.toISOString();
  const row = await findSheet(trx, ws.workspaceId, sheetId);
  if (!row) return noSheet();
  const check = checkTransition(row.status, to, ws.role, reason);
  if (!check.ok) return fail(check.code, `${row.number}: ${check.message}.`, check.code === 'bad_request' ? [{ path: 'reason', message: check.message }] : undefined);
  const { action } = check.transition;
  if (action === 'release' && (await wantsSecondPerson(trx, ws.workspaceId, row.author_id, sheetId, actor.id))) {
    return fail('forbidden', `${row.number}: this workspace asks for a second person — a lead who did not write or submit the sheet releases it.`);
  }
  const why = action === 'return' ? reason!.trim() : action === 'release' ? comment?.trim() || null : null;
  // Releasing supersedes the sheet in force for the same setup, in this same step: there is never
  // a moment with two released sheets in force (the partial unique index of migration 0014 holds it).
  const replaced = action === 'release' ? await findSheetInForce(trx, ws.workspaceId, row.setup_id, sheetId) : undefined;
  if (replaced) await updateSheet(trx, replaced.id, { superseded_by_id: sheetId });
  await updateSheet(trx, sheetId, {
    status: to,
    updated_at: at,
    ...(action === 'submit' ? { submitted_at: at } : {}),
    ...(action === 'release' ? { decided_by: actor.id, decided_at: at, released_at: at, release_comment: why, supersedes_id: replaced?.id ?? null } : {}),
    ...(action === 'return' ? { decided_by: actor.id, decided_at: at, return_reason: why } : {}),
  });
  await event(trx, sheetId, row.status, to, actor, now, why);
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: `target_sheet.${action === 'return' ? 'returned' : action === 'reopen' ? 'reopened' : action === 'submit' ? 'submitted' : 'released'}`,
    entityType: 'target_sheet',
    entityId: sheetId,
    summary: `${actor.name} ${pastTense[action]} target sheet ${row.number}${replaced ? `, superseding ${replaced.number}` : ''}${why ? `: "${why}"` : ''}.`,
    at: now,
  });
  if (replaced) {
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'target_sheet.superseded',
      entityType: 'target_sheet',
      entityId: replaced.id,
      summary: `Target sheet ${replaced.number} was superseded by ${row.number}, released by ${actor.name}.`,
      at: now,
    });
  }
  const facts: SheetMailFacts = { sheetId, number: row.number, setupName: row.setup_name, revision: row.revision_number, authorId: row.author_id, reason: why };
  return ok({ action, facts, detail: await mustDetail(trx, ws.workspaceId, sheetId) });
}

/**
 * A new draft meant to replace a released sheet, from any revision of its setup (the latest by
 * default). The released sheet stays in force, unchanged, until a replacement is released.
 */
export async function supersedeTargetSheet(deps: SheetDeps, ws: SheetWorkspace, actor: Actor, sheetId: string, input: SupersedeTargetSheetInput): Promise<Outcome<TargetSheetDetail>> {
  const now = deps.clock();
  return deps.db.transaction().execute(async (trx) => {
    const row = await findSheet(trx, ws.workspaceId, sheetId);
    if (!row) return noSheet();
    const old = toSheet(row);
    if (!canSupersede(old)) {
      return fail(
        'conflict',
        old.supersededBy ? `${old.number} is already superseded by ${old.supersededBy.number}.` : `${old.number} is not released; edit it instead of superseding it.`,
      );
    }
    let content: TargetSheetContent = { compression: old.compression, rebound: old.rebound, gasForce: old.gasForce, notes: old.notes };
    const revision = input.revision ?? (await latestRevisionNumber(trx, old.setupId));
    if (revision !== old.setupRevision) {
      const read = await revisionDocument(trx, ws.workspaceId, old.setupId, revision);
      if (!read.ok) return read;
      const reread = (pts: TargetSheet['compression'], curve: 'compression' | 'rebound') =>
        pts.map((p) => ({ ...p, force: targetPointsFromCurve(read.value.document.damper[curve], [p.velocity])[0].force }));
      content = { ...content, compression: reread(old.compression, 'compression'), rebound: reread(old.rebound, 'rebound'), gasForce: targetSheetContentFromSetup(read.value.document).gasForce };
    }
    const { id, number } = await insertDraft(trx, ws, actor, { setupId: old.setupId, revision, content, supersedesId: sheetId }, now);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'target_sheet.replacement_drafted',
      entityType: 'target_sheet',
      entityId: id,
      summary: `${actor.name} drafted target sheet ${number} from revision ${revision} to replace ${old.number} (which stays in force until ${number} is released).`,
      at: now,
    });
    return ok(await mustDetail(trx, ws.workspaceId, id));
  });
}

/**
 * Deletes a sheet that was never released (draft or returned). A replacement draft never touched
 * the sheet it was meant to replace, so nothing else changes.
 */
export async function deleteTargetSheet(deps: SheetDeps, ws: SheetWorkspace, actor: Actor, sheetId: string): Promise<Outcome<void>> {
  const now = deps.clock();
  return deps.db.transaction().execute(async (trx) => {
    const row = await findSheet(trx, ws.workspaceId, sheetId);
    if (!row) return noSheet();
    if (row.status !== 'draft' && row.status !== 'returned') {
      return fail('conflict', `${row.number} is ${row.status === 'released' ? 'released and is kept for the record' : 'in review'}; only drafts can be deleted.`);
    }
    await deleteSheet(trx, sheetId);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'target_sheet.deleted',
      entityType: 'target_sheet',
      entityId: sheetId,
      summary: `${actor.name} deleted the draft target sheet ${row.number}.`,
      at: now,
    });
    return ok(undefined);
  });
}

/** The target table as CSV (shared/target-sheet/to-csv.ts) and the file name to offer. */
export async function targetSheetCsv(db: Db, ws: SheetWorkspace, sheetId: string): Promise<Outcome<{ fileName: string; csv: string }>> {
  const row = await findSheet(db, ws.workspaceId, sheetId);
  if (!row) return noSheet();
  return ok({ fileName: `${row.number}.csv`, csv: targetSheetToCsv(toSheet(row)) });
}
