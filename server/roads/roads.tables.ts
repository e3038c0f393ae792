import type { Generated, Insertable } from 'kysely';

export interface RoadTable {
  id: string;
  workspace_id: string;
  name: string;
  /** JSON of `Road` (shared/schemas/road.ts). */
  definition: string;
  source: 'defined' | 'measured';
  /** `Road['kind']` of the definition, kept beside it so lists never read the document (0023). */
  kind: string;
  /** Rises by one each time the definition changes (0012); studies refer to id + version. */
  version: Generated<number>;
  /** JSON of `RoadFigures` (shared/schemas/road-record.ts). */
  summary: string;
  /** UTF-8 bytes of the stored bulk of this row, for the upload quota (0013). */
  bytes: number;
  created_by: string;
  created_at: string;
  updated_by: string;
  updated_at: string;
}
export type NewRoadRow = Insertable<RoadTable>;

/** A replaced or removed road definition that a study still refers to (0012). */
export interface RoadVersionTable {
  road_id: string;
  version: number;
  workspace_id: string;
  /** JSON of `Road`, as it was. */
  definition: string;
  /** UTF-8 bytes of `definition` (0013). */
  bytes: number;
  created_at: string;
}
