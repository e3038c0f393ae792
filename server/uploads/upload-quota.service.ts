import type { Queryable } from '../db/database.ts';
import { storedUploadBytes } from './upload-usage.repository.ts';
import { fail, ok, type Outcome } from '../core/outcome.ts';

/** Uploaded bytes one workspace may keep (dyno files, conformity checks, measured roads). */
export const WORKSPACE_UPLOAD_QUOTA_BYTES = 200 * 1024 * 1024;

const megabytes = (n: number) => `${(n / (1024 * 1024)).toFixed(1)} MB`;

/**
 * Whether `incomingBytes` more fit under `quotaBytes` for the workspace. Checked before the
 * upload is stored; two uploads racing each other may together pass the quota by at most one
 * upload's size, which is acceptable for a limit meant against runaway storage, not billing.
 */
export async function checkUploadQuota(db: Queryable, workspaceId: string, incomingBytes: number, quotaBytes: number): Promise<Outcome<{ usedBytes: number }>> {
  const usedBytes = await storedUploadBytes(db, workspaceId);
  if (usedBytes + incomingBytes <= quotaBytes) return ok({ usedBytes });
  return fail(
    'payload_too_large',
    `This workspace already keeps ${megabytes(usedBytes)} of uploads; ${megabytes(incomingBytes)} more would pass its ${megabytes(quotaBytes)} limit. ` +
      'Delete files it no longer needs; nothing was saved.',
    [{ path: 'file', message: 'workspace upload quota exceeded' }],
  );
}
