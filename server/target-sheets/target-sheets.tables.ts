import type { Insertable, Updateable } from 'kysely';

export type SheetStatusColumn = 'draft' | 'in_review' | 'released' | 'returned';

/** A damper target sheet (migrations/0006_target_sheets.ts). */
export interface TargetSheetTable {
  id: string;
  workspace_id: string;
  /** `TS-<code>-<year>-<sequence>`, unique per workspace. */
  number: string;
  setup_id: string;
  revision_number: number;
  /** JSON of `TargetSheetContent`. */
  document: string;
  status: SheetStatusColumn;
  return_reason: string | null;
  author_id: string;
  submitted_at: string | null;
  /** The lead or admin who released or returned it last. */
  decided_by: string | null;
  decided_at: string | null;
  released_at: string | null;
  /** The releasing lead's comment (migrations/0014_one_released_sheet.ts). */
  release_comment: string | null;
  supersedes_id: string | null;
  superseded_by_id: string | null;
  created_at: string;
  updated_at: string;
}
export type NewTargetSheetRow = Insertable<TargetSheetTable>;
export type TargetSheetPatch = Updateable<TargetSheetTable>;

/** One change of a sheet's status; `from_status` is null for the creation. */
export interface TargetSheetEventTable {
  id: string;
  sheet_id: string;
  from_status: SheetStatusColumn | null;
  to_status: SheetStatusColumn;
  actor_id: string;
  reason: string | null;
  at: string;
}

/** One conformity upload: every measured damper of it checked against the sheet. */
export interface DynoCheckTable {
  id: string;
  sheet_id: string;
  /** File names of the upload, comma-separated (for lists). */
  filename: string;
  /** JSON list of `{ label, filename, text }`: the files as uploaded. */
  content: string;
  /** JSON `{ report, measured, sheetStatus, options }`. */
  result: string;
  /** UTF-8 bytes of the stored bulk of this row, for the upload quota (0013). */
  bytes: number;
  uploaded_by: string;
  created_at: string;
}
export type NewDynoCheckRow = Insertable<DynoCheckTable>;
