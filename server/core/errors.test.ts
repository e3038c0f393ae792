import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import express from 'express';
import pino from 'pino';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { z } from 'zod';
import { ErrorBody } from '../../shared/errors.ts';
import { errorHandler, HttpError } from './errors.ts';

// A tiny app with one route per kind of failure, answered by the real error middleware.
let server: Server;
let base = '';
const logged: unknown[] = [];

beforeAll(async () => {
  const app = express();
  app.get('/http', () => {
    throw new HttpError('conflict', 'Already there.', [{ path: 'name', message: 'Taken' }]);
  });
  app.get('/zod', () => {
    z.object({ a: z.object({ b: z.number() }) }).parse({ a: { b: 'x' } });
  });
  app.get('/bug', async () => {
    throw new Error('SELECT secret FROM table failed at /srv/app/db.ts:42');
  });
  const logger = pino({ level: 'error' }, { write: (line: string) => void logged.push(JSON.parse(line)) });
  app.use(errorHandler(logger));
  server = await new Promise((resolve) => {
    const s = app.listen(0, '127.0.0.1', () => resolve(s));
  });
  base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});
afterAll(() => new Promise<void>((resolve) => server.close(() => resolve())));

describe('error middleware', () => {
  it('answers an HttpError with its status, code, message and fields', async () => {
    const res = await fetch(`${base}/http`);
    expect(res.status).toBe(409);
    expect(ErrorBody.parse(await res.json())).toEqual({ error: { code: 'conflict', message: 'Already there.', fields: [{ path: 'name', message: 'Taken' }] } });
  });

  it('answers a zod failure with 400 and dotted field paths', async () => {
    const res = await fetch(`${base}/zod`);
    expect(res.status).toBe(400);
    const body = ErrorBody.parse(await res.json());
    expect(body.error.code).toBe('bad_request');
    expect(body.error.fields?.map((f) => f.path)).toEqual(['a.b']);
  });

  it('answers an unexpected error with a bare 500, logging the detail instead of sending it', async () => {
    const res = await fetch(`${base}/bug`);
    expect(res.status).toBe(500);
    const text = await res.text();
    expect(ErrorBody.parse(JSON.parse(text)).error.code).toBe('internal');
    expect(text).not.toContain('secret');
    expect(text).not.toContain('db.ts');
    expect(JSON.stringify(logged)).toContain('SELECT secret');
  });
});
