import type { Insertable } from 'kysely';

export interface DynoFileTable {
  id: string;
  workspace_id: string;
  setup_id: string;
  /** The revision the last applied fit produced; null until a fit is applied. */
  produced_revision_id: string | null;
  filename: string;
  bytes: number;
  /** The uploaded text exactly as received. */
  content: string;
  /** JSON of the `DynoParseOptions` the file was read with. */
  options: string;
  /** JSON of `DynoFileSummary` (shared/schemas/dyno-file.ts). */
  summary: string;
  /** JSON of the thinned `DynoLoop` of a raw record (0011); null for peak tables, or until first opened. */
  loop: string | null;
  uploaded_by: string;
  created_at: string;
}
export type NewDynoFileRow = Insertable<DynoFileTable>;
