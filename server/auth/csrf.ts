import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { sendError } from '../core/errors.ts';

// Signed double-submit, bound to the session (OWASP CSRF cheat sheet, "signed double-submit
// cookie"): the readable cookie holds `nonce.mac`, where mac = HMAC(secret, nonce), so nobody
// but the server can make a valid one; the page copies it into a header, which another site
// cannot do. A session token carries the nonce of the cookie it was issued beside, so a valid
// cookie planted from another browser does not fit a victim's session. Writes from a foreign
// Origin (or Sec-Fetch-Site: cross-site) are refused before any of that. SameSite=Lax on the
// session cookie is one more layer.
export const CSRF_COOKIE = 'rw_csrf';
export const CSRF_HEADER = 'x-csrf-token';

function macOf(secret: Uint8Array, nonce: string): string {
  return createHmac('sha256', secret).update(`rw-csrf|${nonce}`).digest('base64url').slice(0, 32);
}

/** A fresh signed token: `nonce.mac`. */
export function makeCsrfToken(secret: Uint8Array): string {
  const nonce = randomBytes(18).toString('base64url');
  return `${nonce}.${macOf(secret, nonce)}`;
}

/** The nonce of a token the server signed, or null for anything else. */
export function csrfNonce(secret: Uint8Array, token: unknown): string | null {
  if (typeof token !== 'string' || token.length > 200) return null;
  const dot = token.indexOf('.');
  if (dot <= 0) return null;
  const nonce = token.slice(0, dot);
  const given = Buffer.from(token.slice(dot + 1));
  const expected = Buffer.from(macOf(secret, nonce));
  return given.length === expected.length && timingSafeEqual(given, expected) ? nonce : null;
}

/**
 * The nonce of the caller's CSRF cookie; sets a fresh signed cookie first when the request has
 * none or one the server did not sign (GET /api/config, /api/auth/me, and every new session).
 */
export function ensureCsrfCookie(req: Request, res: Response, secret: Uint8Array): string {
  const current = csrfNonce(secret, req.cookies?.[CSRF_COOKIE]);
  if (current) return current;
  const token = makeCsrfToken(secret);
  res.cookie(CSRF_COOKIE, token, { httpOnly: false, sameSite: 'lax', secure: req.secure, path: '/' });
  if (req.cookies) req.cookies[CSRF_COOKIE] = token;
  return token.slice(0, token.indexOf('.'));
}

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

function sameOrigin(req: Request, publicUrl: string): boolean {
  const origin = req.get('origin');
  if (req.get('sec-fetch-site') === 'cross-site') return false;
  if (!origin) return true; // not a browser's cross-origin write (browsers send Origin on those)
  const own = new Set([new URL(publicUrl).origin, `${req.protocol}://${req.get('host')}`]);
  return own.has(origin);
}

/**
 * Refuses a state-changing request from a foreign origin, or whose header is not the server-signed
 * cookie, or (signed in) whose cookie is not the one the session was issued beside. Runs after
 * `loadSession`, which sets `req.sessionCsrf`.
 */
export function requireCsrf(deps: { secret: Uint8Array; publicUrl: string }): RequestHandler {
  return (req, res, next) => {
    if (safeMethods.has(req.method)) return next();
    // A bearer-token request carries no cookie (loadSession refuses one beside it), and a page on
    // another site cannot add an Authorization header without a CORS grant the server never gives.
    if (req.apiToken) return next();
    if (!sameOrigin(req, deps.publicUrl)) return sendError(res, 'csrf', 'Writes are accepted only from Ridewright’s own pages.');
    const cookie: unknown = req.cookies?.[CSRF_COOKIE];
    const header = req.get(CSRF_HEADER);
    const nonce = csrfNonce(deps.secret, cookie);
    if (nonce && typeof header === 'string' && header === cookie && (!req.user || req.sessionCsrf === nonce)) return next();
    sendError(res, 'csrf', 'The form has expired; reload the page and try again.');
  };
}
