import type { Request } from 'express';
import { z } from 'zod';
import {
  CreateSetupInput,
  ImportSetupQuery,
  RestoreRevisionInput,
  RevisionsQuery,
  type RevisionsResponse,
  SaveRevisionInput,
  type SetupDetail,
  type SetupRevision,
  SetupsQuery,
  type SetupsResponse,
  UpdateSetupInput,
} from '../../shared/schemas/setup-record.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { HttpError, unwrap } from '../core/errors.ts';
import { createSetup, exportRevision, getRevision, getRevisions, getSetup, importSetup, listSetups, restoreRevision, saveRevision, updateSetup } from './setups.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/setups';

/** `:number` of a revision path; anything but a positive integer names no revision. */
function revisionNumber(req: Request): number {
  const parsed = z.coerce.number().int().positive().safeParse(pathParam(req, 'number'));
  if (!parsed.success) throw new HttpError('not_found', 'No such revision.');
  return parsed.data;
}

export const setupRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: SetupsResponse = await listSetups(deps.db, workspaceOf(req), SetupsQuery.parse(req.query));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      const input = CreateSetupInput.parse(req.body);
      const body: SetupDetail = unwrap(await createSetup(deps.db, workspaceOf(req), userOf(req), input, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'post',
    path: `${base}/import`,
    access: 'engineer',
    handler: async (req, res) => {
      const query = ImportSetupQuery.parse(req.query);
      const body: SetupDetail = unwrap(await importSetup(deps.db, workspaceOf(req), userOf(req), req.body, query, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${base}/:setupId`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: SetupDetail = unwrap(await getSetup(deps.db, workspaceOf(req), pathParam(req, 'setupId')));
      res.json(body);
    },
  },
  {
    method: 'patch',
    path: `${base}/:setupId`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = UpdateSetupInput.parse(req.body);
      const body: SetupDetail = unwrap(await updateSetup(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), input, deps.clock()));
      res.json(body);
    },
  },
  {
    method: 'get',
    path: `${base}/:setupId/revisions`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: RevisionsResponse = unwrap(await getRevisions(deps.db, workspaceOf(req), pathParam(req, 'setupId'), RevisionsQuery.parse(req.query)));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: `${base}/:setupId/revisions`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = SaveRevisionInput.parse(req.body);
      const body: SetupDetail = unwrap(await saveRevision(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), input, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${base}/:setupId/revisions/:number`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: SetupRevision = unwrap(await getRevision(deps.db, workspaceOf(req), pathParam(req, 'setupId'), revisionNumber(req)));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: `${base}/:setupId/revisions/:number/restore`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = RestoreRevisionInput.parse(req.body ?? {});
      const number = revisionNumber(req);
      const body: SetupDetail = unwrap(await restoreRevision(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), number, input, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${base}/:setupId/revisions/:number/export`,
    access: 'viewer',
    handler: async (req, res) => {
      const file = unwrap(await exportRevision(deps.db, workspaceOf(req), pathParam(req, 'setupId'), revisionNumber(req)));
      res.attachment(file.fileName);
      res.type('application/json').send(file.json);
    },
  },
];
