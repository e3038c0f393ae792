import { PasswordChangeInput, ResetConfirmInput, ResetRequestInput, SignInInput, SignUpInput, type Me } from '../../shared/schemas/account.ts';
import { userOf } from '../auth/request-context.ts';
import { clearSessionCookie, setSessionCookie } from '../auth/session.ts';
import { unwrap } from '../core/errors.ts';
import { changePassword, loadMe, signIn, signOutEverywhere, signUp } from './accounts.service.ts';
import { startSession } from './session-start.ts';
import { confirmPasswordReset, requestPasswordReset } from './password-reset.service.ts';
import type { RouteModule } from '../http/registry.ts';

export const authRoutes: RouteModule = (deps) => [
  {
    method: 'post',
    path: '/api/auth/signup',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const input = SignUpInput.parse(req.body);
      const who = unwrap(await signUp(deps.db, input, deps.clock()));
      await startSession(deps, req, res, who, 201);
    },
  },
  {
    method: 'post',
    path: '/api/auth/signin',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const input = SignInInput.parse(req.body);
      const who = unwrap(await signIn(deps.db, input, deps.clock()));
      await startSession(deps, req, res, who);
    },
  },
  {
    // Public so a stale or missing session still gets its cookie cleared.
    method: 'post',
    path: '/api/auth/signout',
    access: 'public',
    handler: async (req, res) => {
      if (req.user) await signOutEverywhere(deps.db, req.user.id, deps.clock());
      clearSessionCookie(req, res);
      res.status(204).end();
    },
  },
  {
    method: 'get',
    path: '/api/auth/me',
    access: 'user',
    issuesCsrf: true,
    handler: async (req, res) => {
      const me: Me = await loadMe(deps.db, userOf(req).id);
      res.json(me);
    },
  },
  {
    method: 'post',
    path: '/api/auth/password',
    access: 'user',
    handler: async (req, res) => {
      const input = PasswordChangeInput.parse(req.body);
      const who = unwrap(await changePassword(deps.db, userOf(req), input, deps.clock()));
      await setSessionCookie(req, res, deps.secret, { userId: who.id, sessionVersion: who.session_version }, deps.clock());
      res.status(204).end();
    },
  },
  {
    method: 'post',
    path: '/api/auth/reset/request',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const input = ResetRequestInput.parse(req.body);
      // The mail goes out in the background so the answer takes as long for unknown addresses.
      await requestPasswordReset(deps, input.email);
      res.status(202).end();
    },
  },
  {
    method: 'post',
    path: '/api/auth/reset/confirm',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const input = ResetConfirmInput.parse(req.body);
      unwrap(await confirmPasswordReset(deps, input.token, input.password));
      clearSessionCookie(req, res);
      res.status(204).end();
    },
  },
];
