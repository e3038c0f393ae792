import nodemailer, { type Transporter } from 'nodemailer';
import type { Logger } from 'pino';
import type { SmtpSettings } from '../config.ts';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** The workspace the message is about; its admins may read it in the demo outbox. Leave out for account mail. */
  workspaceId?: string;
}

/** Carries `MailMessage.workspaceId` to the local sink (server/mail/sink.ts). */
export const WORKSPACE_HEADER = 'X-Ridewright-Workspace';

/** Sends mail; never throws: a failed send is logged and reported as false. */
export interface Mailer {
  send(message: MailMessage): Promise<boolean>;
  close(): void;
}

export type MailTarget =
  /** A real SMTP server from the environment. */
  | { kind: 'smtp'; settings: SmtpSettings }
  /** The local sink (server/mail/sink.ts) on loopback. */
  | { kind: 'sink'; port: number };

export function createMailer(target: MailTarget, from: string, logger: Logger): Mailer {
  const transport: Transporter =
    target.kind === 'smtp'
      ? nodemailer.createTransport({
          host: target.settings.host,
          port: target.settings.port,
          secure: target.settings.secure,
          auth: target.settings.user ? { user: target.settings.user, pass: target.settings.pass ?? '' } : undefined,
        })
      : nodemailer.createTransport({ host: '127.0.0.1', port: target.port, secure: false, ignoreTLS: true });
  return {
    async send({ workspaceId, ...message }) {
      try {
        await transport.sendMail({ from, ...message, ...(workspaceId ? { headers: { [WORKSPACE_HEADER]: workspaceId } } : {}) });
        return true;
      } catch (err) {
        logger.error({ err, to: message.to, subject: message.subject }, 'mail not sent');
        return false;
      }
    },
    close: () => transport.close(),
  };
}
