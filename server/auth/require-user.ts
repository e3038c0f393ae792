import type { RequestHandler } from 'express';
import type { AppDeps } from '../deps.ts';
import { HttpError } from '../errors.ts';
import { sessionUser } from '../services/accounts.ts';
import { readSessionToken, SESSION_COOKIE } from './session.ts';

/** Sets `req.user` when the session cookie is valid and current; never refuses the request. */
export function loadSession(deps: Pick<AppDeps, 'db' | 'secret' | 'clock'>): RequestHandler {
  return async (req, _res, next) => {
    const token: unknown = req.cookies?.[SESSION_COOKIE];
    if (typeof token === 'string' && token.length > 0) {
      const claims = await readSessionToken(deps.secret, token, deps.clock());
      if (claims) req.user = (await sessionUser(deps.db, claims.userId, claims.sessionVersion)) ?? undefined;
    }
    next();
  };
}

/** 401 unless `loadSession` found a signed-in caller. */
export const requireUser: RequestHandler = (req, _res, next) => {
  if (!req.user) throw new HttpError('unauthenticated', 'Please sign in.');
  next();
};
