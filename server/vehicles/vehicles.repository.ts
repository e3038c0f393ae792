import type { Queryable } from '../db/database.ts';
import type { NewVehicleRow, VehicleTable } from './vehicles.tables.ts';

export async function insertVehicle(db: Queryable, row: NewVehicleRow): Promise<void> {
  await db.insertInto('vehicle').values(row).execute();
}

export function findVehicle(db: Queryable, workspaceId: string, vehicleId: string) {
  return db.selectFrom('vehicle').selectAll().where('workspace_id', '=', workspaceId).where('id', '=', vehicleId).executeTakeFirst();
}

export function listVehicles(db: Queryable, workspaceId: string) {
  return db.selectFrom('vehicle').selectAll().where('workspace_id', '=', workspaceId).orderBy('name').orderBy('id').execute();
}

export async function updateVehicleRow(db: Queryable, vehicleId: string, patch: Partial<Pick<VehicleTable, 'name' | 'notes' | 'updated_at'>>): Promise<void> {
  await db.updateTable('vehicle').set(patch).where('id', '=', vehicleId).execute();
}

/** Deletes the vehicle; its setups stay, ungrouped (the foreign key sets their vehicle to null). */
export async function deleteVehicleRow(db: Queryable, vehicleId: string): Promise<void> {
  await db.deleteFrom('vehicle').where('id', '=', vehicleId).execute();
}
