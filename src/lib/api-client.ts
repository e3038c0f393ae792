import type { z } from 'zod';
import { ErrorBody, type ErrorCode, type ErrorSee, type FieldIssue } from '../../shared/errors.ts';

/**
 * The one way the client talks to /api. Every call names the zod schema of the body it
 * expects; a body that does not match is a bug in one of the two halves and is thrown as an
 * `ApiError` with code `internal`, never handed on as a guessed type.
 */

/** A failed API call: the shared code, the HTTP status, and field problems when the server gave them. */
export class ApiError extends Error {
  readonly code: ErrorCode;
  readonly status: number;
  readonly fields: FieldIssue[];
  /** What the refusal points at, when the server named it. */
  readonly see: ErrorSee | undefined;

  constructor(code: ErrorCode, status: number, message: string, fields: FieldIssue[] = [], see?: ErrorSee) {
    super(message);
    this.name = 'ApiError';
    this.code = code;
    this.status = status;
    this.fields = fields;
    this.see = see;
  }

  /** The message for one field path, if the server named it. */
  fieldMessage(path: string): string | undefined {
    return this.fields.find((f) => f.path === path)?.message;
  }
}

export function isApiError(value: unknown, code?: ErrorCode): value is ApiError {
  return value instanceof ApiError && (code === undefined || value.code === code);
}

const CSRF_COOKIE = 'rw_csrf';
const CSRF_HEADER = 'x-csrf-token';

function readCookie(name: string): string | undefined {
  if (typeof document === 'undefined') return undefined;
  for (const part of document.cookie.split(';')) {
    const [key, ...rest] = part.trim().split('=');
    if (key === name) return decodeURIComponent(rest.join('='));
  }
  return undefined;
}

/**
 * The token for the CSRF header. The server sets its cookie on GET /api/config and
 * /api/auth/me; a page opened straight from an e-mail link may not have called either yet.
 */
async function csrfToken(): Promise<string | undefined> {
  const existing = readCookie(CSRF_COOKIE);
  if (existing || typeof document === 'undefined') return existing;
  await fetch('/api/config', { credentials: 'same-origin' }).catch(() => undefined);
  return readCookie(CSRF_COOKIE);
}

type Query = Record<string, string | number | boolean | undefined>;

export interface RequestOptions<S extends z.ZodType | undefined> {
  /** Schema of the success body; leave out for 204 responses. */
  schema?: S;
  /** JSON-serialisable value, or FormData for uploads. */
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
}

type Result<S> = S extends z.ZodType ? z.output<S> : undefined;

function withQuery(path: string, query?: Query): string {
  if (!query) return path;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query)) if (value !== undefined) params.set(key, String(value));
  const text = params.toString();
  return text ? `${path}?${text}` : path;
}

async function errorFrom(response: Response): Promise<ApiError> {
  const text = await response.text().catch(() => '');
  try {
    const parsed = ErrorBody.safeParse(JSON.parse(text));
    if (parsed.success) {
      const { code, message, fields, see } = parsed.data.error;
      return new ApiError(code, response.status, message, fields ?? [], see);
    }
  } catch {
    // not JSON: a proxy page or a crashed server; fall through to a generic error
  }
  return new ApiError('internal', response.status, `The server answered ${response.status} without an explanation.`);
}

/** Send one request to `/api…` and parse the answer with `options.schema`. */
export async function request<S extends z.ZodType | undefined = undefined>(
  method: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE',
  path: string,
  options: RequestOptions<S> = {},
): Promise<Result<S>> {
  const headers: Record<string, string> = { accept: 'application/json' };
  let body: BodyInit | undefined;
  if (options.body instanceof FormData) body = options.body;
  else if (options.body !== undefined) {
    headers['content-type'] = 'application/json';
    body = JSON.stringify(options.body);
  }
  if (method !== 'GET') {
    const token = await csrfToken();
    if (token) headers[CSRF_HEADER] = token;
  }

  let response: Response;
  try {
    response = await fetch(withQuery(path, options.query), {
      method,
      headers,
      body,
      credentials: 'same-origin',
      signal: options.signal,
    });
  } catch (cause) {
    if (options.signal?.aborted) throw cause;
    throw new ApiError('internal', 0, 'Could not reach the Ridewright server. Check that it is running.');
  }

  if (!response.ok) throw await errorFrom(response);
  if (!options.schema) return undefined as Result<S>;

  const json: unknown = await response.json().catch(() => undefined);
  const parsed = options.schema.safeParse(json);
  if (!parsed.success) {
    const where = parsed.error.issues[0]?.path.join('.') || 'body';
    throw new ApiError('internal', response.status, `Unexpected answer from ${method} ${path} (at ${where}).`);
  }
  return parsed.data as Result<S>;
}

/** Shorthands. `api.get('/api/x', Schema)` reads; writes carry the CSRF token automatically. */
export const api = {
  get: <S extends z.ZodType>(path: string, schema: S, options: Omit<RequestOptions<S>, 'schema' | 'body'> = {}) =>
    request('GET', path, { ...options, schema }),
  post: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S) =>
    request('POST', path, { body, schema }),
  put: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S) =>
    request('PUT', path, { body, schema }),
  patch: <S extends z.ZodType | undefined = undefined>(path: string, body?: unknown, schema?: S) =>
    request('PATCH', path, { body, schema }),
  delete: <S extends z.ZodType | undefined = undefined>(path: string, schema?: S) =>
    request('DELETE', path, { schema }),
};
