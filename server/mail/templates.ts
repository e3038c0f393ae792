import type { Role } from '../../shared/schemas/workspace.ts';
import type { MailMessage } from './mailer.ts';

// Plain-text mails in the product's own words. Each template returns everything but the recipient.
type Template = Omit<MailMessage, 'to'>;

const roleWords: Record<Role, string> = {
  viewer: 'a viewer (you can read everything, change nothing)',
  engineer: 'an engineer (you can build setups, roads, runs and studies)',
  lead: 'a lead (an engineer who also approves target sheets and picks baselines)',
  admin: 'an administrator (you also manage members and roles)',
};

const footer = '\n-- \nRidewright, the ride and damping workbench.\nIf this message was not meant for you, ignore it: nothing happens until the link is used.\n';

/** Longest name a mail repeats; the schemas already cap names at 100 characters. */
const NAME_LIMIT = 100;

/**
 * A name someone else chose (a workspace, an inviter, a new account), made safe to repeat in mail:
 * control and text-direction characters dropped, whitespace folded to single spaces, cut to
 * NAME_LIMIT, and the pieces a mail reader turns into a link broken up ("evil.example" reads
 * "evil[.]example", "https://" reads "https[:]//", "a@b" reads "a[@]b"), so a name can never
 * carry a clickable link or start a line of its own. Returned in quotes so it reads as a name.
 */
export function quotedName(raw: string): string {
  const plain = raw
    .replace(/[\p{Cc}\p{Cf}\u2028\u2029]/gu, ' ')
    .replace(/\s+/g, ' ')
    .trim()
    .replace(/:\/\//g, '[:]//')
    .replace(/(?<=[\p{L}\p{N}])\.(?=[\p{L}\p{N}])/gu, '[.]')
    .replace(/(?<=[\p{L}\p{N}])@(?=[\p{L}\p{N}])/gu, '[@]')
    .replace(/"/g, "'")
    .slice(0, NAME_LIMIT)
    .trim();
  return `"${plain || '(no name)'}"`;
}

const when = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

export function invitationMail(args: { workspaceName: string; invitedBy: string; role: Role; link: string; expiresAt: Date }): Template {
  return {
    subject: `${quotedName(args.invitedBy)} asks you to join ${quotedName(args.workspaceName)} on Ridewright`,
    text:
      `Hello,\n\nA Ridewright user who calls themselves ${quotedName(args.invitedBy)} would like you on the workspace named ${quotedName(args.workspaceName)} as ${roleWords[args.role]}.\n\n` +
      `Open this link to accept (it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `If you have no Ridewright account yet, the page lets you create one.\n` +
      footer,
  };
}

export function passwordResetMail(args: { name: string; link: string; expiresAt: Date }): Template {
  return {
    subject: 'Choose a new Ridewright password',
    text:
      `Hello ${quotedName(args.name)},\n\nSomeone (we hope you) asked to set a new password for this address.\n\n` +
      `Open this link to choose one (it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `Your current password keeps working until a new one is saved.\n` +
      footer,
  };
}

export function addressCheckMail(args: { name: string; link: string; expiresAt: Date }): Template {
  return {
    subject: 'Confirm your address for Ridewright',
    text:
      `Hello ${quotedName(args.name)},\n\nA Ridewright account was made with this address. Open this link to confirm it is yours ` +
      `(it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `Until then the account cannot join other teams' workspaces.\n` +
      footer,
  };
}

export function signUpAgainMail(args: { name: string; signInLink: string; resetLink: string }): Template {
  return {
    subject: 'Someone tried to make a second Ridewright account with your address',
    text:
      `Hello ${quotedName(args.name)},\n\nSomeone (perhaps you) tried to sign up with this address, which already has an account. ` +
      `Nothing was changed.\n\nTo sign in: ${args.signInLink}\nIf you forgot your password: ${args.resetLink}\n` +
      footer,
  };
}
