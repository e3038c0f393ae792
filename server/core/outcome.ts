import type { ErrorCode, ErrorSee, FieldIssue } from '../../shared/errors.ts';

/**
 * Expected failures (wrong password, last admin, used token) come back from services as values;
 * routes turn them into responses with `unwrap` from server/core/errors.ts.
 */
export interface Failure {
  ok: false;
  code: ErrorCode;
  message: string;
  fields?: FieldIssue[];
  /** For `rate_limited`: seconds until the caller may try again (sent as `Retry-After`). */
  retryAfterSeconds?: number;
  /** What the refusal points at (sent as `error.see`). */
  see?: ErrorSee;
}
export type Outcome<T> = { ok: true; value: T } | Failure;

export const ok = <T>(value: T): Outcome<T> => ({ ok: true, value });
export const fail = (code: ErrorCode, message: string, fields?: FieldIssue[]): Failure => ({ ok: false, code, message, ...(fields ? { fields } : {}) });
