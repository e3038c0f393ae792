import {
  type ConformityChecksResponse,
  type ConformityRecordDetail,
  CreateTargetSheetInput,
  DYNO_CHECK_MAX_FILES,
  DynoCheckFields,
  ReleaseTargetSheetInput,
  ReturnTargetSheetInput,
  SupersedeTargetSheetInput,
  TargetSheetContent,
  type TargetSheetDetail,
  type TargetSheetsResponse,
  type TargetSheetStatus,
  type TargetSheetTransitionResult,
} from '../../shared/schemas/target-sheet.ts';
import { DYNO_MAX_BYTES } from '../../shared/schemas/dyno-file.ts';
import type { Request } from 'express';
import { pathParam, userOf, workspaceOf } from '../auth/request-context.ts';
import type { AppDeps } from '../deps.ts';
import { unwrap } from '../core/errors.ts';
import { textUploads, uploadedTextsBytes, withinUploadQuota } from '../uploads/index.ts';
import { listSheetChecks, runSheetCheck, sheetCheckCsv } from './checks.service.ts';
import { createTargetSheet, deleteTargetSheet, getTargetSheet, listTargetSheets, moveTargetSheet, saveTargetSheet, supersedeTargetSheet, targetSheetCsv } from './target-sheets.service.ts';
import type { RouteDef, RouteModule } from '../http/registry.ts';

const base = '/api/workspaces/:workspaceId/target-sheets';
const one = `${base}/:sheetId`;

/**
 * One route per life-cycle step, each declared with the least role that may take it: submit and
 * reopen engineer, release and return lead. The service checks the move again against the
 * sheet's status (shared/target-sheet/lifecycle.ts).
 */
function step(deps: AppDeps, name: 'submit' | 'release' | 'return' | 'reopen', to: TargetSheetStatus, access: 'engineer' | 'lead'): RouteDef {
  return {
    method: 'post',
    path: `${one}/${name}`,
    access,
    handler: async (req, res) => {
      const reason = name === 'return' ? ReturnTargetSheetInput.parse(req.body).reason : undefined;
      const comment = name === 'release' ? ReleaseTargetSheetInput.parse(req.body ?? {}).comment : undefined;
      const body: TargetSheetTransitionResult = unwrap(await moveTargetSheet(deps, workspaceOf(req), userOf(req), pathParam(req, 'sheetId'), to, reason, comment));
      res.json(body);
    },
  };
}

const sheetId = (req: Request) => pathParam(req, 'sheetId');

export const targetSheetRoutes: RouteModule = (deps) => [
  {
    method: 'get',
    path: base,
    access: 'viewer',
    handler: async (req, res) => {
      const body: TargetSheetsResponse = await listTargetSheets(deps.db, workspaceOf(req));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: base,
    access: 'engineer',
    handler: async (req, res) => {
      const input = CreateTargetSheetInput.parse(req.body);
      const body: TargetSheetDetail = unwrap(await createTargetSheet(deps, workspaceOf(req), userOf(req), input));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: one,
    access: 'viewer',
    handler: async (req, res) => {
      const body: TargetSheetDetail = unwrap(await getTargetSheet(deps.db, workspaceOf(req), sheetId(req)));
      res.json(body);
    },
  },
  {
    method: 'put',
    path: one,
    access: 'engineer',
    handler: async (req, res) => {
      const content = TargetSheetContent.parse(req.body);
      const body: TargetSheetDetail = unwrap(await saveTargetSheet(deps, workspaceOf(req), userOf(req), sheetId(req), content));
      res.json(body);
    },
  },
  {
    method: 'delete',
    path: one,
    access: 'engineer',
    handler: async (req, res) => {
      unwrap(await deleteTargetSheet(deps, workspaceOf(req), userOf(req), sheetId(req)));
      res.status(204).end();
    },
  },
  step(deps, 'submit', 'in_review', 'engineer'),
  step(deps, 'release', 'released', 'lead'),
  step(deps, 'return', 'returned', 'lead'),
  step(deps, 'reopen', 'draft', 'engineer'),
  {
    method: 'post',
    path: `${one}/supersede`,
    access: 'engineer',
    handler: async (req, res) => {
      const input = SupersedeTargetSheetInput.parse(req.body ?? {});
      const body: TargetSheetDetail = unwrap(await supersedeTargetSheet(deps, workspaceOf(req), userOf(req), sheetId(req), input));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${one}/csv`,
    access: 'viewer',
    handler: async (req, res) => {
      const file = unwrap(await targetSheetCsv(deps.db, workspaceOf(req), sheetId(req)));
      res.attachment(file.fileName);
      res.type('text/csv').send(file.csv);
    },
  },
  {
    method: 'get',
    path: `${one}/checks`,
    access: 'viewer',
    handler: async (req, res) => {
      const body: ConformityChecksResponse = unwrap(await listSheetChecks(deps.db, workspaceOf(req), sheetId(req)));
      res.json(body);
    },
  },
  {
    method: 'post',
    path: `${one}/checks`,
    access: 'engineer',
    heavy: true,
    before: [textUploads(DYNO_MAX_BYTES, DYNO_CHECK_MAX_FILES), withinUploadQuota(deps)],
    handler: async (req, res) => {
      const fields = DynoCheckFields.parse(req.body ?? {});
      const files = uploadedTextsBytes(req.files);
      const body: ConformityRecordDetail = unwrap(await runSheetCheck(deps.db, workspaceOf(req), userOf(req), sheetId(req), files, fields, deps.clock()));
      res.status(201).json(body);
    },
  },
  {
    method: 'get',
    path: `${one}/checks/:checkId/csv`,
    access: 'viewer',
    handler: async (req, res) => {
      const file = unwrap(await sheetCheckCsv(deps.db, workspaceOf(req), sheetId(req), pathParam(req, 'checkId')));
      res.attachment(file.fileName);
      res.type('text/csv').send(file.csv);
    },
  },
];
