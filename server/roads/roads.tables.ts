import type { Insertable, Selectable } from 'kysely';

export interface RoadTable {
  id: string;
  workspace_id: string;
  name: string;
  /** JSON of `Road` (shared/schemas/road.ts). */
  definition: string;
  source: 'defined' | 'measured';
  /** JSON of `RoadFigures` (shared/schemas/road-record.ts). */
  summary: string;
  created_by: string;
  created_at: string;
  updated_by: string;
  updated_at: string;
}
export type RoadRow = Selectable<RoadTable>;
export type NewRoadRow = Insertable<RoadTable>;

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
  uploaded_by: string;
  created_at: string;
}
export type DynoFileRow = Selectable<DynoFileTable>;
export type NewDynoFileRow = Insertable<DynoFileTable>;
