import type { Request, Response } from 'express';
import type { Me } from '../../shared/schemas/account.ts';
import { setSessionCookie } from '../auth/session.ts';
import type { AppDeps } from '../deps.ts';
import { loadMe, type SessionStart } from './accounts.service.ts';

/** Sets the session cookie for `who` and answers with their `Me`. */
export async function startSession(deps: AppDeps, req: Request, res: Response, who: SessionStart, status = 200): Promise<void> {
  await setSessionCookie(req, res, deps.secret, { userId: who.id, sessionVersion: who.session_version }, deps.clock());
  const me: Me = await loadMe(deps.db, who.id);
  res.status(status).json(me);
}
