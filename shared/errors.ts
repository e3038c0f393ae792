import { z } from 'zod';

/** Error codes shared by server responses and the client's ApiError. */
export const errorCodes = [
  'bad_request',
  'unauthenticated',
  'forbidden',
  'not_found',
  'conflict',
  'csrf',
  'rate_limited',
  'payload_too_large',
  'gone',
  'busy',
  'internal',
] as const;
export const ErrorCode = z.enum(errorCodes);
export type ErrorCode = z.infer<typeof ErrorCode>;

/** One field problem: `path` is the dotted field path, or `line N` for CSV input. */
export const FieldIssue = z.object({ path: z.string(), message: z.string() });
export type FieldIssue = z.infer<typeof FieldIssue>;

/** A stored thing a refusal points at, so the client can link to it (e.g. the revision a save would duplicate). */
export const ErrorSee = z.object({ kind: z.literal('setup_revision'), setupId: z.string(), number: z.number().int().positive() });
export type ErrorSee = z.infer<typeof ErrorSee>;

/** Body of every non-2xx JSON response under /api. */
export const ErrorBody = z.object({
  error: z.object({
    code: ErrorCode,
    message: z.string(),
    fields: z.array(FieldIssue).optional(),
    see: ErrorSee.optional(),
  }),
});
export type ErrorBody = z.infer<typeof ErrorBody>;

export const statusOf: Record<ErrorCode, number> = {
  bad_request: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  csrf: 403,
  rate_limited: 429,
  payload_too_large: 413,
  gone: 410,
  busy: 503,
  internal: 500,
};
