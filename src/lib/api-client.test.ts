import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { z } from 'zod';
import { ApiError, api, isApiError } from './api-client.ts';

const Thing = z.object({ id: z.string(), size: z.number() });

interface Sent {
  url: string;
  method: string;
  headers: Record<string, string>;
  body?: string;
}

let sent: Sent[];
let answers: Array<() => Response>;
const cookieJar = { cookie: '' };

function json(status: number, body: unknown): () => Response {
  return () => new Response(JSON.stringify(body), { status, headers: { 'content-type': 'application/json' } });
}

beforeEach(() => {
  sent = [];
  answers = [];
  cookieJar.cookie = '';
  vi.stubGlobal('document', cookieJar);
  vi.stubGlobal('fetch', async (url: string, init: RequestInit = {}) => {
    sent.push({ url, method: init.method ?? 'GET', headers: (init.headers ?? {}) as Record<string, string>, body: init.body as string | undefined });
    const next = answers.shift();
    if (!next) throw new TypeError('network down');
    return next();
  });
});
afterEach(() => {
  vi.unstubAllGlobals();
});

describe('api client', () => {
  it('returns the body parsed by the schema', async () => {
    answers.push(json(200, { id: 'a', size: 3, extra: true }));
    const thing = await api.get('/api/things/a', Thing);
    expect(thing).toEqual({ id: 'a', size: 3 });
  });

  it('adds query parameters and leaves out undefined ones', async () => {
    answers.push(json(200, { id: 'a', size: 3 }));
    await api.get('/api/things', Thing, { query: { limit: 50, before: undefined } });
    expect(sent[0].url).toBe('/api/things?limit=50');
  });

  it('throws ApiError with the shared code, status and field issues', async () => {
    cookieJar.cookie = 'rw_csrf=x';
    answers.push(json(400, { error: { code: 'bad_request', message: 'Check the fields', fields: [{ path: 'email', message: 'Enter a valid e-mail address' }] } }));
    const error = await api.post('/api/things', { email: 'nope' }, Thing).catch((e: unknown) => e);
    expect(isApiError(error, 'bad_request')).toBe(true);
    const apiError = error as ApiError;
    expect(apiError.status).toBe(400);
    expect(apiError.fieldMessage('email')).toBe('Enter a valid e-mail address');
  });

  it('treats a body that does not match the schema as an internal error, not data', async () => {
    answers.push(json(200, { id: 'a', size: 'big' }));
    const error = await api.get('/api/things/a', Thing).catch((e: unknown) => e);
    expect(isApiError(error, 'internal')).toBe(true);
    expect((error as ApiError).message).toMatch(/size/);
  });

  it('turns a non-JSON failure into an internal error carrying the status', async () => {
    answers.push(() => new Response('<html>Bad gateway</html>', { status: 502 }));
    const error = await api.get('/api/things/a', Thing).catch((e: unknown) => e);
    expect(isApiError(error, 'internal')).toBe(true);
    expect((error as ApiError).status).toBe(502);
  });

  it('reports an unreachable server as an ApiError with status 0', async () => {
    const error = await api.get('/api/things/a', Thing).catch((e: unknown) => e);
    expect(isApiError(error)).toBe(true);
    expect((error as ApiError).status).toBe(0);
  });

  it('sends the CSRF cookie back as a header on writes only', async () => {
    cookieJar.cookie = 'other=1; rw_csrf=tok%3Den';
    answers.push(json(200, { id: 'a', size: 1 }), () => new Response(null, { status: 204 }));
    await api.get('/api/things/a', Thing);
    await api.delete('/api/things/a');
    expect(sent[0].headers['x-csrf-token']).toBeUndefined();
    expect(sent[1].headers['x-csrf-token']).toBe('tok=en');
    expect(sent[1].method).toBe('DELETE');
  });

  it('fetches the CSRF cookie first when a write happens before any read', async () => {
    answers.push(() => {
      cookieJar.cookie = 'rw_csrf=fresh';
      return new Response('{}', { status: 200 });
    });
    answers.push(json(201, { id: 'n', size: 2 }));
    const created = await api.post('/api/things', { size: 2 }, Thing);
    expect(sent.map((s) => s.url)).toEqual(['/api/config', '/api/things']);
    expect(sent[1].headers['x-csrf-token']).toBe('fresh');
    expect(sent[1].body).toBe('{"size":2}');
    expect(created.id).toBe('n');
  });

  it('returns undefined for a 204 when no schema is given', async () => {
    cookieJar.cookie = 'rw_csrf=x';
    answers.push(() => new Response(null, { status: 204 }));
    await expect(api.post('/api/auth/signout')).resolves.toBeUndefined();
  });
});
