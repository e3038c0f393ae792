import request from 'supertest';
import { ErrorBody } from '../../../shared/errors.ts';
import type { RouteDef } from '../../../server/http/registry.ts';
import type { MatrixEntry, MatrixRequest } from '../../api/helpers/route-matrix.ts';
import { anonymousHeaders, sessionHeaders } from '../../api/helpers/people.ts';
import { type Caller, type RoleWorld, userOfCaller } from '../../api/helpers/role-world.ts';
import type { FuzzApp } from './fuzz-app.ts';

/** What one fuzz case sends instead of the valid request. */
export interface Mutation {
  label: string;
  /** Path to send (already encoded); default the valid one. */
  path?: string;
  /** Appended query string, without `?`. */
  query?: string;
  /** A JSON value to send as the body (replaces the valid body). */
  json?: { value: unknown };
  /** Raw text sent with `contentType`. */
  text?: { body: string; contentType: string };
  /** Replaces the uploaded file's bytes (upload routes). */
  file?: Buffer;
  /** Extra multipart fields (upload routes), sent after the entry's own (a repeated name arrives twice). */
  fields?: Record<string, string>;
  /** Replaces the value of every field the entry sends (upload routes). */
  fieldValue?: string;
  /** Spoils the multipart structure itself (upload routes). */
  multipart?: 'no-file' | 'wrong-field' | 'two-files';
}

/** The caller who passes the route's access check, so the fuzzed input reaches the handler. */
export function fuzzCaller(route: RouteDef): Caller {
  return route.access === 'public' ? 'signedOut' : 'admin';
}

const TIMEOUT = { response: 15_000, deadline: 20_000 };

/** Sends the valid request of `entry` with `m` applied. */
export async function sendMutated(world: RoleWorld, route: RouteDef, valid: MatrixRequest, caller: Caller, m: Mutation): Promise<request.Response> {
  const user = userOfCaller(world, caller);
  const headers = user ? await sessionHeaders(world.t, user.id) : anonymousHeaders(world.t);
  const path = (m.path ?? valid.path) + (m.query ? `${valid.path.includes('?') ? '&' : '?'}${m.query}` : '');
  let r = request(world.t.url)[route.method](path).set(headers).timeout(TIMEOUT);
  if (m.text) return r.set('Content-Type', m.text.contentType).send(m.text.body);
  if (m.json) return r.set('Content-Type', 'application/json').send(JSON.stringify(m.json.value) ?? 'null');
  if (valid.customize) {
    // Keep the entry's own request but swap what it attaches or fills in.
    const attach = r.attach.bind(r);
    const field = r.field.bind(r);
    r.attach = ((name: string, file: Buffer, options?: string) => {
      const bytes = m.file ?? file;
      if (m.multipart === 'no-file') return r;
      if (m.multipart === 'wrong-field') return attach('upload', bytes, options);
      if (m.multipart === 'two-files') attach(name, bytes, options);
      return attach(name, bytes, options);
    }) as typeof r.attach;
    if (m.fieldValue !== undefined) {
      const value = m.fieldValue;
      r.field = ((name: string) => field(name, value)) as unknown as typeof r.field;
    }
    r = valid.customize(r);
    for (const [k, v] of Object.entries(m.fields ?? {})) r = r.field(k, v);
    return r;
  }
  return valid.body !== undefined ? r.send(valid.body as object) : r;
}

export interface CaseOutcome {
  status: number;
  rejected: boolean;
}

/**
 * Checks one response against the fuzz properties: no 5xx; a refusal is an `ErrorBody` whose
 * message says what is wrong; a refusal (and any GET) leaves every table as it was.
 * Throws with the case described, so fast-check can shrink and report it.
 */
export function checkResponse(route: RouteDef, m: Mutation, res: request.Response, before: string, after: () => string): CaseOutcome {
  const what = `${route.method.toUpperCase()} ${route.path} [${m.label}] → ${res.status} ${res.text.slice(0, 300)}`;
  if (res.status >= 500) throw new Error(`server error: ${what}`);
  const rejected = res.status >= 400;
  if (rejected) {
    const body = ErrorBody.safeParse(res.body);
    if (!body.success) throw new Error(`refusal without an ErrorBody: ${what}`);
    if (body.data.error.message.trim().length < 10) throw new Error(`refusal without a message that names the problem: ${what}`);
  }
  if (rejected || route.method === 'get') {
    if (after() !== before) throw new Error(`${rejected ? 'a refused request' : 'a read'} changed the database: ${what}`);
  }
  return { status: res.status, rejected };
}

/** A valid request for the route from its matrix entry, rebuilt whenever a case used it up. */
export class ValidTarget {
  private current: MatrixRequest | null = null;
  private checksum = '';
  constructor(
    private readonly app: FuzzApp,
    private readonly world: RoleWorld,
    private readonly entry: MatrixEntry,
    readonly caller: Caller,
  ) {}

  async get(): Promise<{ req: MatrixRequest; before: string }> {
    if (!this.current) {
      this.current = await this.entry.build(this.world, this.caller);
      this.checksum = this.app.checksum();
    }
    return { req: this.current, before: this.checksum };
  }

  /** After a case: a write that went through may have used the target up (deleted, accepted…). */
  settle(route: RouteDef, outcome: CaseOutcome): void {
    if (!outcome.rejected && route.method !== 'get') this.current = null;
  }
}
