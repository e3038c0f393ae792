import { ConfirmAddressInput, PasswordChangeInput, ResetConfirmInput, ResetRequestInput, SignInInput, SignUpInput, type MeAnswer, type SignUpAnswer } from '../../shared/schemas/account.ts';
import { userOf } from '../auth/request-context.ts';
import { clearSessionCookie, setSessionCookie } from '../auth/session.ts';
import { HttpError, unwrap } from '../core/errors.ts';
import { changePassword, confirmAddress, loadMe, resendAddressCheck, signIn, signOutEverywhere, signUp } from './accounts.service.ts';
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
      if (!deps.openSignUp) throw new HttpError('forbidden', 'Sign-up is closed on this server: ask a workspace administrator for an invitation.');
      const input = SignUpInput.parse(req.body);
      await signUp(deps, input);
      // The same answer whether or not the address had an account; the rest goes by mail.
      const body: SignUpAnswer = { email: input.email, message: `We sent a message to ${input.email}. Open the link in it to finish.` };
      res.status(202).json(body);
    },
  },
  {
    method: 'post',
    path: '/api/auth/confirm',
    access: 'public',
    rateLimited: true,
    handler: async (req, res) => {
      const { token } = ConfirmAddressInput.parse(req.body);
      const who = unwrap(await confirmAddress(deps, token));
      await startSession(deps, req, res, who);
    },
  },
  {
    method: 'post',
    path: '/api/auth/confirm/resend',
    access: 'user',
    handler: async (req, res) => {
      unwrap(await resendAddressCheck(deps, userOf(req)));
      res.status(202).end();
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
    // Public: a signed-out caller gets its signed-out state (and its CSRF cookie), not a 401.
    method: 'get',
    path: '/api/auth/me',
    access: 'public',
    issuesCsrf: true,
    handler: async (req, res) => {
      const me: MeAnswer = req.user ? await loadMe(deps.db, req.user.id) : { user: null, memberships: [] };
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
