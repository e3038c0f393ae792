import { ApplyDynoFitInput, type ApplyDynoFitResult, DYNO_MAX_BYTES, type DynoFileDetail, type DynoFileItem, type DynoFilesResponse, DynoUploadFields } from '../../shared/schemas/dyno-file.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { singleTextUpload, uploadedText, withinUploadQuota } from '../uploads/index.ts';
import { applyDynoFit, getDynoFile, listSetupDynoFiles, uploadDynoFile } from './dyno-files.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/setups/:setupId/dyno-files';

export const dynoFileRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: DynoFilesResponse = unwrap(await listSetupDynoFiles(deps.db, workspaceOf(req), pathParam(req, 'setupId')));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    heavy: true,
    before: [singleTextUpload(DYNO_MAX_BYTES), withinUploadQuota(deps)],
    handler: async (req, res) => {
      const fields = DynoUploadFields.parse(req.body ?? {});
      const file = uploadedText(req.file);
      const item: DynoFileItem = unwrap(await uploadDynoFile(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), file, fields, deps.clock()));
      res.status(201).json(item);
    },
  },
  {
    method: 'get',
    path: `${base}/:fileId`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: DynoFileDetail = unwrap(await getDynoFile(deps.db, workspaceOf(req), pathParam(req, 'setupId'), pathParam(req, 'fileId')));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: `${base}/:fileId/apply`,
    access: 'engineer',
    heavy: true,
    handler: async (req, res) => {
      const input = ApplyDynoFitInput.parse(req.body);
      const body: ApplyDynoFitResult = unwrap(
        await applyDynoFit(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), pathParam(req, 'fileId'), input, deps.clock()),
      );
      res.status(201).json(body);
    },
  },
];
