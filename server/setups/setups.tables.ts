import type { Insertable, Selectable } from 'kysely';

export type CornerColumn = 'front' | 'rear';

export interface SetupTable {
  id: string;
  workspace_id: string;
  name: string;
  vehicle_id: string | null;
  corner: CornerColumn | null;
  created_by: string;
  created_at: string;
  updated_by: string;
  updated_at: string;
  archived_at: string | null;
}
export type SetupRow = Selectable<SetupTable>;
export type NewSetupRow = Insertable<SetupTable>;

/** Immutable once inserted (a trigger refuses UPDATE). `document` is the JSON of `Setup`. */
export interface SetupRevisionTable {
  id: string;
  setup_id: string;
  number: number;
  document: string;
  message: string;
  author_id: string;
  created_at: string;
  /** Where the revision came from: 'import', 'restore:<n>', 'copy:<share link id>', 'dyno-fit:<file id>', 'study:<id>'; null for a plain save. */
  source: string | null;
}
export type NewSetupRevisionRow = Insertable<SetupRevisionTable>;
