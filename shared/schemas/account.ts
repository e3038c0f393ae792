import { z } from 'zod';
import { Email, GivenPassword, Id, NewPassword, PersonName } from './fields.ts';
import { DEFAULT_UNIT_PREFERENCES, UnitPreferences } from './unit-preferences.ts';
import { Membership, WorkspaceName } from './workspace.ts';

/** POST /api/auth/signup — creates the account and a workspace it administers. */
export const SignUpInput = z.object({
  name: PersonName,
  email: Email,
  password: NewPassword,
  workspaceName: WorkspaceName,
});
export type SignUpInput = z.infer<typeof SignUpInput>;

/** The answer to POST /api/auth/signup, the same whether or not the address had an account. */
export const SignUpAnswer = z.object({ email: z.string(), message: z.string() });
export type SignUpAnswer = z.infer<typeof SignUpAnswer>;

/** POST /api/auth/confirm: the token of a mailed address-confirmation link. */
export const ConfirmAddressInput = z.object({ token: z.string().min(1).max(200) });
export type ConfirmAddressInput = z.infer<typeof ConfirmAddressInput>;

/** POST /api/auth/signin */
export const SignInInput = z.object({ email: Email, password: GivenPassword });
export type SignInInput = z.infer<typeof SignInInput>;

/** POST /api/auth/password */
export const PasswordChangeInput = z.object({ currentPassword: GivenPassword, newPassword: NewPassword });
export type PasswordChangeInput = z.infer<typeof PasswordChangeInput>;

/** POST /api/auth/reset/request */
export const ResetRequestInput = z.object({ email: Email });
export type ResetRequestInput = z.infer<typeof ResetRequestInput>;

/** POST /api/auth/reset/confirm */
export const ResetConfirmInput = z.object({ token: z.string().min(1, 'Required').max(200), password: NewPassword });
export type ResetConfirmInput = z.infer<typeof ResetConfirmInput>;

export const User = z.object({ id: Id, name: z.string(), email: z.string(), emailVerified: z.boolean() });
export type User = z.infer<typeof User>;

/** GET /api/auth/me, and the answer to sign-up, sign-in and accepting an invitation. */
export const Me = z.object({
  user: User,
  memberships: z.array(Membership),
  /** Display units; an answer without them (an older server) reads as the defaults. */
  units: UnitPreferences.default({ ...DEFAULT_UNIT_PREFERENCES }),
});
export type Me = z.infer<typeof Me>;

/**
 * GET /api/auth/me as a whole: the signed-in person, or — with 200, not 401, since being signed
 * out is an ordinary state of a page and not an error — `{ user: null, memberships: [] }`.
 */
export const MeAnswer = z.union([Me, z.object({ user: z.null(), memberships: z.array(Membership).max(0) })]);
export type MeAnswer = z.infer<typeof MeAnswer>;
