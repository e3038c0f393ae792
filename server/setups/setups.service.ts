import { randomUUID } from 'node:crypto';
import type { FieldIssue } from '../../shared/errors.ts';
import {
  type Corner,
  type CreateSetupInput,
  type ImportSetupQuery,
  type RestoreRevisionInput,
  type RevisionsQuery,
  type RevisionsResponse,
  type RevisionSummary,
  type SaveRevisionInput,
  type SetupDetail,
  setupFileName,
  type SetupRevision,
  type SetupsQuery,
  type SetupsResponse,
  type SetupSummary,
  type UpdateSetupInput,
} from '../../shared/schemas/setup-record.ts';
import { Setup } from '../../shared/schemas/setup.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { SetupRow } from './setups.tables.ts';
import { fieldsOf } from '../core/errors.ts';
import {
  findRevision,
  findSetup,
  findSetupSummary,
  findSlotHolder,
  insertRevision,
  insertSetup,
  latestRevisionNumber,
  listRevisionDocuments,
  listRevisions,
  listSetupSummaries,
  type RevisionRow,
  type RevisionSummaryRow,
  type SetupSummaryRow,
  updateSetupRow,
} from './setups.repository.ts';
import { findVehicle } from '../vehicles/index.ts';
import { recordAudit } from '../audit/index.ts';
import { figuresOfRevision, parseStoredSetup } from './corner-figures.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';
import { sameSetupContent } from './same-content.ts';

/** Who acts, in the shape every service here needs. */

const noSetup = () => fail('not_found', 'No such setup in this workspace.');
const noRevision = (n: number) => fail('not_found', `This setup has no revision ${n}.`);

export function toSummary(r: SetupSummaryRow): SetupSummary {
  return {
    id: r.id,
    name: r.name,
    vehicle: r.vehicle_id && r.vehicle_name !== null ? { id: r.vehicle_id, name: r.vehicle_name } : null,
    corner: r.corner,
    latestRevision: r.revision_number,
    latestMessage: r.revision_message,
    createdAt: r.created_at,
    createdBy: { id: r.created_by, name: r.created_by_name },
    changedAt: r.updated_at,
    changedBy: { id: r.updated_by, name: r.updated_by_name },
    archivedAt: r.archived_at,
    figures: figuresOfRevision(r.revision_id, r.revision_document),
  };
}

function toRevisionSummary(r: RevisionSummaryRow): RevisionSummary {
  return { id: r.id, number: r.number, message: r.message, author: { id: r.author_id, name: r.author_name }, createdAt: r.created_at, source: r.source };
}

function toRevision(r: RevisionRow): SetupRevision {
  return { ...toRevisionSummary(r), setupId: r.setup_id, document: parseStoredSetup(r.document, `of revision ${r.id}`) };
}

async function detailOf(db: Queryable, workspaceId: string, setupId: string): Promise<SetupDetail | undefined> {
  const summary = await findSetupSummary(db, workspaceId, setupId);
  if (!summary) return undefined;
  const revision = await findRevision(db, setupId, summary.revision_number);
  if (!revision) throw new Error(`setup ${setupId} lost its latest revision`);
  return { ...toSummary(summary), revision: toRevision(revision) };
}

async function mustDetail(db: Queryable, workspaceId: string, setupId: string): Promise<SetupDetail> {
  const detail = await detailOf(db, workspaceId, setupId);
  if (!detail) throw new Error(`setup ${setupId} vanished inside its own transaction`);
  return detail;
}

export async function listSetups(db: Db, ws: WorkspaceRef, query: SetupsQuery): Promise<SetupsResponse> {
  const rows = await listSetupSummaries(db, ws.workspaceId, query.archived);
  return { setups: rows.map(toSummary) };
}

export async function getSetup(db: Db, ws: WorkspaceRef, setupId: string): Promise<Outcome<SetupDetail>> {
  const detail = await detailOf(db, ws.workspaceId, setupId);
  return detail ? ok(detail) : noSetup();
}

/** A page of a setup's revisions: one more row than asked tells whether older ones remain. */
export async function getRevisions(db: Db, ws: WorkspaceRef, setupId: string, page: RevisionsQuery): Promise<Outcome<RevisionsResponse>> {
  if (!(await findSetup(db, ws.workspaceId, setupId))) return noSetup();
  const rows = await listRevisions(db, setupId, { limit: page.limit + 1, before: page.before });
  const revisions = rows.slice(0, page.limit).map(toRevisionSummary);
  return ok({ revisions, nextBefore: rows.length > page.limit ? revisions[revisions.length - 1].number : null });
}

