import type { RequestHandler } from 'express';
import { LRUCache } from 'lru-cache';
import type { AppDeps } from '../deps.ts';
import { HttpError } from '../core/errors.ts';
import { sessionUser } from '../accounts/index.ts';
import { bearerCaller, bearerOf } from '../api-tokens/index.ts';
import { readSessionToken, SESSION_COOKIE, type SessionClaims } from './session.ts';

/** Tokens whose signature has been checked; about 300 bytes each. */
const VERIFIED_TOKENS = 5000;

/**
 * Sets `req.user` when the session cookie is valid and current; never refuses a request for its
 * cookie. A request with `Authorization: Bearer …` is a script's: the personal API token must be
 * live (else 401) and no session cookie may come with it (else 400); it sets `req.apiToken` too.
 *
 * A token's signature is checked once and its claims kept (with their expiry, checked again on
 * every use) in a bounded in-process cache: the HMAC through WebCrypto was the largest cost of a
 * read. Whether the session is still current (the user's `session_version`, bumped by sign-out
 * and password changes) is still asked of the database on every request.
 */
export function loadSession(deps: Pick<AppDeps, 'db' | 'secret' | 'clock'>): RequestHandler {
  const verified = new LRUCache<string, SessionClaims & { expiresAt: number }>({ max: VERIFIED_TOKENS });
  return async (req, _res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    const bearer = bearerOf(req);
    if (bearer !== null) {
      // One way of saying who the caller is per request: a bearer token beside a session cookie
      // could let a page's cookie lend its rights to a script or the reverse, so both is refused.
      if (token !== undefined) throw new HttpError('bad_request', 'Send either an API token or a session cookie, not both.');
      const caller = await bearerCaller(deps.db, bearer, deps.clock());
      req.user = caller.user;
      req.apiToken = caller.apiToken;
      return next();
    }
    if (typeof token === 'string' && token.length > 0) {
      const now = deps.clock();
      let claims: SessionClaims | null = null;
      const known = verified.get(token);
      if (known && known.expiresAt > now.getTime()) claims = known;
      else {
        if (known) verified.delete(token);
        const read = await readSessionToken(deps.secret, token, now);
        if (read) {
          verified.set(token, read);
          claims = read;
        }
      }
      if (claims) {
        req.user = (await sessionUser(deps.db, claims.userId, claims.sessionVersion)) ?? undefined;
        if (req.user) req.sessionCsrf = claims.csrf;
      }
    }
    next();
  };
}

/** 401 unless `loadSession` found a signed-in caller. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new HttpError('unauthenticated', 'Please sign in.');
  next();
};
