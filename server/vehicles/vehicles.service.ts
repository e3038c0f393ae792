import { randomUUID } from 'node:crypto';
import type { FieldIssue } from '../../shared/errors.ts';
import type { Corner } from '../../shared/schemas/setup-record.ts';
import type { CornerAnalysis, CornerSlot, CreateVehicleInput, UpdateVehicleInput, VehicleDetail, VehiclesResponse, VehicleSummary } from '../../shared/schemas/vehicle.ts';
import type { Db, Queryable } from '../db/database.ts';
import type { VehicleRow } from './vehicles.tables.ts';
import { findSetup, findSlotHolder, listSetupSummariesOfVehicles, type SetupSummaryRow, updateSetupRow } from '../setups/index.ts';
import { deleteVehicleRow, findVehicle, insertVehicle, listVehicles as listVehicleRows, updateVehicleRow } from './vehicles.repository.ts';
import { recordAudit } from '../audit/index.ts';
import { analyseSetup, parseStoredSetup, placeInSlotInTx, toSummary } from '../setups/index.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';
import type { Actor, WorkspaceRef } from '../core/actor.ts';

const noVehicle = () => fail('not_found', 'No such vehicle in this workspace.');

interface Corners {
  front?: SetupSummaryRow;
  rear?: SetupSummaryRow;
}

function slot(r: SetupSummaryRow | undefined): CornerSlot | null {
  return r ? { id: r.id, name: r.name, latestRevision: r.revision_number } : null;
}

/** The corner's linear analysis; null without a setup, or when the analysis cannot resolve it (see `analyseSetup`). */
function analysis(r: SetupSummaryRow | undefined): CornerAnalysis | null {
  if (!r) return null;
  const document = parseStoredSetup(r.revision_document, `of revision ${r.revision_id}`);
  const { modal, wheelRate } = analyseSetup(document);
  return modal && { setup: toSummary(r), modal, wheelRate, sprungMass: document.sprungMass };
}

/** Rear over front body frequency (the body mode's |λ|/2π of each corner's latest revision). */
function ratioOf(front: CornerAnalysis | null, rear: CornerAnalysis | null): number | null {
  if (!front || !rear) return null;
  return rear.modal.body.naturalHz / front.modal.body.naturalHz;
}

function summaryOf(v: VehicleRow, c: Corners, ratio: number | null): VehicleSummary {
  return { id: v.id, name: v.name, notes: v.notes, createdAt: v.created_at, updatedAt: v.updated_at, front: slot(c.front), rear: slot(c.rear), bodyRatio: ratio };
}

async function cornersOf(db: Queryable, workspaceId: string, vehicleIds: string[]): Promise<Map<string, Corners>> {
  const map = new Map<string, Corners>();
  for (const r of await listSetupSummariesOfVehicles(db, workspaceId, vehicleIds)) {
    if (!r.vehicle_id || !r.corner) continue;
    const entry = map.get(r.vehicle_id) ?? {};
    entry[r.corner] = r;
    map.set(r.vehicle_id, entry);
  }
  return map;
}

export async function listVehicles(db: Db, ws: WorkspaceRef): Promise<VehiclesResponse> {
  const rows = await listVehicleRows(db, ws.workspaceId);
  const corners = await cornersOf(db, ws.workspaceId, rows.map((v) => v.id));
  return {
    vehicles: rows.map((v) => {
      const c = corners.get(v.id) ?? {};
      return summaryOf(v, c, ratioOf(analysis(c.front), analysis(c.rear)));
    }),
  };
}

async function detailOf(db: Queryable, workspaceId: string, vehicleId: string): Promise<VehicleDetail | undefined> {
  const v = await findVehicle(db, workspaceId, vehicleId);
  if (!v) return undefined;
  const c = (await cornersOf(db, workspaceId, [v.id])).get(v.id) ?? {};
  const front = analysis(c.front);
  const rear = analysis(c.rear);
  return { ...summaryOf(v, c, ratioOf(front, rear)), analysis: { front, rear } };
}

export async function getVehicle(db: Db, ws: WorkspaceRef, vehicleId: string): Promise<Outcome<VehicleDetail>> {
  const detail = await detailOf(db, ws.workspaceId, vehicleId);
  return detail ? ok(detail) : noVehicle();
}

const slotField = (corner: Corner) => (corner === 'front' ? 'frontSetupId' : 'rearSetupId');

/** Checks the setups asked for in the slots: in this workspace, live, and not both slots at once. */
async function checkSlots(db: Queryable, workspaceId: string, slots: Partial<Record<Corner, string | null>>): Promise<FieldIssue[]> {
  const issues: FieldIssue[] = [];
  for (const corner of ['front', 'rear'] as const) {
    const id = slots[corner];
    if (!id) continue;
    const setup = await findSetup(db, workspaceId, id);
    if (!setup) issues.push({ path: slotField(corner), message: 'No such setup in this workspace.' });
    else if (setup.archived_at) issues.push({ path: slotField(corner), message: `"${setup.name}" is archived; bring it back before grouping it.` });
  }
  if (slots.front && slots.front === slots.rear) issues.push({ path: 'rearSetupId', message: 'One setup cannot be both the front and the rear corner.' });
  return issues;
}