export async function getRevision(db: Db, ws: WorkspaceRef, setupId: string, number: number): Promise<Outcome<SetupRevision>> {
  if (!(await findSetup(db, ws.workspaceId, setupId))) return noSetup();
  const row = await findRevision(db, setupId, number);
  return row ? ok(toRevision(row)) : noRevision(number);
}

/** The file a revision downloads as: exactly the `Setup` document, as `npm run sim --setup` reads it. */
export async function exportRevision(db: Db, ws: WorkspaceRef, setupId: string, number: number): Promise<Outcome<{ fileName: string; json: string }>> {
  const revision = await getRevision(db, ws, setupId, number);
  if (!revision.ok) return revision;
  const { document } = revision.value;
  return ok({ fileName: setupFileName(document.name, number), json: `${JSON.stringify(document, null, 2)}\n` });
}

const cornerWord = (c: Corner) => (c === 'front' ? 'front' : 'rear');

/**
 * Puts a setup into a vehicle's corner slot (or takes it out with `vehicleId` null), moving
 * out whichever live setup held that slot. Returns the displaced setup, if any.
 */
export async function placeInSlotInTx(
  trx: Queryable,
  setupId: string,
  vehicleId: string | null,
  corner: Corner | null,
  actor: Actor,
  at: string,
): Promise<{ id: string; name: string } | undefined> {
  let displaced: { id: string; name: string } | undefined;
  if (vehicleId && corner) {
    const holder = await findSlotHolder(trx, vehicleId, corner);
    if (holder && holder.id !== setupId) {
      await updateSetupRow(trx, holder.id, { vehicle_id: null, updated_at: at, updated_by: actor.id });
      displaced = holder;
    }
  }
  await updateSetupRow(trx, setupId, { vehicle_id: vehicleId, corner, updated_at: at, updated_by: actor.id });
  return displaced;
}

/** Checks a requested grouping: the vehicle must be in this workspace, and a grouped setup needs a corner. */
async function checkGrouping(db: Queryable, workspaceId: string, vehicleId: string | null, corner: Corner | null): Promise<FieldIssue[]> {
  const issues: FieldIssue[] = [];
  if (vehicleId) {
    if (!(await findVehicle(db, workspaceId, vehicleId))) issues.push({ path: 'vehicleId', message: 'No such vehicle in this workspace.' });
    if (!corner) issues.push({ path: 'corner', message: 'Say which corner of the vehicle this is: front or rear.' });
  }
  return issues;
}

export interface NewSetupSource {
  /** Revision source of revision 1 ('import', 'copy:<link id>'), null for a plain create. */
  source: string | null;
  /** Audit action and the words after the actor's name. */
  action: string;
  verb: string;
}

const plainCreate: NewSetupSource = { source: null, action: 'setup.created', verb: 'created setup' };

/**
 * A new setup with `document` as its revision 1, in the caller's transaction. The setup takes
 * the document's name. Other features (copies from share links) use this too.
 */
export async function insertNewSetupInTx(
  trx: Queryable,
  ws: WorkspaceRef,
  actor: Actor,
  input: { document: Setup; vehicleId?: string | null; corner?: Corner | null; message?: string },
  how: NewSetupSource,
  now: Date,
): Promise<Outcome<SetupDetail>> {
  const vehicleId = input.vehicleId ?? null;
  const corner = input.corner ?? null;
  const issues = await checkGrouping(trx, ws.workspaceId, vehicleId, corner);
  if (issues.length > 0) return fail('bad_request', 'The grouping needs attention.', issues);
  const at = now.toISOString();
  const id = randomUUID();
  await insertSetup(trx, {
    id,
    workspace_id: ws.workspaceId,
    name: input.document.name,
    vehicle_id: null,
    corner,
    created_by: actor.id,
    created_at: at,
    updated_by: actor.id,
    updated_at: at,
    archived_at: null,
  });
  await insertRevision(trx, {
    id: randomUUID(),
    setup_id: id,
    number: 1,
    document: JSON.stringify(input.document),
    message: input.message?.trim() || 'First revision',
    author_id: actor.id,
    created_at: at,
    source: how.source,
  });
  if (vehicleId) await placeInSlotInTx(trx, id, vehicleId, corner, actor, at);
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: how.action,
    entityType: 'setup',
    entityId: id,
    summary: `${actor.name} ${how.verb} "${input.document.name}".`,
    at: now,
  });
  return ok(await mustDetail(trx, ws.workspaceId, id));
}

