import { z } from 'zod';
import { Id, IsoDateTime } from './fields.ts';
import { Road } from './road.ts';
import { PersonRef } from './setup-record.ts';
import { Setup } from './setup.ts';
import { PublicStudyDefinition, StudyDefinition, SweepAxis } from './study.ts';
import { StudyCompromise, StudyPointResult, StudyRunOutcome, StudyTradeOff } from './study-result.ts';

/**
 * A study as the API stores and sends it. The definition and results are the shared study
 * schemas (study.ts, study-result.ts); this file adds who, when, what was run and how it ended.
 */

/** `draft`: defined, not run to the end; `complete`: every point saved; `partial`: a run was cancelled. */
export const studyStatuses = ['draft', 'complete', 'partial'] as const;
export const StudyStatus = z.enum(studyStatuses);
export type StudyStatus = z.infer<typeof StudyStatus>;

/** POST /studies */
export const CreateStudyInput = z.object({ definition: StudyDefinition });
export type CreateStudyInput = z.infer<typeof CreateStudyInput>;

/**
 * One point's runs as the browser made them (index −1: the unchanged base setup). The server
 * rebuilds the aggregated figures, objectives and feasibility from them with the shared code,
 * so what is stored never disagrees with the definition's limits and weights.
 */
export const StudyPointUpload = z.object({
  index: z.number().int().min(-1),
  runs: z.array(StudyRunOutcome).min(1).max(64),
  /** Why the swept values made no valid setup (its runs then all carry that error). */
  setupError: z.string().max(1000).optional(),
});
export type StudyPointUpload = z.infer<typeof StudyPointUpload>;

/** Runs one save may carry; a larger study saves in several requests. */
export const STUDY_RUNS_PER_SAVE = 1500;

/** POST /studies/:studyId/points — a slice of a run's points, saved as they finish. */
export const SaveStudyPointsInput = z
  .object({ points: z.array(StudyPointUpload).min(1).max(STUDY_RUNS_PER_SAVE) })
  .refine((b) => b.points.reduce((n, p) => n + p.runs.length, 0) <= STUDY_RUNS_PER_SAVE, {
    path: ['points'],
    message: `at most ${STUDY_RUNS_PER_SAVE} runs per save; send the rest in another`,
  });
export type SaveStudyPointsInput = z.infer<typeof SaveStudyPointsInput>;

/** PUT /studies/:studyId/results — the run is over: everything planned was saved, or it was cancelled. */
export const FinishStudyRunInput = z.object({
  status: z.enum(['complete', 'partial']),
  /** Wall time of the run in the browser, ms. */
  elapsedMs: z.number().nonnegative().max(1e9),
  /** Workers it ran on. */
  workers: z.number().int().min(1).max(64).optional(),
});
export type FinishStudyRunInput = z.infer<typeof FinishStudyRunInput>;

/** What the last finished run gave, computed by the server from the saved points. */
export const StudyResultsSummary = z.object({
  plannedPoints: z.number().int().nonnegative(),
  savedPoints: z.number().int().nonnegative(),
  feasiblePoints: z.number().int().nonnegative(),
  plannedRuns: z.number().int().nonnegative(),
  savedRuns: z.number().int().nonnegative(),
  elapsedMs: z.number().nonnegative(),
  workers: z.number().int().positive().nullable(),
  ranBy: PersonRef,
  ranAt: IsoDateTime,
  compromise: StudyCompromise,
  tradeOff: StudyTradeOff,
  /** The winning point by sweep index, in words; null when no point meets the limits. */
  best: z.object({ pointIndex: z.number().int().nonnegative(), label: z.string() }).nullable(),
});
export type StudyResultsSummary = z.infer<typeof StudyResultsSummary>;

/** The point a lead picked as the team's baseline. */
export const StudyBaseline = z.object({
  pointIndex: z.number().int().nonnegative(),
  /** The point in words ("damper ×1.20, spring rate 28 000 N/m"). */
  label: z.string(),
  chosenBy: PersonRef,
  chosenAt: IsoDateTime,
});
export type StudyBaseline = z.infer<typeof StudyBaseline>;

