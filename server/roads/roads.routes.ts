import { CreateRoadInput, MeasuredUploadFields, type RoadDetail, type RoadsResponse, UpdateRoadInput } from '../../shared/schemas/road-record.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { singleTextUpload, uploadedTextBytes, withinUploadQuota } from '../uploads/index.ts';
import { createRoad, deleteRoad, getRoadJson, listRoadLibrary, MEASURED_MAX_BYTES, updateRoad, uploadMeasuredRoad } from './roads.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/roads';

export const roadRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: RoadsResponse = await listRoadLibrary(deps.db, workspaceOf(req));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    heavy: true,
    handler: async (req, res) => {
      const input = CreateRoadInput.parse(req.body);
      const road: RoadDetail = unwrap(await createRoad(deps.db, workspaceOf(req), userOf(req), input, deps.clock()));
      res.status(201).json(road);
    },
  },
  {
    method: 'post',
    path: `${base}/measured`,
    access: 'engineer',
    heavy: true,
    before: [singleTextUpload(MEASURED_MAX_BYTES), withinUploadQuota(deps)],
    handler: async (req, res) => {
      const fields = MeasuredUploadFields.parse(req.body ?? {});
      const file = uploadedTextBytes(req.file);
      // RoadDetail as JSON bytes (see uploadMeasuredRoad).
      res.status(201).type('application/json').send(unwrap(await uploadMeasuredRoad(deps.db, workspaceOf(req), userOf(req), file, fields, deps.clock())));
    },
  },
  {
    method: 'get',
    path: `${base}/:roadId`,
    access: 'viewer',
    handler: async (req, res) => {
      // RoadDetail as JSON bytes with a version tag (see getRoadJson).
      const { body, etag } = unwrap(await getRoadJson(deps.db, workspaceOf(req), pathParam(req, 'roadId')));
      res.set('ETag', etag);
      if (req.fresh) res.status(304).end();
      else res.type('application/json').send(body);
    },
  },
  {
    method: 'put',
    path: `${base}/:roadId`,
    access: 'engineer',
    heavy: true,
    handler: async (req, res) => {
      const input = UpdateRoadInput.parse(req.body);
      const road: RoadDetail = unwrap(await updateRoad(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'roadId'), input, deps.clock()));
      res.json(road);
    },
  },
  {
    method: 'delete',
    path: `${base}/:roadId`,
    access: 'engineer',
    handler: async (req, res) => {
      unwrap(await deleteRoad(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'roadId'), deps.clock()));
      res.status(204).end();
    },
  },
];
