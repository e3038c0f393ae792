import type { RequestHandler } from 'express';
import type { AppDeps } from '../deps.ts';
import { unwrap } from '../core/errors.ts';
import { checkUploadQuota } from './upload-quota.service.ts';

function incomingBytes(files: unknown, file: Express.Multer.File | undefined): number {
  const list = Array.isArray(files) ? (files as Express.Multer.File[]) : files && typeof files === 'object' ? Object.values(files as Record<string, Express.Multer.File[]>).flat() : [];
  return list.reduce((n, f) => n + f.size, file?.size ?? 0);
}

/**
 * Refuses an upload with 413 when the workspace's stored uploads plus this request's files would
 * pass `deps.uploadQuotaBytes`. Goes in a route's `before`, after the multer middleware (it reads
 * `req.file` / `req.files`) and after the access check (it reads `req.workspace`).
 */
export function withinUploadQuota(deps: Pick<AppDeps, 'db' | 'uploadQuotaBytes'>): RequestHandler {
  return async (req, _res, next) => {
    if (!req.workspace) throw new Error(`${req.method} ${req.path}: the upload quota needs a workspace route`);
    const bytes = incomingBytes(req.files, req.file);
    if (bytes > 0) unwrap(await checkUploadQuota(deps.db, req.workspace.workspaceId, bytes, deps.uploadQuotaBytes));
    next();
  };
}
