import type { Insertable } from 'kysely';

/**
 * `running`: chunks are on the queue; `finishing`: every unit is written and the summary is being
 * made; then `complete`, `cancelled` (what finished is kept) or `failed` (`error` says why).
 */
export type FleetRunStateColumn = 'running' | 'finishing' | 'complete' | 'cancelled' | 'failed';

/** A study run on the team's workers (migrations/0019_fleet_runs.ts). A unit is a point, or the base setup's runs. */
export interface StudyFleetRunTable {
  study_id: string;
  workspace_id: string;
  /** Counts the starts of this study on the workers; chunks of an earlier start are skipped. */
  generation: number;
  state: FleetRunStateColumn;
  /** Units per chunk. */
  chunk_units: number;
  chunks: number;
  units_total: number;
  /** Units stored, those of earlier starts included. */
  units_done: number;
  runs_total: number;
  runs_done: number;
  /** `runs_done` when this start began, for the rate. */
  runs_at_start: number;
  error: string | null;
  started_by: string;
  started_at: string;
  updated_at: string;
  finished_at: string | null;
}
export type NewFleetRunRow = Insertable<StudyFleetRunTable>;
