import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import { ZodError } from 'zod';
import { type ErrorBody, type ErrorCode, type ErrorSee, type FieldIssue, statusOf } from '../../shared/errors.ts';
import { redactUrl } from '../http/redact-url.ts';
import type { Failure, Outcome } from './outcome.ts';

/** An error with an HTTP status and a shared error code; thrown by routes, answered by `errorHandler`. */
export class HttpError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldIssue[],
    readonly retryAfterSeconds?: number,
    readonly see?: ErrorSee,
  ) {
    super(message);
    this.status = statusOf[code];
  }
}

/** Turns a service's failure into an HttpError, or hands back the value. */
export function unwrap<T>(outcome: Outcome<T>): T {
  if (!outcome.ok) throw httpErrorOf(outcome);
  return outcome.value;
}

export function httpErrorOf(failure: Failure): HttpError {
  return new HttpError(failure.code, failure.message, failure.fields, failure.retryAfterSeconds, failure.see);
}

export function fieldsOf(error: ZodError): FieldIssue[] {
  return error.issues.map((i) => ({ path: i.path.map(String).join('.') || '(body)', message: i.message }));
}

export function sendError(res: Parameters<RequestHandler>[1], code: ErrorCode, message: string, fields?: FieldIssue[], see?: ErrorSee): void {
  const body: ErrorBody = { error: { code, message, ...(fields ? { fields } : {}), ...(see ? { see } : {}) } };
  res.status(statusOf[code]).json(body);
}

/** body-parser errors carry `type` and `status`. */
function bodyParserCode(err: unknown): ErrorCode | undefined {
  if (typeof err !== 'object' || err === null || !('type' in err)) return undefined;
  const type = (err as { type: unknown }).type;
  if (type === 'entity.too.large') return 'payload_too_large';
  if (type === 'entity.parse.failed' || type === 'encoding.unsupported' || type === 'charset.unsupported') return 'bad_request';
  return undefined;
}

/** Other 4xx errors that Express middleware raises with `expose` (http-errors), e.g. an aborted body. */
function clientErrorCode(err: unknown): ErrorCode | undefined {
  if (typeof err !== 'object' || err === null || (err as { expose?: unknown }).expose !== true) return undefined;
  const status = Number((err as { status?: unknown }).status);
  if (!(status >= 400 && status < 500)) return undefined;
  return status === 413 ? 'payload_too_large' : 'bad_request';
}

/** The one place errors become responses. Unknown errors are logged and answered without detail. */
export function errorHandler(logger: Logger): ErrorRequestHandler {
  return (err, req, res, _next) => {
    if (res.headersSent) {
      logger.error({ err, url: redactUrl(req.originalUrl) }, 'error after response started');
      res.end();
      return;
    }
    if (err instanceof HttpError) {
      if (err.retryAfterSeconds !== undefined) res.setHeader('Retry-After', String(err.retryAfterSeconds));
      return sendError(res, err.code, err.message, err.fields, err.see);
    }
    if (err instanceof ZodError) return sendError(res, 'bad_request', 'Some fields need attention.', fieldsOf(err));
    const bpCode = bodyParserCode(err);
    if (bpCode === 'payload_too_large') return sendError(res, bpCode, 'The request body is too large.');
    if (bpCode) return sendError(res, bpCode, 'The request body is not valid JSON.');
    // The router cannot decode a path segment such as `%E0%A4%A` (found by tests/fuzz).
    if (err instanceof URIError) return sendError(res, 'bad_request', 'A part of the address is not valid percent-encoding.');
    const clientCode = clientErrorCode(err);
    if (clientCode) return sendError(res, clientCode, `The request was refused: ${String((err as Error).message).slice(0, 200)}`);
    logger.error({ err, url: redactUrl(req.originalUrl), method: req.method }, 'unhandled error');
    sendError(res, 'internal', 'Something went wrong on the server.');
  };
}