export function createSetup(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateSetupInput, now: Date): Promise<Outcome<SetupDetail>> {
  return db.transaction().execute((trx) => insertNewSetupInTx(trx, ws, actor, { ...input, document: input.setup }, plainCreate, now));
}

/** A setup file uploaded as it is: validated with the shared schema; nothing is saved when it fails. */
export async function importSetup(db: Db, ws: WorkspaceRef, actor: Actor, file: unknown, query: ImportSetupQuery, now: Date): Promise<Outcome<SetupDetail>> {
  const parsed = Setup.safeParse(file);
  if (!parsed.success) return fail('bad_request', 'This file is not a valid setup; nothing was saved.', fieldsOf(parsed.error));
  return db
    .transaction()
    .execute((trx) =>
      insertNewSetupInTx(trx, ws, actor, { document: parsed.data, ...query, message: 'Imported from a setup file' }, { source: 'import', action: 'setup.imported', verb: 'imported setup' }, now),
    );
}

export interface NewRevision {
  document: Setup;
  message: string;
  /** See `SetupRevisionTable.source`. */
  source: string | null;
  /** The revision the draft was edited from; a newer one on the server refuses the save. */
  basedOn?: number;
}

/**
 * Adds the next revision to a setup, in the caller's transaction, with its audit entry. The
 * document carries the setup's current name (the name belongs to the setup; renaming is not a
 * revision). Older revisions are never touched. Other features (dyno fits, studies) call this.
 */
export async function addRevisionInTx(trx: Queryable, ws: WorkspaceRef, actor: Actor, setupId: string, rev: NewRevision, now: Date): Promise<Outcome<{ id: string; number: number }>> {
  const setup = await findSetup(trx, ws.workspaceId, setupId);
  if (!setup) return noSetup();
  if (setup.archived_at) return fail('conflict', 'This setup is archived; bring it back from the archive before saving to it.');
  const latest = await latestRevisionNumber(trx, setupId);
  if (rev.basedOn !== undefined && rev.basedOn !== latest) {
    return fail('conflict', `Revision ${latest} was saved after the revision ${rev.basedOn} you edited. Reload to see it, then make your change again.`);
  }
  const at = now.toISOString();
  const id = randomUUID();
  const number = latest + 1;
  const message = rev.message.trim() || `Revision ${number}`;
  await insertRevision(trx, {
    id,
    setup_id: setupId,
    number,
    document: JSON.stringify({ ...rev.document, name: setup.name }),
    message,
    author_id: actor.id,
    created_at: at,
    source: rev.source,
  });
  await updateSetupRow(trx, setupId, { updated_at: at, updated_by: actor.id });
  await recordAudit(trx, {
    workspaceId: ws.workspaceId,
    actorId: actor.id,
    action: rev.source?.startsWith('restore:') ? 'setup.restored' : 'setup.revised',
    entityType: 'setup',
    entityId: setupId,
    summary: `${actor.name} saved revision ${number} of "${setup.name}": ${message}`,
    at: now,
  });
  return ok({ id, number });
}

/** The newest revision whose document holds exactly `document` (the name aside), if any. */
async function revisionHolding(db: Queryable, setupId: string, document: Setup): Promise<number | undefined> {
  for (const row of await listRevisionDocuments(db, setupId)) {
    if (sameSetupContent(parseStoredSetup(row.document, `of revision ${row.number} of setup ${setupId}`), document)) return row.number;
  }
  return undefined;
}

/**
 * An engineer's save. Content identical to a stored revision is refused with a pointer to it: a
 * second revision of the same content would only push an unreviewed copy to "latest".
 * (Restoring an old revision is a separate, deliberate act and is not refused.)
 */
export function saveRevision(db: Db, ws: WorkspaceRef, actor: Actor, setupId: string, input: SaveRevisionInput, now: Date): Promise<Outcome<SetupDetail>> {
  return db.transaction().execute(async (trx) => {
    const setup = await findSetup(trx, ws.workspaceId, setupId);
    if (!setup) return noSetup();
    // An archived setup refuses every save (addRevisionInTx says why) before content is compared.
    const existing = setup.archived_at ? undefined : await revisionHolding(trx, setupId, input.setup);
    if (existing !== undefined) {
      return { ...fail('conflict', `Nothing to save: revision ${existing} already holds exactly these values.`), see: { kind: 'setup_revision', setupId, number: existing } };
    }
    const added = await addRevisionInTx(trx, ws, actor, setupId, { document: input.setup, message: input.message, source: null, basedOn: input.basedOn }, now);
    if (!added.ok) return added;
    return ok(await mustDetail(trx, ws.workspaceId, setupId));
  });
}

