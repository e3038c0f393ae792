import { ApplyDriveFitInput, type ApplyDriveFitResult, DRIVE_MAX_BYTES, type DriveDetail, type DriveItem, type DrivesResponse, DriveUploadFields } from '../../shared/schemas/drive.ts';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import { unwrap } from '../core/errors.ts';
import { singleTextUpload, uploadedText, withinUploadQuota } from '../uploads/index.ts';
import { applyDriveFit, getDrive, listSetupDrives, uploadDrive } from './drives.service.ts';
import type { RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/setups/:setupId/drives';

export const driveRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: DrivesResponse = unwrap(await listSetupDrives(deps.db, workspaceOf(req), pathParam(req, 'setupId')));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    heavy: true,
    before: [singleTextUpload(DRIVE_MAX_BYTES), withinUploadQuota(deps)],
    handler: async (req, res) => {
      const fields = DriveUploadFields.parse(req.body ?? {});
      const file = uploadedText(req.file);
      const item: DriveItem = unwrap(await uploadDrive(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), file, fields, deps.clock()));
      res.status(201).json(item);
    },
  },
  {
    method: 'get',
    path: `${base}/:driveId`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: DriveDetail = unwrap(await getDrive(deps.db, workspaceOf(req), pathParam(req, 'setupId'), pathParam(req, 'driveId')));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: `${base}/:driveId/apply`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = ApplyDriveFitInput.parse(req.body);
      const body: ApplyDriveFitResult = unwrap(await applyDriveFit(deps.db, workspaceOf(req), userOf(req), pathParam(req, 'setupId'), pathParam(req, 'driveId'), input, deps.clock()));
      res.status(201).json(body);
    },
  },
];
