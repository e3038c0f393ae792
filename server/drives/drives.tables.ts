import type { Insertable } from 'kysely';

export interface DriveTable {
  id: string;
  workspace_id: string;
  setup_id: string;
  /** The revision the last saved fit produced; null until a fit is saved. */
  produced_revision_id: string | null;
  filename: string;
  note: string | null;
  /** Stored size (file as received plus the signals read from it), counted in the upload quota. */
  bytes: number;
  /** The uploaded text exactly as received. */
  content: string;
  /** JSON of `DriveSummary` (shared/schemas/drive.ts). */
  summary: string;
  /** JSON of `DriveData`: SI signals on an even time grid. */
  data: string;
  uploaded_by: string;
  created_at: string;
}
export type NewDriveRow = Insertable<DriveTable>;
