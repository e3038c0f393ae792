import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler, Response } from 'express';
import { sendError } from '../errors.ts';

// Double-submit: a readable cookie the page copies into a header. Another site can make the
// browser send the cookie but cannot read it, so it cannot set the header. SameSite=Lax on the
// session cookie is the second layer.
export const CSRF_COOKIE = 'rw_csrf';
export const CSRF_HEADER = 'x-csrf-token';

/** Sets the CSRF cookie unless the request already carries one (GET /api/config, /api/auth/me). */
export function ensureCsrfCookie(req: Request, res: Response): void {
  const current: unknown = req.cookies?.[CSRF_COOKIE];
  if (typeof current === 'string' && current.length >= 20) return;
  res.cookie(CSRF_COOKIE, randomBytes(24).toString('base64url'), {
    httpOnly: false,
    sameSite: 'lax',
    secure: req.secure,
    path: '/',
  });
}

const safeMethods = new Set(['GET', 'HEAD', 'OPTIONS']);

/** Refuses any state-changing request whose header does not match the cookie. */
export const requireCsrf: RequestHandler = (req, res, next) => {
  if (safeMethods.has(req.method)) return next();
  const cookie: unknown = req.cookies?.[CSRF_COOKIE];
  const header = req.get(CSRF_HEADER);
  if (typeof cookie === 'string' && cookie.length > 0 && typeof header === 'string') {
    const a = Buffer.from(cookie);
    const b = Buffer.from(header);
    if (a.length === b.length && timingSafeEqual(a, b)) return next();
  }
  sendError(res, 'csrf', 'The form has expired; reload the page and try again.');
};
