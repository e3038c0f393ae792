import { z } from 'zod';
import { CreateStudyInput, FinishStudyRunInput, SaveStudyPointsInput, SetStudyBaselineInput } from '../../shared/schemas/study-record.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { HttpError, unwrap } from '../core/errors.ts';
import { finishStudyRun, saveStudyPoints, setStudyBaseline } from './study-results.service.ts';
import { createStudy, deleteStudy, getStudyJson, listStudies, studyPointDraft } from './studies.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/studies';
const PointIndex = z.coerce.number().int().min(0);

/**
 * Studies: define (engineer+), read (viewer+), save a run's points in slices and finish the run
 * (engineer+), pick the baseline (lead+), turn a point into a setup revision (engineer+).
 * Runs themselves happen in the browser; the server checks and judges what it is sent.
 */
export const studyRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      res.json(await listStudies(deps.db, workspaceOf(req)));
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      const input = CreateStudyInput.parse(req.body);
      res.status(201).json(unwrap(await createStudy(deps.db, workspaceOf(req), userOf(req), input, deps.clock())));
    },
  },
  {
    method: 'get',
    path: `${base}/:studyId`,
    access: 'viewer',
    handler: async (req, res) => {
      // StudyDetail as JSON text (see getStudyJson).
      res.type('application/json').send(unwrap(await getStudyJson(deps.db, workspaceOf(req), pathParam(req, 'studyId'))));
    },
  },
  {
    method: 'delete',
    path: `${base}/:studyId`,
    access: 'engineer',
    handler: async (req, res) => {
      unwrap(await deleteStudy(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'studyId'), deps.clock()));
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: `${base}/:studyId/points`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = SaveStudyPointsInput.parse(req.body);
      res.json(unwrap(await saveStudyPoints(deps.db, workspaceOf(req), pathParam(req, 'studyId'), input, deps.clock())));
    },
  },
  {
    method: 'put',
    path: `${base}/:studyId/results`,
    access: 'engineer',
    heavy: true,
    handler: async (req, res) => {
      const input = FinishStudyRunInput.parse(req.body);
      res.json(unwrap(await finishStudyRun(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'studyId'), input, deps.clock())));
    },
  },
  {
    method: 'put',
    path: `${base}/:studyId/baseline`,
    access: 'lead',
    handler: async (req, res) => {
      const input = SetStudyBaselineInput.parse(req.body);
      res.json(unwrap(await setStudyBaseline(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'studyId'), input, deps.clock())));
    },
  },
  {
    method: 'get',
    path: `${base}/:studyId/points/:index/draft`,
    access: 'engineer',
    handler: async (req, res) => {
      const index = PointIndex.safeParse(pathParam(req, 'index'));
      if (!index.success) throw new HttpError('not_found', 'No such point: the index is a whole number from 0.');
      res.json(unwrap(await studyPointDraft(deps.db, workspaceOf(req), pathParam(req, 'studyId'), index.data)));
    },
  },
];
