import type { Insertable } from 'kysely';

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
export type NewRoadRow = Insertable<RoadTable>;