/** Fills or empties the slots given; returns words for the audit entry. */
async function applySlots(trx: Queryable, workspaceId: string, vehicleId: string, slots: Partial<Record<Corner, string | null>>, actor: Actor, at: string): Promise<string[]> {
  const words: string[] = [];
  for (const corner of ['front', 'rear'] as const) {
    const id = slots[corner];
    if (id === undefined) continue;
    const holder = await findSlotHolder(trx, vehicleId, corner);
    if (id === null) {
      if (holder) {
        await updateSetupRow(trx, holder.id, { vehicle_id: null, updated_at: at, updated_by: actor.id });
        words.push(`emptied the ${corner} slot`);
      }
    } else if (holder?.id !== id) {
      await placeInSlotInTx(trx, id, vehicleId, corner, actor, at);
      const setup = await findSetup(trx, workspaceId, id);
      words.push(`put "${setup?.name ?? id}" at the ${corner}`);
    }
  }
  return words;
}

export function createVehicle(db: Db, ws: WorkspaceRef, actor: Actor, input: CreateVehicleInput, now: Date): Promise<Outcome<VehicleDetail>> {
  return db.transaction().execute(async (trx) => {
    const slots = { front: input.frontSetupId, rear: input.rearSetupId };
    const issues = await checkSlots(trx, ws.workspaceId, slots);
    if (issues.length > 0) return fail('bad_request', 'The corners need attention.', issues);
    const at = now.toISOString();
    const id = randomUUID();
    await insertVehicle(trx, { id, workspace_id: ws.workspaceId, name: input.name, notes: input.notes, created_by: actor.id, created_at: at, updated_at: at });
    const words = await applySlots(trx, ws.workspaceId, id, slots, actor, at);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'vehicle.created',
      entityType: 'vehicle',
      entityId: id,
      summary: `${actor.name} created vehicle "${input.name}"${words.length ? ` and ${words.join(', ')}` : ''}.`,
      at: now,
    });
    const detail = await detailOf(trx, ws.workspaceId, id);
    if (!detail) throw new Error(`vehicle ${id} vanished inside its own transaction`);
    return ok(detail);
  });
}

export function updateVehicle(db: Db, ws: WorkspaceRef, actor: Actor, vehicleId: string, input: UpdateVehicleInput, now: Date): Promise<Outcome<VehicleDetail>> {
  return db.transaction().execute(async (trx) => {
    const v = await findVehicle(trx, ws.workspaceId, vehicleId);
    if (!v) return noVehicle();
    const slots = { front: input.frontSetupId, rear: input.rearSetupId };
    const issues = await checkSlots(trx, ws.workspaceId, slots);
    if (issues.length > 0) return fail('bad_request', 'The corners need attention.', issues);
    const at = now.toISOString();
    const words: string[] = [];
    if (input.name !== undefined && input.name !== v.name) words.push(`renamed it to "${input.name}"`);
    if (input.notes !== undefined && input.notes !== v.notes) words.push('changed its notes');
    await updateVehicleRow(trx, vehicleId, { name: input.name ?? v.name, notes: input.notes ?? v.notes, updated_at: at });
    words.push(...(await applySlots(trx, ws.workspaceId, vehicleId, slots, actor, at)));
    if (words.length > 0) {
      await recordAudit(trx, {
        workspaceId: ws.workspaceId,
        actorId: actor.id,
        action: 'vehicle.updated',
        entityType: 'vehicle',
        entityId: vehicleId,
        summary: `${actor.name} changed vehicle "${v.name}": ${words.join(', ')}.`,
        at: now,
      });
    }
    const detail = await detailOf(trx, ws.workspaceId, vehicleId);
    if (!detail) throw new Error(`vehicle ${vehicleId} vanished inside its own transaction`);
    return ok(detail);
  });
}

/** Removes the vehicle; its setups stay, ungrouped. */
export function deleteVehicle(db: Db, ws: WorkspaceRef, actor: Actor, vehicleId: string, now: Date): Promise<Outcome<void>> {
  return db.transaction().execute(async (trx) => {
    const v = await findVehicle(trx, ws.workspaceId, vehicleId);
    if (!v) return noVehicle();
    await deleteVehicleRow(trx, vehicleId);
    await recordAudit(trx, {
      workspaceId: ws.workspaceId,
      actorId: actor.id,
      action: 'vehicle.deleted',
      entityType: 'vehicle',
      entityId: vehicleId,
      summary: `${actor.name} removed vehicle "${v.name}"; its setups are kept, ungrouped.`,
      at: now,
    });
    return ok(undefined);
  });
}