/** Revision `number`'s document saved again as the next revision; nothing is rewound or removed. */
export function restoreRevision(db: Db, ws: WorkspaceRef, actor: Actor, setupId: string, number: number, input: RestoreRevisionInput, now: Date): Promise<Outcome<SetupDetail>> {
  return db.transaction().execute(async (trx) => {
    if (!(await findSetup(trx, ws.workspaceId, setupId))) return noSetup();
    const old = await findRevision(trx, setupId, number);
    if (!old) return noRevision(number);
    const document = parseStoredSetup(old.document, `of revision ${old.id}`);
    const message = input.message?.trim() || `Restored revision ${number}`;
    const added = await addRevisionInTx(trx, ws, actor, setupId, { document, message, source: `restore:${number}` }, now);
    if (!added.ok) return added;
    return ok(await mustDetail(trx, ws.workspaceId, setupId));
  });
}

function describeGroup(vehicleName: string | null, corner: Corner | null): string {
  if (vehicleName && corner) return `the ${cornerWord(corner)} of ${vehicleName}`;
  if (corner) return `an ungrouped ${cornerWord(corner)} corner`;
  return 'no vehicle';
}

/** Rename, regroup, archive or bring back: the setup's own facts; its revisions stay as they are. */
export function updateSetup(db: Db, ws: WorkspaceRef, actor: Actor, setupId: string, input: UpdateSetupInput, now: Date): Promise<Outcome<SetupDetail>> {
  return db.transaction().execute(async (trx) => {
    const setup: SetupRow | undefined = await findSetup(trx, ws.workspaceId, setupId);
    if (!setup) return noSetup();
    const at = now.toISOString();
    const audit = (action: string, summary: string) =>
      recordAudit(trx, { workspaceId: ws.workspaceId, actorId: actor.id, action, entityType: 'setup', entityId: setupId, summary, at: now });

    if (input.name !== undefined && input.name !== setup.name) {
      await updateSetupRow(trx, setupId, { name: input.name, updated_at: at, updated_by: actor.id });
      await audit('setup.renamed', `${actor.name} renamed "${setup.name}" to "${input.name}".`);
    }
    const name = input.name ?? setup.name;

    if (input.vehicleId !== undefined || input.corner !== undefined) {
      const vehicleId = input.vehicleId !== undefined ? input.vehicleId : setup.vehicle_id;
      const corner = input.corner !== undefined ? input.corner : setup.corner;
      const issues = await checkGrouping(trx, ws.workspaceId, vehicleId, corner);
      if (issues.length > 0) return fail('bad_request', 'The grouping needs attention.', issues);
      if (vehicleId && (setup.archived_at || input.archived)) return fail('conflict', 'An archived setup cannot hold a corner of a vehicle.');
      if (vehicleId !== setup.vehicle_id || corner !== setup.corner) {
        const displaced = await placeInSlotInTx(trx, setupId, vehicleId, corner, actor, at);
        const vehicle = vehicleId ? await findVehicle(trx, ws.workspaceId, vehicleId) : undefined;
        const moved = displaced ? ` "${displaced.name}" left that slot.` : '';
        await audit('setup.regrouped', `${actor.name} made "${name}" ${describeGroup(vehicle?.name ?? null, corner)}.${moved}`);
      }
    }

    if (input.archived === true && !setup.archived_at) {
      // An archived setup leaves its vehicle, so the vehicle page never rests on a put-away corner.
      await updateSetupRow(trx, setupId, { archived_at: at, vehicle_id: null, updated_at: at, updated_by: actor.id });
      await audit('setup.archived', `${actor.name} archived "${name}".`);
    } else if (input.archived === false && setup.archived_at) {
      await updateSetupRow(trx, setupId, { archived_at: null, updated_at: at, updated_by: actor.id });
      await audit('setup.unarchived', `${actor.name} brought "${name}" back from the archive.`);
    }
    return ok(await mustDetail(trx, ws.workspaceId, setupId));
  });
}
