import type { Insertable } from 'kysely';

/** A saved run (migrations/0004_runs.ts). JSON columns hold the shared schemas' JSON. */
export interface RunTable {
  id: string;
  workspace_id: string;
  setup_id: string;
  revision_id: string;
  road_id: string | null;
  name: string;
  /** JSON of `Road`. */
  road: string;
  speed: number;
  duration: number;
  seed: number | null;
  /** JSON of `RunRequest` (setup document included). */
  request: string;
  /** JSON of `Metrics`. */
  metrics: string;
  /** JSON of `ModalResult`. */
  modal: string;
  /** JSON of the rest of `RunResult` (without metrics and modal). */
  result: string;
  /** JSON `{ method, fullLength, length }` of the traces blob. */
  trace_info: string;
  /** Float32 little-endian columns (see shared/runs/float-codec.ts), as better-sqlite3 returns blobs. */
  traces: Buffer;
  spectra_length: number | null;
  spectra: Buffer | null;
  created_by: string;
  created_at: string;
}
export type NewRunRow = Insertable<RunTable>;
