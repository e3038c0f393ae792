import type { MeAnswer } from '../../../shared/schemas/account.ts';
import request from 'supertest';
import { CSRF_COOKIE, CSRF_HEADER } from '../../../server/auth/csrf.ts';

/** A cookie-keeping client that behaves like the browser app: it fetches /api/config for the CSRF cookie first. */
export interface BrowserLike {
  agent: InstanceType<typeof request.agent>;
  /** The CSRF value to send as `x-csrf-token`. */
  csrf: string;
  post(path: string, body?: object): request.Test;
  patch(path: string, body?: object): request.Test;
  put(path: string, body?: object): request.Test;
  del(path: string): request.Test;
  get(path: string): request.Test;
}

function cookieValue(setCookie: string[] | string | undefined, name: string): string | undefined {
  const list = Array.isArray(setCookie) ? setCookie : setCookie ? [setCookie] : [];
  for (const c of list) {
    const m = new RegExp(`^${name}=([^;]*)`).exec(c);
    if (m) return decodeURIComponent(m[1]);
  }
  return undefined;
}

export async function browserLike(url: string): Promise<BrowserLike> {
  const agent = request.agent(url);
  const res = await agent.get('/api/config').expect(200);
  const csrf = cookieValue(res.headers['set-cookie'], CSRF_COOKIE);
  if (!csrf) throw new Error('GET /api/config set no CSRF cookie');
  return {
    agent,
    csrf,
    post: (path, body) => agent.post(path).set(CSRF_HEADER, csrf).send(body ?? {}),
    patch: (path, body) => agent.patch(path).set(CSRF_HEADER, csrf).send(body ?? {}),
    put: (path, body) => agent.put(path).set(CSRF_HEADER, csrf).send(body ?? {}),
    del: (path) => agent.delete(path).set(CSRF_HEADER, csrf),
    get: (path) => agent.get(path),
  };
}

/** A browser-like client signed in with e-mail and password through the real route. */
export async function signedIn(url: string, email: string, password: string): Promise<BrowserLike> {
  const b = await browserLike(url);
  await b.post('/api/auth/signin', { email, password }).expect(200);
  return b;
}

export { cookieValue };

/** What GET /api/auth/me answers (200) to a caller who is not signed in. */
export const signedOut: MeAnswer = { user: null, memberships: [] };
