import type { Insertable, Selectable } from 'kysely';

export interface VehicleTable {
  id: string;
  workspace_id: string;
  name: string;
  notes: string;
  created_by: string;
  created_at: string;
  updated_at: string;
}
export type VehicleRow = Selectable<VehicleTable>;
export type NewVehicleRow = Insertable<VehicleTable>;
