import { randomUUID } from 'node:crypto';
import type { AddressInfo } from 'node:net';
import { simpleParser, type AddressObject } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import type { Db } from '../db/database.ts';
import { insertOutboxMessage } from './outbox.repository.ts';
import { WORKSPACE_HEADER } from './mailer.ts';

export interface MailSink {
  port: number;
  close(): Promise<void>;
}

function addresses(a: AddressObject | AddressObject[] | undefined): string {
  if (!a) return '';
  return (Array.isArray(a) ? a : [a]).map((x) => x.text).join(', ');
}

/**
 * A local SMTP server that stores every message it receives in `outbox_message`, for the
 * outbox page in demo/development mode and for tests. Loopback only; no TLS, no auth.
 * The message is stored before the server acknowledges it, so once `sendMail` resolves the
 * row is there.
 */
export async function startMailSink({ db, port = 0, clock = () => new Date() }: { db: Db; port?: number; clock?: () => Date }): Promise<MailSink> {
  const server = new SMTPServer({
    authOptional: true,
    disabledCommands: ['STARTTLS'],
    size: 2 * 1024 * 1024,
    logger: false,
    onData(stream, session, callback) {
      // The envelope, not the To: header, says who receives it; the outbox filters on it.
      const recipients = [...new Set(session.envelope.rcptTo.map((r) => r.address.trim().toLowerCase()))];
      simpleParser(stream)
        .then(async (mail) => {
          const about = mail.headers.get(WORKSPACE_HEADER.toLowerCase());
          await insertOutboxMessage(db, recipients, {
            id: randomUUID(),
            received_at: clock().toISOString(),
            from_address: addresses(mail.from),
            to_address: addresses(mail.to),
            subject: mail.subject ?? '',
            text_body: mail.text ?? '',
            html_body: typeof mail.html === 'string' ? mail.html : null,
            workspace_id: typeof about === 'string' && about !== '' ? about : null,
          });
          callback();
        })
        .catch((err: Error) => callback(err));
    },
  });
  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  const address = server.server.address() as AddressInfo;
  return {
    port: address.port,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
