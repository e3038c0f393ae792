import type { Insertable, Selectable } from 'kysely';

export type StudyStatusColumn = 'draft' | 'complete' | 'partial';

/** A study (migrations/0005_studies.ts). JSON columns hold the shared schemas' JSON. */
export interface StudyTable {
  id: string;
  workspace_id: string;
  name: string;
  /** JSON of the parsed `StudyDefinition`. */
  definition: string;
  /** null once the base setup is deleted; the document below keeps the study runnable. */
  base_setup_id: string | null;
  base_revision_id: string | null;
  base_revision_number: number;
  /** JSON of the base revision's `Setup` document. */
  base_document: string;
  /** Studies saved before 0012: JSON array of copies of their `Road`s, in the definition's order; later ones: `[]`. */
  roads: string;
  /** JSON `StudyRoadRefs` (0012): per definition road, `{ roadId, version }` of a library road, or null when typed in; null on older studies. */
  road_refs: string | null;
  planned_points: number;
  /** UTF-8 bytes of the stored bulk of this row, for the upload quota (0013). */
  bytes: number;
  planned_runs: number;
  status: StudyStatusColumn;
  /** JSON of `StudyResultsSummary`; null until a run is finished. */
  results: string | null;
  baseline_point_index: number | null;
  chosen_by: string | null;
  chosen_at: string | null;
  created_by: string;
  created_at: string;
  updated_at: string;
}
export type NewStudyRow = Insertable<StudyTable>;

/** One finished point of a study; `idx` −1 is the base setup. */
export interface StudyPointTable {
  study_id: string;
  idx: number;
  /** JSON of `StudyPointValues`. */
  params: string;
  /** JSON array of `StudyRunOutcome`. */
  metrics: string;
  /** JSON of the aggregated `StudyFigures`. */
  figures: string;
  /** JSON array of the objective values (null where missing), in the definition's order. */
  objectives: string;
  feasible: number;
  /** JSON array of `StudyViolation`. */
  reasons: string;
}
export type StudyPointRow = Selectable<StudyPointTable>;
export type NewStudyPointRow = Insertable<StudyPointTable>;
