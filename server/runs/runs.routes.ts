import { RunListQuery, SaveRunInput } from '../../shared/schemas/run-record.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { deleteRun, getRun, listRuns, saveRun } from './runs.service.ts';
import type { RouteModule } from '../http/registry.ts';

/** Saved runs: list (whole workspace or one setup), read one, save (engineer+), delete (engineer+). */
export const runRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId/runs',
    access: 'viewer',
    handler: async (req, res) => {
      res.json(await listRuns(deps.db, workspaceOf(req), RunListQuery.parse(req.query)));
    },
  },
  {
    method: 'post',
    path: '/api/workspaces/:workspaceId/runs',
    access: 'engineer',
    handler: async (req, res) => {
      const input = SaveRunInput.parse(req.body);
      res.status(201).json(unwrap(await saveRun(deps.db, workspaceOf(req), userOf(req), input, deps.clock())));
    },
  },
  {
    method: 'get',
    path: '/api/workspaces/:workspaceId/runs/:runId',
    access: 'viewer',
    handler: async (req, res) => {
      res.json(unwrap(await getRun(deps.db, workspaceOf(req), pathParam(req, 'runId'))));
    },
  },
  {
    method: 'delete',
    path: '/api/workspaces/:workspaceId/runs/:runId',
    access: 'engineer',
    handler: async (req, res) => {
      unwrap(await deleteRun(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'runId'), deps.clock()));
      res.status(204).end();
    },
  },
];
