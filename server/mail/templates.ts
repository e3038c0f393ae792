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

const when = (d: Date) => d.toISOString().replace('T', ' ').slice(0, 16) + ' UTC';

export function invitationMail(args: { workspaceName: string; invitedBy: string; role: Role; link: string; expiresAt: Date }): Template {
  return {
    subject: `${args.invitedBy} asks you to join "${args.workspaceName}" on Ridewright`,
    text:
      `Hello,\n\n${args.invitedBy} would like you on the "${args.workspaceName}" workspace as ${roleWords[args.role]}.\n\n` +
      `Open this link to accept (it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `If you have no Ridewright account yet, the page lets you create one.\n` +
      footer,
  };
}

export function passwordResetMail(args: { name: string; link: string; expiresAt: Date }): Template {
  return {
    subject: 'Choose a new Ridewright password',
    text:
      `Hello ${args.name},\n\nSomeone (we hope you) asked to set a new password for this address.\n\n` +
      `Open this link to choose one (it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `Your current password keeps working until a new one is saved.\n` +
      footer,
  };
}

export function addressCheckMail(args: { name: string; link: string; expiresAt: Date }): Template {
  return {
    subject: 'Confirm your address for Ridewright',
    text:
      `Hello ${args.name},\n\nA Ridewright account was made with this address. Open this link to confirm it is yours ` +
      `(it works once, until ${when(args.expiresAt)}):\n\n${args.link}\n\n` +
      `Until then the account cannot join other teams' workspaces.\n` +
      footer,
  };
}

export function signUpAgainMail(args: { name: string; signInLink: string; resetLink: string }): Template {
  return {
    subject: 'Someone tried to make a second Ridewright account with your address',
    text:
      `Hello ${args.name},\n\nSomeone (perhaps you) tried to sign up with this address, which already has an account. ` +
      `Nothing was changed.\n\nTo sign in: ${args.signInLink}\nIf you forgot your password: ${args.resetLink}\n` +
      footer,
  };
}