/** PUT /studies/:studyId/baseline — lead or admin; null clears it. */
export const SetStudyBaselineInput = z.object({ pointIndex: z.number().int().nonnegative().nullable() });
export type SetStudyBaselineInput = z.infer<typeof SetStudyBaselineInput>;

/**
 * GET /studies/:studyId/points/:index/draft — a point applied to the study's base revision, for
 * the corner bench to show as an unsaved draft. Nothing is stored; saving is the engineer's act.
 */
export const StudyPointDraft = z.object({
  setupId: Id,
  setupName: z.string(),
  /** The revision the study started from; the draft is that document with the point applied. */
  baseRevisionNumber: z.number().int().positive(),
  pointLabel: z.string(),
  setup: Setup,
  /** A revision message naming the study and point, for the engineer to keep or change. */
  message: z.string(),
});
export type StudyPointDraft = z.infer<typeof StudyPointDraft>;

/** The setup revision a study starts from (the setup may since have been renamed or archived). */
export const StudyBaseRef = z.object({
  setupId: Id.nullable(),
  /** null when the setup no longer exists. */
  setupName: z.string().nullable(),
  revisionNumber: z.number().int().positive(),
});
export type StudyBaseRef = z.infer<typeof StudyBaseRef>;

export const StudySummary = z.object({
  id: Id,
  name: z.string(),
  status: StudyStatus,
  base: StudyBaseRef,
  axes: z.array(SweepAxis),
  /** Road names, in the definition's order. */
  roadNames: z.array(z.string()),
  speeds: z.array(z.number()),
  plannedPoints: z.number().int().positive(),
  plannedRuns: z.number().int().positive(),
  results: StudyResultsSummary.nullable(),
  baseline: StudyBaseline.nullable(),
  createdBy: PersonRef,
  createdAt: IsoDateTime,
  updatedAt: IsoDateTime,
});
export type StudySummary = z.infer<typeof StudySummary>;

/** GET /studies — newest change first. */
export const StudiesResponse = z.object({ studies: z.array(StudySummary) });
export type StudiesResponse = z.infer<typeof StudiesResponse>;

/**
 * GET /studies/:studyId — everything to show and to run it again: the definition, the base
 * setup document and the roads exactly as they were when the study was made (so the same
 * definition gives the same results even after the library changes), and the saved points.
 */
export const StudyDetail = StudySummary.extend({
  definition: StudyDefinition,
  baseSetup: Setup,
  roads: z.array(Road),
  points: z.array(StudyPointResult),
  /** The unchanged base setup over the same roads and speeds, when it was run. */
  basePoint: StudyPointResult.nullable(),
});
export type StudyDetail = z.infer<typeof StudyDetail>;

const PublicPerson = PersonRef.pick({ name: true });

/**
 * A study as a read-only link shows it: the same figures as in the workspace, with no internal
 * id (study, setup, revision, library roads, people) — roads written out, people by name.
 */
export const PublicStudy = StudyDetail.omit({ id: true, base: true, createdBy: true, definition: true, results: true, baseline: true }).extend({
  base: StudyBaseRef.omit({ setupId: true }),
  createdBy: PublicPerson,
  definition: PublicStudyDefinition,
  results: StudyResultsSummary.omit({ ranBy: true }).extend({ ranBy: PublicPerson }).nullable(),
  baseline: StudyBaseline.omit({ chosenBy: true }).extend({ chosenBy: PublicPerson }).nullable(),
});
export type PublicStudy = z.infer<typeof PublicStudy>;

/** GET /api/shared/:token for a study: the study as its workspace sees it, read-only, without ids. */
export const SharedStudy = z.object({
  readOnly: z.literal(true),
  objectType: z.literal('study'),
  workspaceName: z.string(),
  sharedBy: z.string(),
  sharedAt: IsoDateTime,
  expiresAt: IsoDateTime.nullable(),
  study: PublicStudy,
});
export type SharedStudy = z.infer<typeof SharedStudy>;
