import type { CookieOptions, Request, Response } from 'express';
import { jwtVerify, SignJWT } from 'jose';
import { ensureCsrfCookie } from './csrf.ts';

export const SESSION_COOKIE = 'rw_session';
/** How long a session lasts without signing in again. */
export const SESSION_SECONDS = 7 * 24 * 3600;

export interface SessionClaims {
  userId: string;
  /** The user's session_version when the token was issued. */
  sessionVersion: number;
  /** Nonce of the CSRF cookie the session was issued beside (server/auth/csrf.ts). */
  csrf?: string;
}

export async function issueSessionToken(secret: Uint8Array, claims: SessionClaims, now: Date): Promise<string> {
  const iat = Math.floor(now.getTime() / 1000);
  return new SignJWT({ sv: claims.sessionVersion, ...(claims.csrf ? { cn: claims.csrf } : {}) })
    .setProtectedHeader({ alg: 'HS256' })
    .setSubject(claims.userId)
    .setIssuedAt(iat)
    .setExpirationTime(iat + SESSION_SECONDS)
    .sign(secret);
}

/** The claims of a valid, unexpired token and when it expires (ms since the epoch), or null for anything else. */
export async function readSessionToken(secret: Uint8Array, token: string, now: Date): Promise<(SessionClaims & { expiresAt: number }) | null> {
  try {
    const { payload } = await jwtVerify(token, secret, { algorithms: ['HS256'], currentDate: now, requiredClaims: ['exp'] });
    if (typeof payload.sub !== 'string' || typeof payload.sv !== 'number' || typeof payload.exp !== 'number') return null;
    return { userId: payload.sub, sessionVersion: payload.sv, expiresAt: payload.exp * 1000, ...(typeof payload.cn === 'string' ? { csrf: payload.cn } : {}) };
  } catch {
    return null;
  }
}

/** `req.secure` honours `trust proxy`, so the cookie is Secure behind an HTTPS proxy too. */
function cookieOptions(req: Request): CookieOptions {
  return { httpOnly: true, sameSite: 'lax', secure: req.secure, path: '/' };
}

/** Starts a session bound to the caller's CSRF cookie (made now if the caller has none). */
export async function setSessionCookie(req: Request, res: Response, secret: Uint8Array, claims: Omit<SessionClaims, 'csrf'>, now: Date): Promise<void> {
  const csrf = ensureCsrfCookie(req, res, secret);
  const token = await issueSessionToken(secret, { ...claims, csrf }, now);
  res.cookie(SESSION_COOKIE, token, { ...cookieOptions(req), maxAge: SESSION_SECONDS * 1000 });
}

export function clearSessionCookie(req: Request, res: Response): void {
  res.clearCookie(SESSION_COOKIE, cookieOptions(req));
}
